/**
 * Where a seal image lives: under its firm and owner, named by its SHA-256, so
 * a new upload never overwrites the bytes an earlier revision was sealed with.
 */
export function sealImageKey(o: { firmId: string; userId: string; sha256: string; type: "png" | "svg" }): string {
  return `firms/${o.firmId}/seals/${o.userId}/${o.sha256}.${o.type}`;
}

export const sealContentType = { png: "image/png", svg: "image/svg+xml" } as const;
