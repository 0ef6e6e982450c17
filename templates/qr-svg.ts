import QRCode from "qrcode";

/** A QR code of `text` as an SVG of dark squares, drawn synchronously from the qrcode package's module matrix. */
export function qrSvg(text: string): string {
  const qr = QRCode.create(text, { errorCorrectionLevel: "M" });
  const n = qr.modules.size;
  const quiet = 2;
  let path = "";
  for (let y = 0; y < n; y++) {
    for (let x = 0; x < n; x++) if (qr.modules.get(x, y)) path += `M${x + quiet} ${y + quiet}h1v1h-1z`;
  }
  const size = n + quiet * 2;
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${size} ${size}" shape-rendering="crispEdges" role="img" aria-label="QR code of the verification link"><rect width="${size}" height="${size}" fill="#fff"/><path d="${path}" fill="#1b232d"/></svg>`;
}
