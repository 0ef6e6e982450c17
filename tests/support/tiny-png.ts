/** A valid 1×1 PNG (one grey pixel), for upload tests. */
export const TINY_PNG = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAAAAAA6fptVAAAACklEQVR4nGNgAAAAAgABSK+kcQAAAABJRU5ErkJggg==", "base64");

export function pngForm(bytes: Buffer = TINY_PNG): FormData {
  const form = new FormData();
  form.set("file", new Blob([new Uint8Array(bytes)], { type: "image/png" }), "sketch.png");
  return form;
}
