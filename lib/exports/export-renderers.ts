import type { ReportModel } from "@/lib/report/report-model";

/** What the export job needs from the renderers; tests may pass their own to exercise failures. */
export type ExportRenderers = {
  pdf(model: ReportModel, options: { onProgress?(sheet: number, total: number): void | Promise<void> }): Promise<{ pdf: Buffer; sheetCount: number }>;
  docx(model: ReportModel): Promise<Buffer>;
};

/** The real renderers, loaded on first use so the web process never pulls Chromium in. */
export const defaultRenderers: ExportRenderers = {
  async pdf(model, options) {
    const { renderReportPdf } = await import("@/lib/report/pdf/render-report-pdf");
    return renderReportPdf(model, options);
  },
  async docx(model) {
    const { renderReportDocx } = await import("@/lib/report/docx/render-docx");
    return renderReportDocx(model);
  },
};
