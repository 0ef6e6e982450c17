import { z } from "zod";
import type { SaveOutcome } from "./save-outcome";
import { tipTapNodeSchema } from "./tiptap-node";

const savedBody = z.object({ version: z.number().int(), savedAt: z.string() });
const errorBody = z.object({
  error: z.object({ code: z.string().optional(), message: z.string().optional(), path: z.string().optional() }),
});
// A package that was never saved may hold no document yet: that is an empty one.
const storedDocument = tipTapNodeSchema.nullable().transform((document) => document ?? { type: "doc", content: [] });
const conflictBody = z.object({
  current: z.object({ version: z.number().int(), document: storedDocument, savedAt: z.string(), savedBy: z.string() }),
});

function errorMessage(body: unknown): { message?: string; path?: string } {
  const parsed = errorBody.safeParse(body);
  return parsed.success ? { message: parsed.data.error.message, path: parsed.data.error.path } : {};
}

/**
 * Maps the answer to `PUT /api/v1/packages/:id/document` onto a save outcome.
 * `body` is the parsed JSON, or null when the body was not JSON (a proxy's HTML
 * error page, say).
 */
export function classifySaveResponse(status: number, body: unknown): SaveOutcome {
  if (status >= 200 && status < 300) {
    const parsed = savedBody.safeParse(body);
    // A success we cannot read leaves us without the new version; retrying
    // costs at most one 409 whose content equals ours, which counts as saved.
    return parsed.success ? { kind: "saved", ...parsed.data } : { kind: "unreachable", detail: "The server's answer could not be read." };
  }
  if (status === 409) {
    const parsed = conflictBody.safeParse(body);
    if (parsed.success) return { kind: "conflict", current: parsed.data.current };
    // A 409 without a newer version is a state conflict (an issued package): saving again will not help.
    return { kind: "refused", message: errorMessage(body).message ?? "the server refused the save (409)" };
  }
  if (status === 401) return { kind: "signed-out" };
  if (status === 403) return { kind: "forbidden" };
  if (status === 404 || status === 410) return { kind: "gone" };
  // Timeouts and rate limits pass; treat them like a server that is down for a moment.
  if (status === 408 || status === 429 || status >= 500) return { kind: "unreachable", detail: `The server answered ${status}.` };
  const { message, path } = errorMessage(body);
  if (status === 422) return { kind: "invalid", message: message ?? "the document does not validate", ...(path ? { path } : {}) };
  if (status === 413) return { kind: "refused", message: message ?? "the document is too large to save" };
  return { kind: "refused", message: message ?? `the server refused the document (${status})` };
}
