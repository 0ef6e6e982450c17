/**
 * Export benchmark: packages of about 10, 50 and 100 sheets from generated
 * calcs (trusses, section cuts, joints, formulas, member design), each timed
 * from document to model + HTML, to PDF, and against Chromium alone printing
 * the same finished HTML. Prints figures; asserts nothing.
 *   npm run bench:export
 */
import { readFileSync, readdirSync } from "node:fs";
import { generateTruss } from "../lib/solve";
import type { BlockNode, CalcDocNode, PackageDocument } from "../lib/document/document-types";
import { heading, paragraph, standardRef } from "../lib/document/prose-nodes";
import { buildReportModel } from "../lib/report/build-report-model";
import { renderReportHtml } from "../lib/report/html/render-report-html";
import { browserPid, closeBrowser, getBrowser } from "../lib/report/pdf/browser";
import { renderReportDocx } from "../lib/report/docx/render-docx";
import { printHtmlToPdf, renderReportPdf } from "../lib/report/pdf/render-report-pdf";
import { loadSigningCertificate } from "../lib/report/sign/load-signing-certificate";
import { signPdf } from "../lib/report/sign/sign-pdf";
import type { ReportModel } from "../lib/report/report-model";
import { SAFETY_TEXT } from "../lib/safety-notice";

function calc(kind: CalcDocNode["type"], label: string, inputs: unknown): CalcDocNode {
  return { type: kind, attrs: { id: `bench-${label}`, label, inputs } };
}

/** One group of calcs around a generated truss: the mix a real package has. */
function group(i: number): BlockNode[] {
  const shapes = ["pratt", "howe", "warren-verticals"] as const;
  const span = 12 + (i % 4) * 3;
  const { model, chords } = generateTruss({ shape: shapes[i % 3], span, depth: 2 + (i % 2), panels: 4 + (i % 3) * 2 });
  const T = `T${i}`;
  const mid = model.members.find((m) => m.start.startsWith("U") && m.end.startsWith("U"))?.id ?? model.members[0].id;
  return [
    heading(1, `Truss ${i}: ${span} m span`),
    paragraph("Generated truss for the export benchmark, checked to ", standardRef("EN 1993-1-1", "2005", "6.3.1"), "."),
    calc("truss", T, {
      units: { length: "m", force: "kN" },
      joints: model.joints.map((j) => ({ id: j.id, x: j.x, y: j.y })),
      members: model.members.map((m) => ({ id: m.id, start: m.start, end: m.end, A: 2000, E: 210 })),
      supports: model.supports.map((s) => ({ joint: s.joint, type: s.type })),
      loadCases: [{ id: "G", kind: "G", loads: [] }, { id: "Q", kind: "Q", loads: [] }],
      lineLoads: [{ case: "G", chord: chords.bottom, w: 3, projected: true }, { case: "Q", chord: chords.bottom, w: 5, projected: true }],
    }),
    calc("sectionCut", `S${i}`, { truss: T, loadCase: "Q", members: [], keep: "", panel: 1 }),
    calc("joint", `J${i}`, { truss: T, loadCase: "G", joint: model.joints[0].id, sequence: false }),
    calc("formula", `F${i}`, { source: `# Chord stress\nN = 1.35 * ${T}.F_${mid}_G + 1.5 * ${T}.F_${mid}_Q\nA = 2000 mm^2\nsigma = N / A -> MPa`, preferredUnits: "SI" }),
    calc("memberDesign", `M${i}`, { truss: T, source: "Q", material: "steel-en1993", members: [{ member: mid, section: { shape: "rhs", b: 100, h: 100, t: 5 }, fy: 355, fu: 490, E: 210000, curve: "a" }] }),
  ];
}

function documentOf(groups: number): PackageDocument {
  return { type: "doc", content: Array.from({ length: groups }, (_, i) => group(i + 1)).flat() };
}

function modelOf(doc: PackageDocument): ReportModel {
  return buildReportModel({
    document: doc,
    meta: {
      firmName: "Bench Engineering", projectName: "Benchmark", jobNumber: "B-1", client: null, site: null, paperSize: "letter", packageId: "bench", packageTitle: "Generated package",
      revision: null, previousRevisionLabel: null, fingerprint: "0".repeat(64), preparedBy: { name: "Bench", date: "2026-12-02" }, checkedBy: null, seal: null, verification: null,
      generatedAt: new Date().toISOString(), safetyText: SAFETY_TEXT,
    },
    checkRecord: [], revisionLog: [], responseLetter: null, changedCalcIds: [],
  });
}

