import type { ExportFormat } from "@/lib/data/exports";

/** Where an export's file lives: under its firm, so a key can never cross firms. */
export function exportObjectKey(firmId: string, exportId: string, format: ExportFormat): string {
  return `firms/${firmId}/exports/${exportId}.${format}`;
}

export const exportContentType: Record<ExportFormat, string> = {
  pdf: "application/pdf",
  docx: "application/vnd.openxmlformats-officedocument.wordprocessingml.document",
};
