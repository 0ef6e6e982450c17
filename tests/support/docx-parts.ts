import { strFromU8, unzipSync } from "fflate";
import { JSDOM } from "jsdom";

/** The XML parts of a DOCX (a zip), by path; fflate is the zip library docx itself uses. */
export function docxParts(buffer: Buffer): Record<string, string> {
  const files = unzipSync(new Uint8Array(buffer));
  const out: Record<string, string> = {};
  for (const [path, bytes] of Object.entries(files)) if (/\.(xml|rels)$/.test(path)) out[path] = strFromU8(bytes);
  return out;
}

export function docxFileNames(buffer: Buffer): string[] {
  return Object.keys(unzipSync(new Uint8Array(buffer)));
}

const { DOMParser } = new JSDOM("").window;

/** Parses XML strictly; throws with the parser's message when it is not well-formed. */
export function parseXml(xml: string): Document {
  const doc = new DOMParser().parseFromString(xml, "application/xml");
  const error = doc.getElementsByTagName("parsererror")[0];
  if (error) throw new Error(`not well-formed XML: ${error.textContent?.slice(0, 300)}`);
  return doc;
}

export const M_NS = "http://schemas.openxmlformats.org/officeDocument/2006/math";
export const W_NS = "http://schemas.openxmlformats.org/wordprocessingml/2006/main";

/** Text of every instrText (field codes such as PAGE and NUMPAGES) in a part. */
export function fieldCodes(doc: Document): string[] {
  return [...doc.getElementsByTagNameNS(W_NS, "instrText")].map((n) => (n.textContent ?? "").trim());
}

export function textOf(doc: Document): string {
  return [...doc.getElementsByTagNameNS(W_NS, "t")].map((n) => n.textContent ?? "").join("");
}
