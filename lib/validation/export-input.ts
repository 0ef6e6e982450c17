import { z } from "zod";

export const createExportInput = z
  .object({
    format: z.enum(["pdf", "docx"], { error: 'Choose "pdf" or "docx".' }),
    /** An issued revision of this package; absent or null for the current draft. */
    revisionId: z.uuid("Give the id of an issued revision of this package.").nullish(),
  })
  .strict();

export const exportParams = z.object({ exportId: z.uuid() });

export const downloadQuery = z.object({
  expires: z.coerce.number().int().positive(),
  signature: z.string().min(1).max(200),
});

/** Verification tokens are 24 letters and digits (lib/exports/verify-token.ts); a little slack for other lengths. */
export const verifyParams = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{22,64}$/) });

export const verifyFileInput = z
  .object({ sha256: z.string().regex(/^[0-9a-f]{64}$/i, "Give the SHA-256 of the file as 64 hex digits.") })
  .strict();
