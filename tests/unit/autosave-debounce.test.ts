import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { doc, openEditor, settle, storedDraft } from "./autosave-fixtures";

beforeEach(() => {
  vi.useFakeTimers({ toFake: ["setTimeout", "clearTimeout", "Date"] });
});
afterEach(() => {
  vi.useRealTimers();
});

describe("autosave debounce", () => {
  it("waits for an 800 ms pause in typing and then sends only the latest document", async () => {
    const { controller, server } = openEditor();
    controller.edit(doc("S"));
    await vi.advanceTimersByTimeAsync(300);
    controller.edit(doc("Sp"));
    await vi.advanceTimersByTimeAsync(300);
    controller.edit(doc("Spa"));
    await vi.advanceTimersByTimeAsync(799);
    expect(server.requests).toHaveLength(0);
    expect(controller.getState().status).toBe("pending");

    await vi.advanceTimersByTimeAsync(1);
    await settle();
    expect(server.requests).toEqual([{ version: 1, document: doc("Spa"), overwrites: null }]);
    expect(controller.getState()).toMatchObject({ status: "saved", version: 2, lastSavedAt: server.savedAt, error: null });
  });

  it("does not let a repeat of the same document push back a save that is due", async () => {
    const { controller, server } = openEditor();
    controller.edit(doc("Span 14 m."));
    await vi.advanceTimersByTimeAsync(700);
    controller.edit(doc("Span 14 m."));
    await vi.advanceTimersByTimeAsync(100);
    await settle();
    expect(server.requests).toHaveLength(1);
  });

  it("honours a shorter pause when one is configured", async () => {
    const { controller, server } = openEditor(undefined, undefined, { debounceMs: 200 });
    controller.edit(doc("Span 14 m."));
    await vi.advanceTimersByTimeAsync(200);
    await settle();
    expect(server.requests).toHaveLength(1);
  });

  it("keeps every edit on the device before anything is sent", () => {
    const { controller, server, storage } = openEditor();
    controller.edit(doc("Span 14 m."));
    expect(server.requests).toHaveLength(0);
    expect(storedDraft(storage)).toMatchObject({ baseVersion: 1, document: doc("Span 14 m.") });
    controller.edit(doc("Span 16 m."));
    expect(storedDraft(storage)?.document).toEqual(doc("Span 16 m."));
  });

  it("sends at once on flush and resolves when the server has acknowledged it", async () => {
    const { controller, server, storage } = openEditor();
    controller.edit(doc("Span 14 m."));
    const state = await controller.flush();
    expect(server.requests).toHaveLength(1);
    expect(state.status).toBe("saved");
    expect(storedDraft(storage)).toBeNull();
    await vi.advanceTimersByTimeAsync(2000);
    expect(server.requests).toHaveLength(1);
  });

  it("sends nothing when the text is typed back to what the server holds", async () => {
    const { controller, server, storage } = openEditor();
    controller.edit(doc("Span 12 m. (draft)"));
    controller.edit(doc("Span 12 m."));
    await vi.advanceTimersByTimeAsync(1000);
    expect(server.requests).toHaveLength(0);
    expect(controller.getState().status).toBe("saved");
    expect(storedDraft(storage)).toBeNull();
  });

  it("tells subscribers of each change of state", async () => {
    const { controller } = openEditor();
    const seen: string[] = [];
    controller.subscribe(() => seen.push(controller.getState().status));
    controller.edit(doc("Span 14 m."));
    await vi.advanceTimersByTimeAsync(800);
    await settle();
    expect(seen).toEqual(["pending", "saving", "saved"]);
  });
});
