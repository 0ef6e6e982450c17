/**
 * Bytes a string takes in JSON text (UTF-8, quotes and escapes included),
 * without building the JSON. Characters are counted as JSON.stringify writes
 * them: control characters escaped, surrogate pairs as 4 bytes.
 */
export function jsonStringBytes(s: string): number {
  let bytes = 2;
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if (c === 0x22 || c === 0x5c) bytes += 2;
    else if (c < 0x20) bytes += c === 0x08 || c === 0x09 || c === 0x0a || c === 0x0c || c === 0x0d ? 2 : 6;
    else if (c < 0x80) bytes += 1;
    else if (c < 0x800) bytes += 2;
    else if (c >= 0xd800 && c <= 0xdfff) bytes += 2;
    else bytes += 3;
  }
  return bytes;
}
