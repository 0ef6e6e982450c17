import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { draftKey, DraftStore } from "@/lib/client/autosave/draft-store";
import { stableJson } from "@/lib/client/autosave/stable-json";
import { doc, MemoryStorage } from "./autosave-fixtures";

beforeEach(() => {
  vi.spyOn(console, "warn").mockImplementation(() => undefined);
});
afterEach(() => {
  vi.restoreAllMocks();
});

const editedAt = new Date("2026-12-02T10:00:00.000Z");

describe("DraftStore", () => {
  it("keeps a package's draft under panelpoint:draft:<packageId>", () => {
    const storage = new MemoryStorage();
    new DraftStore(storage, "pkg-9").write(3, stableJson(doc("Hello")), editedAt);
    expect(draftKey("pkg-9")).toBe("panelpoint:draft:pkg-9");
    expect(storage.keys()).toEqual(["panelpoint:draft:pkg-9"]);
    expect(new DraftStore(storage, "pkg-9").read()).toEqual({ baseVersion: 3, document: doc("Hello"), editedAt: "2026-12-02T10:00:00.000Z" });
  });

  it("keeps drafts of different packages apart", () => {
    const storage = new MemoryStorage();
    new DraftStore(storage, "pkg-1").write(1, stableJson(doc("One")), editedAt);
    expect(new DraftStore(storage, "pkg-2").read()).toBeNull();
  });

  it("clears the draft only when it holds exactly the acknowledged content, whatever its key order", () => {
    const storage = new MemoryStorage();
    const store = new DraftStore(storage, "pkg-1");
    store.write(1, stableJson(doc("Newer")), editedAt);
    store.clearIfContent(stableJson(doc("Older")));
    expect(store.read()?.document).toEqual(doc("Newer"));
    store.clearIfContent(stableJson({ content: [{ content: [{ text: "Newer", type: "text" }], type: "paragraph" }], type: "doc" }));
    expect(store.read()).toBeNull();
  });

  it("sets a rejected document aside under …:rejected:<timestamp> and returns the key", () => {
    const storage = new MemoryStorage();
    const key = new DraftStore(storage, "pkg-1").keepRejected(doc("Mine"), editedAt);
    expect(key).toBe(`panelpoint:draft:pkg-1:rejected:${editedAt.getTime()}`);
    expect(JSON.parse(storage.getItem(key ?? "") ?? "null")).toEqual(doc("Mine"));
  });

  it("reports a refused write instead of throwing", () => {
    const storage = new MemoryStorage();
    storage.failWrites = true;
    const store = new DraftStore(storage, "pkg-1");
    expect(store.write(1, stableJson(doc("x")), editedAt)).toBe(false);
    expect(store.keepRejected(doc("x"), editedAt)).toBeNull();
  });

  it("works without any storage, keeping nothing", () => {
    const store = new DraftStore(null, "pkg-1");
    expect(store.write(1, stableJson(doc("x")), editedAt)).toBe(false);
    expect(store.read()).toBeNull();
  });

  it("ignores a stored entry that is not a draft", () => {
    const storage = new MemoryStorage();
    storage.setItem("panelpoint:draft:pkg-1", JSON.stringify({ baseVersion: "one", document: "text" }));
    expect(new DraftStore(storage, "pkg-1").read()).toBeNull();
  });
});
