import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { conflictNotePrefix } from "@/lib/client/autosave/merge-text";
import { doc, draftKeyOfPkg1, FakeServer, openEditor, para, storedDraft } from "./autosave-fixtures";

beforeEach(() => {
  vi.useFakeTimers({ toFake: ["setTimeout", "clearTimeout", "Date"], now: new Date("2026-12-02T11:00:00.000Z") });
});
afterEach(() => {
  vi.useRealTimers();
});

/** Two authors opened version 1; the other one saved first. */
async function inConflict() {
  const { controller, server, storage } = openEditor(new FakeServer(1, doc(para("Intro", "a"), para("Loads", "b"))));
  server.saveByOther(doc(para("Intro — revised by Ben", "a"), para("Loads", "b")));
  controller.edit(doc(para("Intro", "a"), para("Loads: 5 kN/m", "b")));
  await controller.flush();
  return { controller, server, storage };
}

describe("autosave on a 409", () => {
  it("enters conflict holding both the server's version and the author's text", async () => {
    const { controller, storage } = await inConflict();
    const { status, conflict } = controller.getState();
    expect(status).toBe("conflict");
    expect(conflict).toEqual({
      theirs: { version: 2, document: doc(para("Intro — revised by Ben", "a"), para("Loads", "b")), savedAt: "2026-12-02T10:05:00.000Z", savedBy: "Ben Okafor" },
      mine: doc(para("Intro", "a"), para("Loads: 5 kN/m", "b")),
      baseVersion: 1,
    });
    expect(storedDraft(storage)).toMatchObject({ baseVersion: 1, document: conflict?.mine });
  });

  it("keeps typing in conflict on the device but sends nothing until the author chooses", async () => {
    const { controller, server, storage } = await inConflict();
    controller.edit(doc(para("Intro", "a"), para("Loads: 6 kN/m", "b")));
    await vi.advanceTimersByTimeAsync(60_000);
    expect(server.requests).toHaveLength(1);
    expect(controller.getState().conflict?.mine).toEqual(doc(para("Intro", "a"), para("Loads: 6 kN/m", "b")));
    expect(storedDraft(storage)?.document).toEqual(doc(para("Intro", "a"), para("Loads: 6 kN/m", "b")));
  });

  it("counts a 409 as saved when the stored document is already exactly the author's", async () => {
    const { controller, server, storage } = openEditor();
    server.saveByOther(doc("Same words"));
    controller.edit(doc("Same words"));
    await controller.flush();
    expect(controller.getState()).toMatchObject({ status: "saved", version: 2, conflict: null });
    expect(storedDraft(storage)).toBeNull();
  });
});

describe("resolving a conflict", () => {
  it("reloadTheirs returns the server's document and sets the author's text aside under a rejected key", async () => {
    const { controller, storage } = await inConflict();
    const theirs = controller.reloadTheirs();
    expect(theirs).toEqual(doc(para("Intro — revised by Ben", "a"), para("Loads", "b")));

    const rejectedKey = `${draftKeyOfPkg1}:rejected:${Date.parse("2026-12-02T11:00:00.000Z")}`;
    expect(JSON.parse(storage.getItem(rejectedKey) ?? "null")).toEqual(doc(para("Intro", "a"), para("Loads: 5 kN/m", "b")));
    expect(storedDraft(storage)).toBeNull();
    expect(controller.getState()).toMatchObject({
      status: "saved",
      version: 2,
      conflict: null,
      rejected: { key: rejectedKey, text: "Intro\n\nLoads: 5 kN/m" },
      keptOnDevice: true,
    });
  });

  it("after reloadTheirs, the editor showing their document sends nothing, and new typing saves from their version", async () => {
    const { controller, server } = await inConflict();
    const theirs = controller.reloadTheirs();
    if (!theirs) throw new Error("expected their document");
    controller.edit(theirs);
    await vi.advanceTimersByTimeAsync(1000);
    expect(server.requests).toHaveLength(1);
    controller.edit(doc(para("Intro — revised by Ben", "a"), para("Loads: 5 kN/m", "b")));
    await controller.flush();
    expect(server.requests[1].version).toBe(2);
    expect(controller.getState()).toMatchObject({ status: "saved", version: 3 });
  });

  it("keepMine sends the author's document with the server's version, marked as an overwrite", async () => {
    const { controller, server, storage } = await inConflict();
    controller.keepMine();
    await controller.flush();
    expect(server.requests[1]).toEqual({ version: 2, document: doc(para("Intro", "a"), para("Loads: 5 kN/m", "b")), overwrites: "2" });
    expect(server.document).toEqual(doc(para("Intro", "a"), para("Loads: 5 kN/m", "b")));
    expect(controller.getState()).toMatchObject({
      status: "saved",
      version: 3,
      conflict: null,
      lastOverwrite: { replacedVersion: 2, replacedSavedBy: "Ben Okafor", version: 3 },
    });
    expect(storedDraft(storage)).toBeNull();
  });

  it("keepMine sends the text typed during the conflict, not the text that first clashed", async () => {
    const { controller, server } = await inConflict();
    controller.edit(doc(para("Intro", "a"), para("Loads: 6 kN/m", "b")));
    controller.keepMine();
    await controller.flush();
    expect(server.document).toEqual(doc(para("Intro", "a"), para("Loads: 6 kN/m", "b")));
  });

  it("merge combines both sides against the common base and saves it on top of their version", async () => {
    const { controller, server } = await inConflict();
    const result = controller.merge();
    expect(result).toEqual({ document: doc(para("Intro — revised by Ben", "a"), para("Loads: 5 kN/m", "b")), conflicts: 0 });
    await controller.flush();
    expect(server.requests[1].version).toBe(2);
    expect(server.document).toEqual(result?.document);
    expect(controller.getState()).toMatchObject({ status: "saved", version: 3, conflict: null, lastOverwrite: null });
  });

  it("merge marks a block both authors changed and keeps both versions", async () => {
    const { controller, server } = openEditor(new FakeServer(1, doc(para("Loads", "b"))));
    server.saveByOther(doc(para("Loads: 4 kN/m", "b")));
    controller.edit(doc(para("Loads: 5 kN/m", "b")));
    await controller.flush();
    const result = controller.merge();
    expect(result?.conflicts).toBe(1);
    const blocks = result?.document.content ?? [];
    expect(blocks[0].content?.[0].text).toBe(conflictNotePrefix);
    expect(blocks.slice(1)).toEqual([para("Loads: 4 kN/m", "b"), para("Loads: 5 kN/m", "b-mine")]);
    await controller.flush();
    expect(server.document).toEqual(result?.document);
  });

  it("does nothing when there is no conflict to resolve", () => {
    const { controller } = openEditor();
    expect(controller.reloadTheirs()).toBeNull();
    expect(controller.merge()).toBeNull();
    controller.keepMine();
    expect(controller.getState().status).toBe("saved");
  });
});
