/**
 * Appends an incremental update that adds a text annotation (a reviewer's note)
 * to the first page, the way a PDF reader saves one: the original bytes stay
 * as they are, and a new page object, the annotation and an xref section
 * follow them. Enough for the files pdf-lib writes (classic xref tables).
 */
export function appendAnnotation(pdf: Buffer, note: string): Buffer {
  const text = pdf.toString("latin1");
  const startxref = Number(/startxref\s+(\d+)\s+%%EOF\s*$/.exec(text)?.[1]);
  const size = Math.max(...[...text.matchAll(/\/Size\s+(\d+)/g)].map((m) => Number(m[1])));
  const root = [...text.matchAll(/\/Root\s+(\d+ \d+ R)/g)].at(-1)?.[1];
  const page = /(\d+) 0 obj\s*<<((?:(?!endobj)[\s\S])*?\/Type\s*\/Page\b(?!s)[\s\S]*?)>>\s*endobj/.exec(text);
  if (!Number.isFinite(startxref) || !root || !page) throw new Error("not a PDF this helper can update");
  const [pageNum, pageBody] = [Number(page[1]), page[2]];
  const annot = size;
  const annots = /\/Annots\s*\[([^\]]*)\]/.exec(pageBody);
  const newBody = annots ? pageBody.replace(annots[0], `/Annots [${annots[1].trim()} ${annot} 0 R]`) : `${pageBody} /Annots [${annot} 0 R]`;

  let out = text.endsWith("\n") ? text : `${text}\n`;
  const pageOffset = out.length;
  out += `${pageNum} 0 obj\n<<${newBody}>>\nendobj\n`;
  const annotOffset = out.length;
  out += `${annot} 0 obj\n<< /Type /Annot /Subtype /Text /Rect [40 700 60 720] /Contents (${note.replace(/[()\\]/g, "")}) /P ${pageNum} 0 R /F 4 >>\nendobj\n`;
  const xref = out.length;
  const entry = (offset: number) => `${String(offset).padStart(10, "0")} 00000 n \n`;
  out += `xref\n0 1\n0000000000 65535 f \n${pageNum} 1\n${entry(pageOffset)}${annot} 1\n${entry(annotOffset)}`;
  out += `trailer\n<< /Size ${annot + 1} /Root ${root} /Prev ${startxref} >>\nstartxref\n${xref}\n%%EOF\n`;
  return Buffer.from(out, "latin1");
}
