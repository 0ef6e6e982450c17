/*
 * Panelpoint's sheet paginator. Runs inside Chromium on the HTML from
 * lib/report/html (lib/report/pdf injects it and calls window.ppPaginate()).
 *
 * It measures every flow block once (one layout), assigns blocks to fixed-size
 * sheet frames by those heights, splits long tables by rows (repeating the
 * header row), keeps headings with what follows, then writes each sheet's
 * title block: subject, revision mark, "Sheet x of y", and the index's sheet
 * numbers. Plain browser JavaScript, no imports: it is sent to the page as is.
 */
(function () {
  var TOLERANCE = 0.5;

  function revMark(label) {
    var size = label.length > 2 ? 7 : 10;
    return '<span class="pp-revmark"><svg viewBox="0 0 26 24" aria-label="Revised in revision ' + label +
      '"><path d="M13 1.5 L24.5 22.5 H1.5 Z" fill="#fff" stroke="#a4452c" stroke-width="1.6" stroke-linejoin="round"/>' +
      '<text x="13" y="19" text-anchor="middle" font-family="PP Sans, sans-serif" font-weight="700" font-size="' + size + '" fill="#a4452c">' +
      label.replace(/[&<>"]/g, "") + "</text></svg></span>";
  }

  function measure(flow) {
    return Array.prototype.map.call(flow.children, function (el) {
      var box = el.getBoundingClientRect();
      var rec = { el: el, h: box.height, keep: el.dataset.keep === "next", brk: el.dataset.break === "before", subject: el.dataset.subject || null, table: null };
      if (el.dataset.split === "rows") {
        var table = el.querySelector("table");
        var tbody = table && table.tBodies[0];
        var rows = tbody ? Array.prototype.slice.call(tbody.rows) : [];
        if (rows.length > 1) {
          var tops = rows.map(function (r) { return r.getBoundingClientRect().top; });
          var bottom = tbody.getBoundingClientRect().bottom;
          var heights = tops.map(function (t, i) { return (i + 1 < tops.length ? tops[i + 1] : bottom) - t; });
          var headerCells = table.tHead ? table.tHead.rows[0].cells : rows[0].cells;
          rec.table = {
            head: tops[0] - box.top,
            tail: box.bottom - bottom,
            rows: heights,
            widths: Array.prototype.map.call(headerCells, function (c) { return c.getBoundingClientRect().width; }),
          };
        }
      }
      return rec;
    });
  }

  // Column widths fixed from the one measurement, so every piece of a split table lays out like the whole.
  function freezeColumns(info) {
    info.forEach(function (r) {
      if (!r.table) return;
      var table = r.el.querySelector("table");
      var total = r.table.widths.reduce(function (a, b) { return a + b; }, 0);
      var group = document.createElement("colgroup");
      r.table.widths.forEach(function (w) {
        var col = document.createElement("col");
        col.style.width = ((100 * w) / total).toFixed(3) + "%";
        group.appendChild(col);
      });
      table.insertBefore(group, table.firstChild);
      table.style.tableLayout = "fixed";
      table.style.width = total + "px";
    });
  }

  // Working that still cannot break (no = or + at its top level) is set smaller to fit the frame, down to 60 %.
  function fitWideMath(flow) {
    var wide = Array.prototype.filter.call(flow.querySelectorAll(".pp-step-math"), function (el) { return el.scrollWidth > el.clientWidth + 1; });
    var ratios = wide.map(function (el) { return Math.max(0.6, el.clientWidth / el.scrollWidth); });
    wide.forEach(function (el, i) { el.style.fontSize = (ratios[i] * 100).toFixed(1) + "%"; });
  }

  function minHeight(info, i, depth) {
    var r = info[i];
    if (!r || depth > 4) return 0;
    if (r.table) return r.table.head + r.table.rows[0] + (r.table.rows[1] || 0);
    if (r.keep) return r.h + minHeight(info, i + 1, depth + 1);
    return r.h;
  }

  function assign(info, frameH) {
    var sheets = [];
    var cur, used;
    function newSheet(broke) { cur = { items: [], starts: [], broke: !!broke }; sheets.push(cur); used = 0; }
    function place(r, from, to, h) {
      if (r.subject && !from) cur.starts.push({ subject: r.subject, at: cur.items.length });
      cur.items.push({ rec: r, from: from, to: to });
      used += h;
    }
    newSheet();
    for (var i = 0; i < info.length; i++) {
      var r = info[i];
      if (r.brk && cur.items.length) newSheet(true);
      if (r.keep && cur.items.length) {
        var need = r.h + minHeight(info, i + 1, 0);
        if (used + need > frameH + TOLERANCE && need <= frameH) newSheet();
      }
      if (used + r.h <= frameH + TOLERANCE) { place(r, 0, 0, r.h); continue; }
      if (!r.table) {
        if (cur.items.length) newSheet();
        place(r, 0, 0, r.h);
        continue;
      }
      var rows = r.table.rows, start = 0;
      for (;;) {
        var avail = frameH - used, acc = r.table.head + r.table.tail, n = 0;
        while (start + n < rows.length && acc + rows[start + n] <= avail + TOLERANCE) { acc += rows[start + n]; n++; }
        if (start + n === rows.length) { place(r, start, rows.length, acc); break; }
        if (n < 2 && cur.items.length) { newSheet(); continue; }
        if (n === 0) n = 1;
        place(r, start, start + n, acc);
        newSheet();
        start += n;
      }
    }
    return sheets;
  }

  // The element for one piece of a split table: the original for the first, a copy of its caption and header for the rest.
  function pieceOf(item) {
    var r = item.rec;
    if (!r.table || (item.from === 0 && item.to === r.table.rows.length) || (!item.from && !item.to)) return r.el;
    if (!r.pieceRows) r.pieceRows = Array.prototype.slice.call(r.el.querySelector("table").tBodies[0].rows);
    var rows = r.pieceRows.slice(item.from, item.to);
    if (item.from === 0) {
      r.pieceRows.slice(item.to).forEach(function (row) { row.remove(); });
      return r.el;
    }
    var wrap = r.el.cloneNode(false);
    wrap.removeAttribute("id");
    var caption = r.el.querySelector(".pp-caption");
    if (caption) {
      var c = caption.cloneNode(true);
      c.textContent = caption.textContent + " (continued)";
      wrap.appendChild(c);
    }
    var original = r.el.querySelector("table");
    var table = original.cloneNode(false);
    var group = original.querySelector("colgroup");
    if (group) table.appendChild(group.cloneNode(true));
    if (original.tHead) table.appendChild(original.tHead.cloneNode(true));
    var tbody = document.createElement("tbody");
    rows.forEach(function (row) { tbody.appendChild(row); });
    table.appendChild(tbody);
    wrap.appendChild(table);
    return wrap;
  }

  function subjects(sheets) {
    var effective = null;
    sheets.forEach(function (s) {
      var started = s.starts.map(function (x) { return x.subject; });
      var list = s.broke || (s.starts.length && s.starts[0].at === 0) ? started : [effective].concat(started).filter(Boolean);
      if (started.length) effective = started[started.length - 1];
      s.subject = list.slice(0, 2).join(" · ") + (list.length > 2 ? " …" : "");
    });
  }

  async function ppPaginate() {
    await document.fonts.ready;
    await Promise.all(Array.prototype.map.call(document.images, function (img) { return img.decode().catch(function () {}); }));
    var flow = document.getElementById("pp-flow");
    var template = document.getElementById("pp-sheet-template");
    var revision = document.body.dataset.revision || "";
    var probe = template.content.firstElementChild.cloneNode(true);
    document.body.appendChild(probe);
    var frameH = probe.querySelector(".pp-frame").getBoundingClientRect().height;
    probe.remove();

    fitWideMath(flow);
    var info = measure(flow);
    freezeColumns(info);
    var sheets = assign(info, frameH);
    subjects(sheets);

    var container = document.createElement("div");
    container.id = "pp-sheets";
    var frames = sheets.map(function (s) {
      var sheet = template.content.firstElementChild.cloneNode(true);
      var frame = sheet.querySelector(".pp-frame");
      s.items.forEach(function (item) { frame.appendChild(pieceOf(item)); });
      container.appendChild(sheet);
      return frame;
    });
    flow.remove();
    document.body.appendChild(container);

    // A block measured shorter than it lays out (rare) would be clipped: move the sheet's last block on.
    var repaired = 0;
    for (var i = 0; i < frames.length; i++) {
      var frame = frames[i];
      while (frame.scrollHeight > frame.clientHeight + 1 && frame.children.length > 1) {
        if (i + 1 === frames.length) {
          var extra = template.content.firstElementChild.cloneNode(true);
          container.appendChild(extra);
          frames.push(extra.querySelector(".pp-frame"));
          sheets.push({ subject: sheets[sheets.length - 1].subject });
        }
        frames[i + 1].insertBefore(frame.lastElementChild, frames[i + 1].firstChild);
        repaired++;
      }
    }

    var total = frames.length;
    var numberOf = new Map();
    var overflowing = 0;
    frames.forEach(function (frame, i) {
      var sheet = frame.parentElement;
      numberOf.set(sheet, i + 1);
      sheet.dataset.sheet = String(i + 1);
      sheet.querySelector('[data-slot="sheet"]').textContent = "Sheet " + (i + 1) + " of " + total;
      sheet.querySelector('[data-slot="subject"]').textContent = sheets[i].subject || "";
      if (revision && frame.querySelector('[data-revised="1"]')) {
        sheet.querySelector('[data-slot="revmark"]').innerHTML = revMark(revision);
        sheet.dataset.revised = "true";
      }
      if (frame.scrollHeight > frame.clientHeight + 1) overflowing++;
    });
    Array.prototype.forEach.call(document.querySelectorAll("[data-target]"), function (cell) {
      var target = document.getElementById(cell.dataset.target);
      var sheet = target && target.closest(".pp-sheet");
      cell.textContent = sheet ? String(numberOf.get(sheet)) : "—";
    });
    Array.prototype.forEach.call(document.querySelectorAll("[data-total-sheets]"), function (el) { el.textContent = String(total); });
    template.remove();
    var script = document.getElementById("pp-paginate-script");
    if (script) script.remove();
    document.body.dataset.paginated = "true";
    return { sheets: total, repaired: repaired, overflowing: overflowing };
  }

  window.ppPaginate = ppPaginate;
})();
