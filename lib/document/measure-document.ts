import { MAX_DOCUMENT_BYTES, MAX_JSON_DEPTH, MAX_NODE_DEPTH } from "./document-limits";
import { jsonStringBytes } from "./json-string-bytes";

/** Why a value is refused before its structure is looked at. */
export type DocumentMeasureProblem = { ok: false; message: string; path?: string };

type Frame = { value: unknown; path: string; jsonDepth: number; nodeDepth: number };

/**
 * Walks a would-be document once, cheaply, before any schema: refuses values
 * that are not JSON data, more than 2 MB of JSON, nested deeper than the
 * limits, and stops as soon as one limit is passed, so a huge paste costs
 * little. Node depth counts levels of `content` (the doc itself is 1).
 */
export function measureDocument(value: unknown): { ok: true; bytes: number } | DocumentMeasureProblem {
  let bytes = 0;
  const stack: Frame[] = [{ value, path: "", jsonDepth: 1, nodeDepth: 1 }];
  while (stack.length > 0) {
    const { value: v, path, jsonDepth, nodeDepth } = stack.pop() as Frame;
    if (jsonDepth > MAX_JSON_DEPTH) return { ok: false, message: `The document is nested more than ${MAX_JSON_DEPTH} levels deep at ${path || "the top"}.`, path: path || undefined };
    if (v === null || typeof v === "boolean") bytes += v === false ? 5 : 4;
    else if (typeof v === "number") {
      if (!Number.isFinite(v)) return { ok: false, message: `${path || "The document"} holds ${String(v)}, which JSON cannot represent.`, path: path || undefined };
      bytes += String(v).length;
    } else if (typeof v === "string") {
      // A string takes at least one byte per UTF-16 unit, so a huge one is refused without being read through.
      bytes += v.length > MAX_DOCUMENT_BYTES ? v.length + 2 : jsonStringBytes(v);
    } else if (Array.isArray(v)) {
      bytes += 2 + Math.max(0, v.length - 1);
      if (bytes > MAX_DOCUMENT_BYTES) return { ok: false, message: tooLarge(bytes, true) };
      const inContent = path.endsWith("content");
      if (inContent && nodeDepth + 1 > MAX_NODE_DEPTH) return { ok: false, message: `The document nests nodes more than ${MAX_NODE_DEPTH} levels deep at ${path}.`, path };
      for (let i = v.length - 1; i >= 0; i--) stack.push({ value: v[i], path: `${path}[${i}]`, jsonDepth: jsonDepth + 1, nodeDepth: inContent ? nodeDepth + 1 : nodeDepth });
    } else if (isPlainObject(v)) {
      const keys = Object.keys(v);
      bytes += 2 + Math.max(0, keys.length - 1);
      for (const key of keys) {
        const child = v[key];
        if (child === undefined) continue;
        bytes += jsonStringBytes(key) + 1;
        stack.push({ value: child, path: path ? `${path}.${key}` : key, jsonDepth: jsonDepth + 1, nodeDepth });
      }
    } else {
      return { ok: false, message: `${path || "The document"} is not JSON data (${typeof v}).`, path: path || undefined };
    }
    if (bytes > MAX_DOCUMENT_BYTES) return { ok: false, message: tooLarge(bytes, true) };
  }
  return { ok: true, bytes };
}

/** The refusal for an oversized document; `atLeast` when counting stopped early. */
export function tooLarge(bytes: number, atLeast: boolean): string {
  const mb = (bytes / (1024 * 1024)).toFixed(1);
  return `The document is ${atLeast ? "more than " : ""}${mb} MB; a package document may be at most ${MAX_DOCUMENT_BYTES / (1024 * 1024)} MB. Large tables of data belong in a file attached as a figure, not pasted as text.`;
}

function isPlainObject(v: unknown): v is Record<string, unknown> {
  if (typeof v !== "object" || v === null) return false;
  const proto = Object.getPrototypeOf(v);
  return proto === Object.prototype || proto === null;
}
