import { randomBytes } from "node:crypto";

const ALPHABET = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789";

/**
 * A random verification token of letters and digits only (about 143 bits in 24
 * characters): no "-" or "_" that a PDF text layer might split or drop at a
 * line end when the link on the cover is copied out.
 */
export function newVerifyToken(length = 24): string {
  let out = "";
  while (out.length < length) {
    for (const byte of randomBytes(length * 2)) {
      // 248 = 4 × 62: rejecting the rest keeps every character equally likely.
      if (byte < 248 && out.length < length) out += ALPHABET[byte % 62];
    }
  }
  return out;
}
