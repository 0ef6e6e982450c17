import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { doc, MemoryStorage, openEditor, settle, storedDraft } from "./autosave-fixtures";

beforeEach(() => {
  vi.useFakeTimers({ toFake: ["setTimeout", "clearTimeout", "Date"] });
  vi.spyOn(console, "warn").mockImplementation(() => undefined);
});
afterEach(() => {
  vi.useRealTimers();
  vi.restoreAllMocks();
});

/** Runs fake time forward in steps, letting each answer land, and returns how many saves had been tried at each step. */
async function requestsAt(times: number[], count: () => number): Promise<number[]> {
  const seen: number[] = [];
  let now = 0;
  for (const t of times) {
    await vi.advanceTimersByTimeAsync(t - now);
    await settle();
    now = t;
    seen.push(count());
  }
  return seen;
}

describe("autosave while offline or while the server is down", () => {
  it("says not saved, sends nothing and keeps the text on the device while the browser is offline", async () => {
    const { controller, server, storage } = openEditor();
    controller.setOnline(false);
    controller.edit(doc("Typed on the train."));
    await vi.advanceTimersByTimeAsync(60_000);
    expect(server.requests).toHaveLength(0);
    expect(controller.getState()).toMatchObject({ status: "not-saved", error: { kind: "offline", message: "Not saved — offline, will retry" } });
    expect(storedDraft(storage)?.document).toEqual(doc("Typed on the train."));
  });

  it("sends the latest text as soon as the browser is back online, then forgets the local copy", async () => {
    const { controller, server, storage } = openEditor();
    controller.setOnline(false);
    controller.edit(doc("Typed on the train."));
    controller.edit(doc("Typed on the train, and more."));
    controller.setOnline(true);
    await settle();
    expect(server.requests.map((r) => r.document)).toEqual([doc("Typed on the train, and more.")]);
    expect(controller.getState().status).toBe("saved");
    expect(storedDraft(storage)).toBeNull();
  });

  it("says not saved when going offline with text waiting for the pause", () => {
    const { controller } = openEditor();
    controller.edit(doc("Half a thought"));
    controller.setOnline(false);
    expect(controller.getState().status).toBe("not-saved");
  });

  it("retries an unreachable server after 1 s, 2 s, 5 s and then every 10 s", async () => {
    const { controller, server } = openEditor();
    server.mode = "down";
    controller.edit(doc("Span 14 m."));
    const counts = await requestsAt([800, 1700, 1800, 3700, 3800, 8700, 8800, 18_700, 18_800, 28_800], () => server.requests.length);
    expect(counts).toEqual([1, 1, 2, 2, 3, 3, 4, 4, 5, 6]);
    expect(controller.getState()).toMatchObject({ status: "not-saved", error: { message: "Not saved — offline, will retry" } });
  });

  it("treats a 5xx like an unreachable server: retried with backoff until it answers, then saved", async () => {
    const { controller, server, storage } = openEditor();
    server.mode = "error";
    controller.edit(doc("Span 14 m."));
    await requestsAt([800, 1800, 3800], () => server.requests.length);
    expect(server.requests).toHaveLength(3);
    expect(storedDraft(storage)).not.toBeNull();

    server.mode = "up";
    await vi.advanceTimersByTimeAsync(5000);
    await settle();
    expect(server.requests).toHaveLength(4);
    expect(controller.getState()).toMatchObject({ status: "saved", version: 2, error: null });
    expect(storedDraft(storage)).toBeNull();
  });

  it("starts the backoff again from 1 s after a save gets through", async () => {
    const { controller, server } = openEditor();
    server.mode = "down";
    controller.edit(doc("One."));
    await requestsAt([800, 1800, 3800], () => server.requests.length);
    server.mode = "up";
    await requestsAt([8800], () => server.requests.length);
    expect(controller.getState().status).toBe("saved");

    server.mode = "down";
    controller.edit(doc("Two."));
    const counts = await requestsAt([800, 1800], () => server.requests.length);
    expect(counts).toEqual([5, 6]);
  });

  it("does not let typing hurry a retry, and the retry sends the latest text", async () => {
    const { controller, server } = openEditor();
    server.mode = "down";
    controller.edit(doc("One."));
    await requestsAt([800], () => server.requests.length);
    controller.edit(doc("One. Two."));
    await vi.advanceTimersByTimeAsync(900);
    expect(server.requests).toHaveLength(1);
    server.mode = "up";
    await vi.advanceTimersByTimeAsync(100);
    await settle();
    expect(server.requests.map((r) => r.document)).toEqual([doc("One."), doc("One. Two.")]);
  });

  it("stops retrying while offline and resumes at once when online again", async () => {
    const { controller, server } = openEditor();
    server.mode = "down";
    controller.edit(doc("One."));
    await requestsAt([800], () => server.requests.length);
    controller.setOnline(false);
    await vi.advanceTimersByTimeAsync(60_000);
    expect(server.requests).toHaveLength(1);
    server.mode = "up";
    controller.setOnline(true);
    await settle();
    expect(server.requests).toHaveLength(2);
    expect(controller.getState().status).toBe("saved");
  });

  it("tries at once on flush even while waiting to retry", async () => {
    const { controller, server } = openEditor();
    server.mode = "down";
    controller.edit(doc("One."));
    await requestsAt([800], () => server.requests.length);
    server.mode = "up";
    await controller.flush();
    expect(server.requests).toHaveLength(2);
    expect(controller.getState().status).toBe("saved");
  });

  it("says the text is not kept on this device when the browser refuses to store it", () => {
    const storage = new MemoryStorage();
    storage.failWrites = true;
    const { controller } = openEditor(undefined, storage);
    controller.edit(doc("Span 14 m."));
    expect(controller.getState().keptOnDevice).toBe(false);
    storage.failWrites = false;
    controller.edit(doc("Span 15 m."));
    expect(controller.getState().keptOnDevice).toBe(true);
  });
});
