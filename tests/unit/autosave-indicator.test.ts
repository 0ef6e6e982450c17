import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { ConflictBanner } from "@/components/editor/conflict-banner";
import { SaveIndicator } from "@/components/editor/save-indicator";
import type { AutosaveConflict } from "@/lib/client/autosave/autosave-state";
import { doc } from "./autosave-fixtures";

const noop = () => undefined;

describe("SaveIndicator", () => {
  it("announces its state politely, in words, with a shape beside them", () => {
    const html = renderToStaticMarkup(createElement(SaveIndicator, { status: "saved", lastSavedAt: null, error: null }));
    expect(html).toContain('aria-live="polite"');
    expect(html).toContain("<svg");
    expect(html).toContain("Saved");
  });

  it("says saving while a save is waiting or on its way", () => {
    for (const status of ["pending", "saving"] as const) {
      expect(renderToStaticMarkup(createElement(SaveIndicator, { status, lastSavedAt: null, error: null }))).toContain("Saving…");
    }
  });

  it("gives the reason the text is not saved, and warns when it is not kept on the device either", () => {
    const error = { kind: "offline", message: "Not saved — offline, will retry" } as const;
    const html = renderToStaticMarkup(createElement(SaveIndicator, { status: "not-saved", lastSavedAt: null, error, keptOnDevice: false }));
    expect(html).toContain("Not saved — offline, will retry");
    expect(html).toContain("not kept on this device");
  });

  it("shows the time of the last save", () => {
    const html = renderToStaticMarkup(createElement(SaveIndicator, { status: "saved", lastSavedAt: "2026-12-02T10:05:00.000Z", error: null }));
    expect(html).toContain('<time dateTime="2026-12-02T10:05:00.000Z">');
  });

  it("says so when the latest save replaced someone else's version", () => {
    const lastOverwrite = { replacedVersion: 5, replacedSavedBy: "Ben Okafor", version: 6, savedAt: "2026-12-02T10:06:00.000Z" };
    const props = { status: "saved", error: null, lastOverwrite } as const;
    expect(renderToStaticMarkup(createElement(SaveIndicator, { ...props, lastSavedAt: "2026-12-02T10:06:00.000Z" }))).toContain("replaced Ben Okafor&#x27;s version 5");
    expect(renderToStaticMarkup(createElement(SaveIndicator, { ...props, lastSavedAt: "2026-12-02T10:09:00.000Z" }))).not.toContain("replaced");
  });
});

describe("ConflictBanner", () => {
  const conflict: AutosaveConflict = {
    theirs: { version: 5, document: doc("Theirs"), savedAt: "2026-12-02T10:05:00.000Z", savedBy: "Ben Okafor" },
    mine: doc("Mine"),
    baseVersion: 4,
  };

  it("names who saved the newer version, says the author's text is kept and offers the three choices", () => {
    const html = renderToStaticMarkup(createElement(ConflictBanner, { conflict, onReload: noop, onKeepMine: noop, onMerge: noop }));
    expect(html).toContain('role="alert"');
    expect(html).toContain("Ben Okafor saved version 5");
    expect(html).toContain("Your text is still on screen");
    for (const label of ["Reload their version", "Keep mine", "Merge both"]) expect(html).toContain(label);
  });

  it("offers set-aside text for copying once their version is on screen", () => {
    const rejected = { key: "panelpoint:draft:pkg-1:rejected:1", document: doc("Mine"), text: "Mine", rejectedAt: "2026-12-02T11:00:00.000Z" };
    const html = renderToStaticMarkup(createElement(ConflictBanner, { conflict: null, onReload: noop, onKeepMine: noop, onMerge: noop, rejected }));
    expect(html).toContain("Copy my text");
    expect(html).toContain(">Mine</textarea>");
  });

  it("renders nothing without a conflict or set-aside text", () => {
    expect(renderToStaticMarkup(createElement(ConflictBanner, { conflict: null, onReload: noop, onKeepMine: noop, onMerge: noop }))).toBe("");
  });
});
