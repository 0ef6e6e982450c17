import { ImageRun, type ParagraphChild } from "docx";
import { placeholderPng } from "./png-placeholder";
import { prepareSvg } from "./prepare-svg";

type Decoded = { kind: "png" | "jpg" | "gif" | "svg"; bytes: Buffer };

const MIME_KIND: Record<string, Decoded["kind"]> = {
  "image/png": "png",
  "image/jpeg": "jpg",
  "image/jpg": "jpg",
  "image/gif": "gif",
  "image/svg+xml": "svg",
};

export function decodeDataUri(dataUri: string): Decoded | null {
  const match = dataUri.match(/^data:([\w/+.-]+)((?:;[\w-]+=[^;,]*)*)(;base64)?,([\s\S]*)$/);
  if (!match) return null;
  const kind = MIME_KIND[match[1].toLowerCase()];
  if (!kind) return null;
  const bytes = match[3] ? Buffer.from(match[4], "base64") : Buffer.from(decodeURIComponent(match[4]), "utf8");
  return bytes.length > 0 ? { kind, bytes } : null;
}

/** Pixel size from the file itself, so a figure keeps its proportions. */
function intrinsicSize(decoded: Decoded): { width: number; height: number } | null {
  const b = decoded.bytes;
  if (decoded.kind === "png" && b.length > 24 && b.toString("ascii", 12, 16) === "IHDR") return { width: b.readUInt32BE(16), height: b.readUInt32BE(20) };
  if (decoded.kind === "gif" && b.length > 10) return { width: b.readUInt16LE(6), height: b.readUInt16LE(8) };
  if (decoded.kind === "jpg") {
    for (let i = 2; i + 9 < b.length; ) {
      if (b[i] !== 0xff) return null;
      const marker = b[i + 1];
      if (marker >= 0xc0 && marker <= 0xcf && marker !== 0xc4 && marker !== 0xc8 && marker !== 0xcc) return { width: b.readUInt16BE(i + 7), height: b.readUInt16BE(i + 5) };
      i += 2 + b.readUInt16BE(i + 2);
    }
  }
  return null;
}

export type ImageBox = { maxWidth: number; maxHeight: number; width?: number; height?: number };

function fit(size: { width: number; height: number }, box: ImageBox) {
  const aspect = size.height / size.width;
  let width = box.width ?? size.width;
  let height = box.height ?? (box.width ? box.width * aspect : size.height);
  const scale = Math.min(1, box.maxWidth / width, box.maxHeight / height);
  width *= scale;
  height *= scale;
  return { width: Math.round(width), height: Math.round(height) };
}

/** An image from a data: URI, scaled into the box; null when it cannot be read. */
export function imageFromDataUri(dataUri: string, box: ImageBox, altText: string): ParagraphChild | null {
  const decoded = decodeDataUri(dataUri);
  if (!decoded) return null;
  if (decoded.kind === "svg") return svgImage(decoded.bytes.toString("utf8"), box, altText);
  const size = intrinsicSize(decoded);
  if (!size || size.width === 0 || size.height === 0) return null;
  return new ImageRun({ type: decoded.kind, data: decoded.bytes, transformation: fit(size, box), altText: alt(altText) });
}

/**
 * An SVG (the calc diagrams, an SVG seal) embedded as SVG with the PNG
 * fallback DOCX requires; see png-placeholder.ts for why the fallback is plain.
 */
export function svgImage(markup: string, box: ImageBox, altText: string): ParagraphChild | null {
  const prepared = prepareSvg(markup);
  if (!prepared) return null;
  const size = fit(prepared, box);
  return new ImageRun({
    type: "svg",
    data: Buffer.from(prepared.svg, "utf8"),
    fallback: { type: "png", data: placeholderPng(size.width, size.height) },
    transformation: size,
    altText: alt(altText),
  });
}

const alt = (text: string) => ({ name: text.slice(0, 60) || "Image", description: text, title: text.slice(0, 60) || "Image" });
