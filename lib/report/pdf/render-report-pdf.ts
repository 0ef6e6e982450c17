import { readFileSync } from "node:fs";
import { join } from "node:path";
import type { Page } from "puppeteer-core";
import { renderReportHtml } from "../html/render-report-html";
import type { PaperSize, ReportModel } from "../report-model";
import { getBrowser } from "./browser";

const SHEET = { letter: { width: "8.5in", height: "11in" }, a4: { width: "210mm", height: "297mm" } } as const;

let paginator: string | undefined;
function paginatorSource(): string {
  paginator ??= readFileSync(join(process.env.PANELPOINT_ROOT ?? process.cwd(), "templates", "paginate-sheets.js"), "utf8");
  return paginator;
}

export type RenderReportPdfOptions = {
  onProgress?: (sheet: number, total: number) => void | Promise<void>;
  /** Also return the finished sheet HTML (the benchmark prints it with Chromium alone); serializing it costs time, so only on request. */
  keepHtml?: boolean;
};

/**
 * The package as a PDF: the report HTML is laid out in Chromium, flowed into
 * sheets by templates/paginate-sheets.js, and printed at the sheet size with
 * zero margins. On request it returns the finished (paginated) HTML too, so
 * the benchmark can time Chromium printing the same document alone.
 */
export async function renderReportPdf(model: ReportModel, options: RenderReportPdfOptions = {}): Promise<{ pdf: Buffer; sheetCount: number; html: string | null }> {
  const source = renderReportHtml(model);
  const browser = await getBrowser();
  const page = await browser.newPage();
  try {
    await page.setContent(source, { waitUntil: "load" });
    await page.addScriptTag({ content: paginatorSource(), id: "pp-paginate-script" });
    const layout = (await page.evaluate("window.ppPaginate()")) as { sheets: number; repaired: number; overflowing: number };
    await options.onProgress?.(0, layout.sheets);
    const html = options.keepHtml ? await page.content() : null;
    const pdf = await printPage(page, model.meta.paperSize);
    await options.onProgress?.(layout.sheets, layout.sheets);
    return { pdf, sheetCount: layout.sheets, html };
  } finally {
    await page.close().catch(() => undefined);
  }
}

/** Prints finished sheet HTML as it stands (no pagination): used by the renderer's last step and by the benchmark. */
export async function printHtmlToPdf(html: string, paperSize: PaperSize): Promise<Buffer> {
  const browser = await getBrowser();
  const page = await browser.newPage();
  try {
    await page.setContent(html, { waitUntil: "load" });
    await page.evaluate("document.fonts.ready.then(() => true)");
    return await printPage(page, paperSize);
  } finally {
    await page.close().catch(() => undefined);
  }
}

async function printPage(page: Page, paperSize: PaperSize): Promise<Buffer> {
  const size = SHEET[paperSize];
  const bytes = await page.pdf({ width: size.width, height: size.height, printBackground: true, margin: { top: 0, right: 0, bottom: 0, left: 0 }, preferCSSPageSize: false, timeout: 120000 });
  return Buffer.from(bytes);
}
