import { sniffImageType } from "@/lib/figures/sniff-image-type";

export type SealImageKind = "png" | "svg" | { refused: string };

/**
 * What an uploaded seal is, from its bytes: PNG by its magic number, SVG by an
 * <svg> root after any XML prolog. Other formats are named in the refusal so
 * the engineer knows what to convert.
 */
export function sniffSealImage(bytes: Buffer): SealImageKind {
  const raster = sniffImageType(bytes);
  if (raster === "image/png") return "png";
  if (raster === "image/jpeg") return { refused: "JPEG images cannot be seals; upload the seal as a PNG or an SVG." };
  if (raster === "image/webp") return { refused: "WebP images cannot be seals; upload the seal as a PNG or an SVG." };
  const head = bytes.subarray(0, 4096).toString("utf8").replace(/^\uFEFF/, "");
  // Skip the XML declaration, comments and a doctype before looking for the root element.
  const start = head.replace(/^(\s|<\?xml[^>]*\?>|<!--[\s\S]*?-->|<!DOCTYPE[^>]*>)*/i, "");
  if (/^<svg[\s>]/i.test(start)) return "svg";
  return { refused: "The file is neither a PNG nor an SVG; upload the seal as a PNG or an SVG." };
}
