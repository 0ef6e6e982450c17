import { z } from "zod";

const title = z.string().trim().min(1, "Give the package a title.").max(200, "Use at most 200 characters.");

export const packageCreateInput = z.object({ title });
export const packageRenameInput = z.object({ title }).strict();
export const packageParams = z.object({ packageId: z.uuid() });

/** The document itself is checked node by node by lib/document (validatePackageDocument), after this envelope. */
export const saveDocumentInput = z.object({ version: z.number().int().positive(), document: z.unknown() }).strict();
