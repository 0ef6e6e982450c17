/**
 * JSON with object keys sorted, so two documents with the same content compare
 * equal whatever order their keys were written in (PostgreSQL's jsonb, zod and
 * storage round-trips do not keep TipTap's order). Used for every "is this the
 * same content?" question across sources, and for block identities in a merge.
 * Written as plain loops: it runs on whole documents.
 */
export function stableJson(value: unknown): string {
  if (value === null || typeof value !== "object") return JSON.stringify(value) ?? "null";
  if (Array.isArray(value)) {
    let out = "[";
    for (let i = 0; i < value.length; i++) {
      if (i > 0) out += ",";
      out += value[i] === undefined ? "null" : stableJson(value[i]);
    }
    return `${out}]`;
  }
  const record = value as Record<string, unknown>;
  let out = "{";
  for (const key of Object.keys(record).sort()) {
    const item = record[key];
    if (item === undefined) continue;
    if (out.length > 1) out += ",";
    out += `${JSON.stringify(key)}:${stableJson(item)}`;
  }
  return `${out}}`;
}
