/**
 * A canonical serialization: object keys sorted, no whitespace, and whatever
 * JSON drops (undefined, functions) dropped first. PostgreSQL's jsonb reorders
 * keys and the driver parses numbers back to the same doubles, so a value
 * serialized here before storing gives the same string after reading it back.
 */
export function canonicalJson(value: unknown): string {
  const plain: unknown = value === undefined ? null : JSON.parse(JSON.stringify(value));
  return write(plain);
}

function write(v: unknown): string {
  if (Array.isArray(v)) return `[${v.map(write).join(",")}]`;
  if (v !== null && typeof v === "object") {
    const entries = Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, x]) => `${JSON.stringify(k)}:${write(x)}`).join(",")}}`;
  }
  return JSON.stringify(v);
}
