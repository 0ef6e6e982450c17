import { PDFDocument, StandardFonts } from "pdf-lib";

/** A small real PDF of `pages` pages, each saying which sheet it is. */
export async function samplePdf(pages = 2, title = "Sample package"): Promise<Buffer> {
  const doc = await PDFDocument.create();
  const font = await doc.embedFont(StandardFonts.Helvetica);
  for (let i = 1; i <= pages; i++) doc.addPage([595, 842]).drawText(`${title} — Sheet ${i} of ${pages}`, { x: 50, y: 780, size: 12, font });
  return Buffer.from(await doc.save());
}
