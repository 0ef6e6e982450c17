import { describe, expect, it } from "vitest";
import { backoffDelay } from "@/lib/client/autosave/backoff-delay";
import { documentPlainText } from "@/lib/client/autosave/document-plain-text";
import { formatSaveTime } from "@/lib/client/autosave/format-save-time";
import { lcsMatches } from "@/lib/client/autosave/lcs-matches";
import { stableJson } from "@/lib/client/autosave/stable-json";
import { doc, para } from "./autosave-fixtures";

describe("backoffDelay", () => {
  it("waits 1 s, 2 s, 5 s and then 10 s for every later retry", () => {
    expect([0, 1, 2, 3, 4, 50].map(backoffDelay)).toEqual([1000, 2000, 5000, 10000, 10000, 10000]);
  });
});

describe("stableJson", () => {
  it("writes the same text for the same content whatever the key order", () => {
    expect(stableJson({ b: 1, a: { d: [1, { f: 2, e: 3 }], c: null } })).toBe(stableJson({ a: { c: null, d: [1, { e: 3, f: 2 }] }, b: 1 }));
    expect(stableJson({ a: 1, b: undefined })).toBe('{"a":1}');
  });

  it("tells different content apart", () => {
    expect(stableJson(doc("a"))).not.toBe(stableJson(doc("b")));
  });
});

describe("lcsMatches", () => {
  it("matches a longest common subsequence, in increasing order on both sides", () => {
    expect([...lcsMatches(["a", "b", "c", "d"], ["a", "x", "c", "d", "e"])]).toEqual([0, -1, 2, 3]);
    expect([...lcsMatches(["a", "b"], ["b", "a"])].filter((j) => j !== -1)).toHaveLength(1);
    expect([...lcsMatches([], ["a"])]).toEqual([]);
  });
});

describe("documentPlainText", () => {
  it("gives the text of each block, blank-line separated, with calc nodes named by label", () => {
    const list = { type: "bulletList", content: [{ type: "listItem", content: [para("one")] }, { type: "listItem", content: [para("two")] }] };
    const calc = { type: "truss", attrs: { id: "t1", label: "T1" } };
    expect(documentPlainText(doc("Intro", list, calc, para("")))).toBe("Intro\n\none\ntwo\n\n[truss T1]");
  });
});

describe("formatSaveTime", () => {
  const now = new Date("2026-12-02T15:00:00");

  it("shows the clock time for a save today and adds the date for an older one", () => {
    expect(formatSaveTime(new Date("2026-12-02T14:32:00").toISOString(), now, "en-GB")).toBe("14:32");
    expect(formatSaveTime(new Date("2026-11-30T09:05:00").toISOString(), now, "en-GB")).toBe("30 Nov 09:05");
  });

  it("returns null for a timestamp that is not a date", () => {
    expect(formatSaveTime("yesterday-ish", now)).toBeNull();
  });
});
