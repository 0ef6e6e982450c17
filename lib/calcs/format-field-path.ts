/**
 * A field path as the editor and the engineer read it:
 * `["members", 3, "end"]` → `members[3].end`; "" for the whole input.
 */
export function formatFieldPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const key of path) {
    if (typeof key === "number") out += `[${key}]`;
    else out += out ? `.${String(key)}` : String(key);
  }
  return out;
}

/** `members[2]` + `section.t` → `members[2].section.t`; either side may be empty. */
export function joinFieldPath(prefix: string, path: string): string {
  if (!prefix) return path;
  if (!path) return prefix;
  return path.startsWith("[") ? `${prefix}${path}` : `${prefix}.${path}`;
}
