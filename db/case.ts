/** `projectId` → `project_id`. Leaves already-snake names alone. */
export function toSnake(name: string): string {
  return name.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
}

/** `project_id` → `projectId`. */
export function toCamel(name: string): string {
  return name.replace(/_([a-z0-9])/g, (_, c: string) => c.toUpperCase());
}
