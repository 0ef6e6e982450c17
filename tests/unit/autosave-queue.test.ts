import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { doc, openEditor, settle, storedDraft } from "./autosave-fixtures";

beforeEach(() => {
  vi.useFakeTimers({ toFake: ["setTimeout", "clearTimeout", "Date"] });
});
afterEach(() => {
  vi.useRealTimers();
});

describe("autosave with a save in flight", () => {
  it("queues an edit made during a save and sends it after, from the version that save created", async () => {
    const { controller, server } = openEditor();
    controller.edit(doc("First."));
    const release = server.hold();
    await vi.advanceTimersByTimeAsync(800);
    expect(controller.getState().status).toBe("saving");

    controller.edit(doc("First. Second."));
    expect(controller.getState().status).toBe("saving");
    await vi.advanceTimersByTimeAsync(5000);
    expect(server.requests).toHaveLength(1);

    release();
    await settle();
    expect(server.requests.map((r) => [r.version, r.document])).toEqual([
      [1, doc("First.")],
      [2, doc("First. Second.")],
    ]);
    expect(controller.getState()).toMatchObject({ status: "saved", version: 3 });
    expect(server.document).toEqual(doc("First. Second."));
  });

  it("waits for the pause before sending the queued edit when typing goes on after the save returns", async () => {
    const { controller, server } = openEditor();
    controller.edit(doc("First."));
    const release = server.hold();
    await vi.advanceTimersByTimeAsync(800);
    controller.edit(doc("First. Sec"));
    release();
    await settle();
    expect(server.requests).toHaveLength(1);
    expect(controller.getState().status).toBe("pending");
    await vi.advanceTimersByTimeAsync(800);
    await settle();
    expect(server.requests).toHaveLength(2);
  });

  it("keeps the newer text on the device, rebased on the new version, when the older save is acknowledged", async () => {
    const { controller, server, storage } = openEditor();
    controller.edit(doc("First."));
    const release = server.hold();
    await vi.advanceTimersByTimeAsync(800);
    controller.edit(doc("First. Second."));
    expect(storedDraft(storage)).toMatchObject({ baseVersion: 1, document: doc("First. Second.") });

    release();
    await settle();
    // The first save is stored; the second waits for the pause and is still only on the device.
    expect(server.requests).toHaveLength(1);
    expect(server.version).toBe(2);
    expect(storedDraft(storage)).toMatchObject({ baseVersion: 2, document: doc("First. Second.") });
  });

  it("removes the draft only once the server acknowledges exactly the text in it", async () => {
    const { controller, server, storage } = openEditor();
    controller.edit(doc("First."));
    const release = server.hold();
    await vi.advanceTimersByTimeAsync(800);
    controller.edit(doc("First. Second."));
    release();
    await settle();
    expect(storedDraft(storage)).not.toBeNull();
    await controller.flush();
    expect(storedDraft(storage)).toBeNull();
  });

  it("says there is unsaved work while a save is in flight or text is waiting", async () => {
    const { controller, server } = openEditor();
    expect(controller.hasUnsavedWork()).toBe(false);
    controller.edit(doc("First."));
    expect(controller.hasUnsavedWork()).toBe(true);
    const release = server.hold();
    await vi.advanceTimersByTimeAsync(800);
    expect(controller.hasUnsavedWork()).toBe(true);
    release();
    await settle();
    expect(controller.hasUnsavedWork()).toBe(false);
  });
});