/** Resident memory of Chromium: the browser process and all its descendants (renderers, GPU, utility). */
function chromiumRssMb(root: number | null): number {
  if (!root) return 0;
  const parent = new Map<number, number>();
  const rss = new Map<number, number>();
  for (const name of readdirSync("/proc")) {
    if (!/^\d+$/.test(name)) continue;
    try {
      const status = readFileSync(`/proc/${name}/status`, "utf8");
      parent.set(Number(name), Number(/PPid:\s+(\d+)/.exec(status)?.[1] ?? 0));
      rss.set(Number(name), Number(/VmRSS:\s+(\d+)/.exec(status)?.[1] ?? 0));
    } catch { /* the process ended while we read */ }
  }
  const inTree = (pid: number): boolean => { for (let p = pid, n = 0; p > 1 && n < 10; p = parent.get(p) ?? 0, n++) if (p === root) return true; return false; };
  let kb = 0;
  for (const [pid, value] of rss) if (inTree(pid)) kb += value;
  return kb / 1024;
}

async function time<T>(fn: () => Promise<T> | T): Promise<[T, number]> {
  const t0 = performance.now();
  const value = await fn();
  return [value, performance.now() - t0];
}

/** Median of `runs` timings of `fn`, and its last value: one run on a shared 2-core machine is noise. */
async function median<T>(runs: number, fn: () => Promise<T> | T): Promise<[T, number]> {
  const times: number[] = [];
  let value: T | undefined;
  for (let i = 0; i < runs; i++) {
    const [v, ms] = await time(fn);
    value = v;
    times.push(ms);
  }
  times.sort((a, b) => a - b);
  return [value as T, times[Math.floor(runs / 2)]];
}

const RUNS = Number(process.env.BENCH_RUNS ?? 3);

async function main() {
  await getBrowser();
  let peakNode = 0, peakChromium = 0;
  const pid = await browserPid();
  const sampler = setInterval(() => {
    peakNode = Math.max(peakNode, process.memoryUsage().rss / 1048576);
    peakChromium = Math.max(peakChromium, chromiumRssMb(pid));
  }, 100);
  // Sheets per group, from two small runs, so each target is met by choosing the number of groups.
  const probe = async (g: number) => (await renderReportPdf(modelOf(documentOf(g)))).sheetCount;
  const [s1, s3] = [await probe(1), await probe(3)];
  const perGroup = Math.max(1, (s3 - s1) / 2);
  const base = s1 - perGroup;
  console.log(`Probe: ${perGroup.toFixed(1)} sheets per group of 5 calcs, ${base.toFixed(1)} sheets of front matter\n`);
  const { p12, passphrase } = await loadSigningCertificate();
  console.log(`Each time is the median of ${RUNS} runs (BENCH_RUNS). "to signed PDF" and "to DOCX" count from the document: model + HTML + PDF + signature, model + DOCX.`);
  console.log("Overhead = our PDF step (lay out, paginate, print) / Chromium alone printing the same finished sheets.\n");
  console.log("target | sheets | model+HTML | PDF step (ours) | Chromium alone | overhead | to signed PDF | to DOCX | peak RSS node / chromium");
  for (const target of [10, 50, 100]) {
    const groups = Math.max(1, Math.round((target - base) / perGroup));
    const doc = documentOf(groups);
    peakNode = 0; peakChromium = 0;
    const [model, modelMs] = await median(RUNS, () => modelOf(doc));
    const [, htmlMs] = await median(RUNS, () => renderReportHtml(model));
    const [out, pdfMs] = await median(RUNS, () => renderReportPdf(model));
    const finished = (await renderReportPdf(model, { keepHtml: true })).html as string;
    const [, aloneMs] = await median(RUNS, () => printHtmlToPdf(finished, model.meta.paperSize));
    const [, signMs] = await median(RUNS, () => signPdf(out.pdf, { p12, passphrase, name: "Benchmark", reason: "Benchmark", location: "Benchmark" }));
    const [, docxMs] = await median(RUNS, () => renderReportDocx(model));
    const front = modelMs + htmlMs;
    console.log(
      `${target} | ${out.sheetCount} | ${front.toFixed(0)} ms | ${pdfMs.toFixed(0)} ms | ${aloneMs.toFixed(0)} ms | ${(pdfMs / aloneMs).toFixed(2)} | ${(front + pdfMs + signMs).toFixed(0)} ms (sign ${signMs.toFixed(0)} ms) | ${(modelMs + docxMs).toFixed(0)} ms | ${peakNode.toFixed(0)} / ${peakChromium.toFixed(0)} MB`,
    );
  }
  clearInterval(sampler);
  await closeBrowser();
}

main().catch(async (e) => {
  console.error(e);
  await closeBrowser();
  process.exit(1);
});
