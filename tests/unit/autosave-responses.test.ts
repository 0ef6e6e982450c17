import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { classifySaveResponse } from "@/lib/client/autosave/classify-save-response";
import { doc, FakeServer, openEditor, settle, storedDraft } from "./autosave-fixtures";

beforeEach(() => {
  vi.useFakeTimers({ toFake: ["setTimeout", "clearTimeout", "Date"] });
});
afterEach(() => {
  vi.useRealTimers();
});

describe("autosave answers that are not retried", () => {
  it("shows the server's reason for a 422, keeps the text and does not retry", async () => {
    const { controller, server, storage } = openEditor();
    server.next = { status: 422, body: { error: { code: "INVALID", message: "T1: member m3 has no end joint", path: "content[2].attrs.inputs" } } };
    controller.edit(doc("Broken calc"));
    await controller.flush();
    expect(controller.getState()).toMatchObject({
      status: "not-saved",
      error: { kind: "invalid", message: "Not saved — T1: member m3 has no end joint", path: "content[2].attrs.inputs" },
    });
    await vi.advanceTimersByTimeAsync(60_000);
    expect(server.requests).toHaveLength(1);
    expect(storedDraft(storage)?.document).toEqual(doc("Broken calc"));
  });

  it("sends the corrected text after a 422 once typing pauses", async () => {
    const { controller, server } = openEditor();
    server.next = { status: 422, body: { error: { code: "INVALID", message: "bad" } } };
    controller.edit(doc("Broken calc"));
    await controller.flush();
    controller.edit(doc("Fixed calc"));
    expect(controller.getState().status).toBe("not-saved");
    await vi.advanceTimersByTimeAsync(800);
    await settle();
    expect(controller.getState()).toMatchObject({ status: "saved", error: null });
    expect(server.document).toEqual(doc("Fixed calc"));
  });

  it("turns read-only on a 403, stops sending and still keeps what was typed", async () => {
    const { controller, server, storage } = openEditor();
    server.next = { status: 403, body: { error: { code: "FORBIDDEN", message: "Your role does not allow this." } } };
    controller.edit(doc("Checker's note"));
    await controller.flush();
    expect(controller.getState()).toMatchObject({ status: "read-only", error: { kind: "forbidden", message: "Read-only" } });
    controller.edit(doc("Checker's note, longer"));
    await vi.advanceTimersByTimeAsync(60_000);
    expect(server.requests).toHaveLength(1);
    expect(storedDraft(storage)?.document).toEqual(doc("Checker's note, longer"));
  });

  it("ignores edits and stores nothing for an author who may not edit", async () => {
    const { controller, server, storage } = openEditor(undefined, undefined, { canEdit: false });
    expect(controller.getState().status).toBe("read-only");
    controller.edit(doc("Should not happen"));
    await controller.flush();
    expect(server.requests).toHaveLength(0);
    expect(storage.keys()).toEqual([]);
  });

  it("says signed out on a 401 and sends again on the next flush", async () => {
    const { controller, server } = openEditor();
    server.next = { status: 401, body: { error: { code: "UNAUTHENTICATED", message: "Sign in first." } } };
    controller.edit(doc("Late work"));
    await controller.flush();
    expect(controller.getState().error?.kind).toBe("signed-out");
    await controller.flush();
    expect(controller.getState().status).toBe("saved");
  });
});

describe("classifySaveResponse", () => {
  it("reads a 200 as saved with the new version and time", () => {
    expect(classifySaveResponse(200, { version: 7, savedAt: "2026-12-02T10:00:00.000Z" })).toEqual({ kind: "saved", version: 7, savedAt: "2026-12-02T10:00:00.000Z" });
  });

  it("retries a 200 it cannot read rather than guess the version", () => {
    expect(classifySaveResponse(200, { ok: true }).kind).toBe("unreachable");
  });

  it("reads a 409 with the stored version as a conflict, and one without it as a refusal", () => {
    const current = { version: 4, document: doc("Theirs"), savedAt: "2026-12-02T10:00:00.000Z", savedBy: "Ben Okafor" };
    expect(classifySaveResponse(409, { error: { code: "CONFLICT", message: "x" }, current })).toEqual({ kind: "conflict", current });
    expect(classifySaveResponse(409, { error: { code: "CONFLICT", message: "This package is issued." } })).toEqual({ kind: "refused", message: "This package is issued." });
  });

  it("takes a missing stored document in a 409 as an empty one", () => {
    const outcome = classifySaveResponse(409, { current: { version: 2, document: null, savedAt: "t", savedBy: "Ben" } });
    expect(outcome).toMatchObject({ kind: "conflict", current: { document: { type: "doc", content: [] } } });
  });

  it("maps 401, 403, 404 and 413 to their own outcomes", () => {
    expect(classifySaveResponse(401, null).kind).toBe("signed-out");
    expect(classifySaveResponse(403, null).kind).toBe("forbidden");
    expect(classifySaveResponse(404, null).kind).toBe("gone");
    expect(classifySaveResponse(413, null)).toEqual({ kind: "refused", message: "the document is too large to save" });
  });

  it("treats 5xx, 408 and 429 as a server that is unreachable for now", () => {
    for (const status of [500, 502, 503, 408, 429]) expect(classifySaveResponse(status, null).kind).toBe("unreachable");
  });

  it("survives an HTML error page from a proxy", async () => {
    const server = new FakeServer();
    server.mode = "error";
    const { controller } = openEditor(server);
    controller.edit(doc("x"));
    await controller.flush();
    expect(controller.getState().error?.kind).toBe("offline");
  });
});
