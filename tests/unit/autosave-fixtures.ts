import { AutosaveController, type AutosaveControllerOptions } from "@/lib/client/autosave/autosave-controller";
import type { DraftStorage } from "@/lib/client/autosave/draft-store";
import { overwriteHeader, type FetchLike } from "@/lib/client/autosave/send-document";
import type { TipTapNode } from "@/lib/client/autosave/tiptap-node";

/** A paragraph block; with an id when the test needs block identity through edits. */
export function para(text: string, id?: string): TipTapNode {
  return { type: "paragraph", ...(id ? { attrs: { id } } : {}), content: [{ type: "text", text }] };
}

/** A document of the given blocks; strings become paragraphs. */
export function doc(...blocks: (string | TipTapNode)[]): TipTapNode {
  return { type: "doc", content: blocks.map((block) => (typeof block === "string" ? para(block) : block)) };
}

/** localStorage in memory; `failWrites` plays a full quota. */
export class MemoryStorage implements DraftStorage {
  readonly items = new Map<string, string>();
  failWrites = false;

  getItem(key: string): string | null {
    return this.items.get(key) ?? null;
  }
  setItem(key: string, value: string): void {
    if (this.failWrites) throw new DOMException("The quota has been exceeded.", "QuotaExceededError");
    this.items.set(key, value);
  }
  removeItem(key: string): void {
    this.items.delete(key);
  }
  keys(): string[] {
    return [...this.items.keys()];
  }
}

export type SavedRequest = { version: number; document: TipTapNode; overwrites: string | null };

/**
 * The document endpoint, played in memory by its contract: a save from the
 * stored version is stored and bumps it; from any other version it is a 409
 * carrying the stored one. `mode` makes it unreachable; `gate` holds answers.
 */
export class FakeServer {
  version: number;
  document: TipTapNode;
  savedBy = "Ana Reyes";
  savedAt = "2026-12-02T10:00:00.000Z";
  mode: "up" | "down" | "error" = "up";
  /** An answer to give instead of the contract's, once. */
  next: { status: number; body: unknown } | null = null;
  readonly requests: SavedRequest[] = [];
  private gate: Promise<void> | null = null;

  constructor(version = 1, document: TipTapNode = doc("Span 12 m.")) {
    this.version = version;
    this.document = document;
  }

  /** Holds every answer until the returned function is called: a save stays in flight. */
  hold(): () => void {
    let release = () => undefined as void;
    this.gate = new Promise<void>((resolve) => {
      release = () => {
        this.gate = null;
        resolve();
      };
    });
    return release;
  }

  /** Someone else saves a newer version. */
  saveByOther(document: TipTapNode, savedBy = "Ben Okafor"): void {
    this.version += 1;
    this.document = document;
    this.savedBy = savedBy;
    this.savedAt = "2026-12-02T10:05:00.000Z";
  }

  readonly fetch: FetchLike = async (_url, init) => {
    const body = JSON.parse(String(init.body)) as { version: number; document: TipTapNode };
    const overwrites = new Headers(init.headers).get(overwriteHeader);
    this.requests.push({ version: body.version, document: body.document, overwrites });
    if (this.gate) await this.gate;
    if (this.mode === "down") throw new TypeError("Failed to fetch");
    if (this.mode === "error") return new Response("<h1>Bad gateway</h1>", { status: 502 });
    if (this.next) {
      const { status, body: answer } = this.next;
      this.next = null;
      return Response.json(answer, { status });
    }
    if (body.version !== this.version) {
      const current = { version: this.version, document: this.document, savedAt: this.savedAt, savedBy: this.savedBy };
      return Response.json({ error: { code: "CONFLICT", message: "Newer version." }, current }, { status: 409 });
    }
    this.version += 1;
    this.document = body.document;
    this.savedBy = "you";
    this.savedAt = `2026-12-02T10:${String(this.version).padStart(2, "0")}:00.000Z`;
    return Response.json({ version: this.version, savedAt: this.savedAt });
  };
}

/** Lets fetch answers and the promise chains behind them run (they need no timers). */
export async function settle(): Promise<void> {
  for (let i = 0; i < 5; i++) await new Promise<void>((resolve) => setImmediate(resolve));
}

/** A controller for package "pkg-1" against a fake server and memory storage, as the editor would open it. */
export function openEditor(
  server = new FakeServer(),
  storage = new MemoryStorage(),
  overrides: Partial<AutosaveControllerOptions> = {},
): { controller: AutosaveController; server: FakeServer; storage: MemoryStorage } {
  const controller = new AutosaveController({
    packageId: "pkg-1",
    initialVersion: server.version,
    initialDocument: server.document,
    canEdit: true,
    fetchImpl: server.fetch,
    storage,
    ...overrides,
  });
  return { controller, server, storage };
}

export const draftKeyOfPkg1 = "panelpoint:draft:pkg-1";

/** The draft as stored, parsed. */
export function storedDraft(storage: MemoryStorage): { baseVersion: number; document: TipTapNode } | null {
  const raw = storage.getItem(draftKeyOfPkg1);
  return raw === null ? null : (JSON.parse(raw) as { baseVersion: number; document: TipTapNode });
}
