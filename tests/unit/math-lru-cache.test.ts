import { describe, expect, it } from "vitest";
import { LruCache } from "@/components/math/lru-cache";

describe("LruCache", () => {
  it("drops the entry unused for longest when full", () => {
    const c = new LruCache<string, number>(2);
    c.set("a", 1);
    c.set("b", 2);
    c.get("a");
    c.set("c", 3);
    expect(c.has("a")).toBe(true);
    expect(c.has("b")).toBe(false);
    expect(c.has("c")).toBe(true);
    expect(c.size).toBe(2);
  });

  it("refreshes an entry that is set again", () => {
    const c = new LruCache<string, number>(2);
    c.set("a", 1);
    c.set("b", 2);
    c.set("a", 10);
    c.set("c", 3);
    expect(c.get("a")).toBe(10);
    expect(c.has("b")).toBe(false);
  });

  it("returns undefined for a missing key and empties on clear", () => {
    const c = new LruCache<string, number>(1);
    expect(c.get("x")).toBeUndefined();
    c.set("x", 0);
    expect(c.get("x")).toBe(0);
    c.clear();
    expect(c.size).toBe(0);
  });

  it("refuses a capacity below one", () => {
    expect(() => new LruCache(0)).toThrow(RangeError);
  });
});
