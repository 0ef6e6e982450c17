import { classifySaveResponse } from "./classify-save-response";
import type { SaveOutcome } from "./save-outcome";
import type { TipTapNode } from "./tiptap-node";

/** The part of `fetch` autosave uses; injected so tests can play the server. */
export type FetchLike = (url: string, init: RequestInit) => Promise<Response>;

/** Sent with a "keep mine" save so the server can record the overwrite; servers that do not know it ignore it. */
export const overwriteHeader = "x-panelpoint-overwrites-version";

export type SendDocumentOptions = {
  fetchImpl: FetchLike;
  packageId: string;
  /** The version this document was edited from. */
  version: number;
  document: TipTapNode;
  /** Set when the author chose to replace a newer stored version with theirs. */
  overwritesVersion?: number;
  /** A request that hangs this long counts as unreachable, so "Saving…" never sticks. */
  timeoutMs?: number;
};

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text.trim() === "") return null;
  try {
    return JSON.parse(text);
  } catch (error) {
    // Not JSON (an HTML error page from a proxy): the status alone decides.
    if (error instanceof SyntaxError) return null;
    throw error;
  }
}

/** One save attempt. Never throws: network failures come back as `unreachable`. */
export async function sendDocument(options: SendDocumentOptions): Promise<SaveOutcome> {
  const headers: Record<string, string> = { "content-type": "application/json" };
  if (options.overwritesVersion !== undefined) headers[overwriteHeader] = String(options.overwritesVersion);
  try {
    const response = await options.fetchImpl(`/api/v1/packages/${encodeURIComponent(options.packageId)}/document`, {
      method: "PUT",
      headers,
      body: JSON.stringify({ version: options.version, document: options.document }),
      signal: AbortSignal.timeout(options.timeoutMs ?? 30000),
    });
    return classifySaveResponse(response.status, await readJson(response));
  } catch (error) {
    return { kind: "unreachable", detail: error instanceof Error ? error.message : String(error) };
  }
}
