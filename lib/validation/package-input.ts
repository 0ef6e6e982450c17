import { z } from "zod";

const title = z.string().trim().min(1, "Give the package a title.").max(200, "Use at most 200 characters.");

export const packageCreateInput = z.object({ title });
export const packageRenameInput = z.object({ title }).strict();
export const packageParams = z.object({ packageId: z.uuid() });
