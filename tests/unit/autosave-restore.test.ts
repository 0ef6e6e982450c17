import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { doc, draftKeyOfPkg1, FakeServer, MemoryStorage, openEditor, storedDraft } from "./autosave-fixtures";

beforeEach(() => {
  vi.useFakeTimers({ toFake: ["setTimeout", "clearTimeout", "Date"] });
});
afterEach(() => {
  vi.useRealTimers();
});

/** The author types, and the tab dies before the pause ends: only the device has the text. */
function crashWhileTyping(server: FakeServer, storage: MemoryStorage) {
  const { controller } = openEditor(server, storage);
  controller.edit(doc("Typed just before the crash."));
  // No timers run, nothing is sent: the page is gone. The controller is simply dropped.
  expect(server.requests).toHaveLength(0);
}

describe("restoring a draft after a reload or a crash", () => {
  it("returns the pending draft with its base version and sends it when the server is still at that version", async () => {
    const server = new FakeServer();
    const storage = new MemoryStorage();
    crashWhileTyping(server, storage);

    const { controller } = openEditor(server, storage);
    const restored = controller.restore();
    expect(restored).toMatchObject({ baseVersion: 1, document: doc("Typed just before the crash."), serverMovedOn: false });
    await controller.flush();
    expect(server.requests).toEqual([{ version: 1, document: doc("Typed just before the crash."), overwrites: null }]);
    expect(controller.getState()).toMatchObject({ status: "saved", version: 2 });
    expect(storedDraft(storage)).toBeNull();
  });

  it("turns the draft into a conflict when someone else saved after it was written", async () => {
    const server = new FakeServer();
    const storage = new MemoryStorage();
    crashWhileTyping(server, storage);
    server.saveByOther(doc("Ben's version."));

    const { controller } = openEditor(server, storage);
    expect(controller.restore()).toMatchObject({ baseVersion: 1, serverMovedOn: true });
    await controller.flush();
    expect(server.requests[0].version).toBe(1);
    expect(controller.getState()).toMatchObject({
      status: "conflict",
      conflict: { baseVersion: 1, mine: doc("Typed just before the crash."), theirs: { version: 2, document: doc("Ben's version."), savedBy: "Ben Okafor" } },
    });
    expect(storedDraft(storage)?.document).toEqual(doc("Typed just before the crash."));
  });

  it("keeps the draft when the server is still down on start, and says so", async () => {
    const server = new FakeServer();
    const storage = new MemoryStorage();
    crashWhileTyping(server, storage);
    server.mode = "down";
    const { controller } = openEditor(server, storage);
    controller.restore();
    await controller.flush();
    expect(controller.getState().status).toBe("not-saved");
    expect(storedDraft(storage)?.document).toEqual(doc("Typed just before the crash."));
  });

  it("returns null and forgets a draft the server already holds", () => {
    const server = new FakeServer();
    const storage = new MemoryStorage();
    storage.setItem(draftKeyOfPkg1, JSON.stringify({ baseVersion: 1, editedAt: "2026-12-02T10:00:00.000Z", document: server.document }));
    const { controller } = openEditor(server, storage);
    expect(controller.restore()).toBeNull();
    expect(storage.keys()).toEqual([]);
  });

  it("returns null when there is no draft, and the same answer on a second call without sending twice", async () => {
    const empty = openEditor();
    expect(empty.controller.restore()).toBeNull();

    const server = new FakeServer();
    const storage = new MemoryStorage();
    crashWhileTyping(server, storage);
    const { controller } = openEditor(server, storage);
    const first = controller.restore();
    expect(controller.restore()).toBe(first);
    await controller.flush();
    expect(server.requests).toHaveLength(1);
  });

  it("offers the draft back to an author who can no longer edit, without sending it", async () => {
    const server = new FakeServer();
    const storage = new MemoryStorage();
    crashWhileTyping(server, storage);
    const { controller } = openEditor(server, storage, { canEdit: false });
    expect(controller.restore()?.document).toEqual(doc("Typed just before the crash."));
    await controller.flush();
    expect(server.requests).toHaveLength(0);
    expect(storedDraft(storage)).not.toBeNull();
  });

  it("leaves an unreadable draft in place rather than delete what may be the only copy", () => {
    const storage = new MemoryStorage();
    storage.setItem(draftKeyOfPkg1, "{not json");
    const { controller } = openEditor(undefined, storage);
    expect(controller.restore()).toBeNull();
    expect(storage.getItem(draftKeyOfPkg1)).toBe("{not json");
  });
});
