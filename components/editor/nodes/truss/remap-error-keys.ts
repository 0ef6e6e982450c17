/**
 * Table errors with some field names moved to the column that shows them:
 * a support's `direction` is drawn as two columns, and its error belongs
 * on the first (`{ direction: "dx" }`); a chord's `chord[3]` sits on `chord`.
 */
export function remapErrorKeys(errors: Readonly<Record<string, string>>, moves: Readonly<Record<string, string>>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, message] of Object.entries(errors)) {
    const dot = key.indexOf(".");
    const field = key.slice(dot + 1);
    const target = moves[field] === undefined ? key : `${key.slice(0, dot)}.${moves[field]}`;
    if (!(target in out)) out[target] = message;
  }
  return out;
}
