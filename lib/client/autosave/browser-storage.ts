import type { DraftStorage } from "./draft-store";

/** The browser's localStorage, or null on the server or where the browser forbids it (then drafts live only in memory). */
export function browserStorage(): DraftStorage | null {
  if (typeof window === "undefined") return null;
  try {
    return window.localStorage;
  } catch (error) {
    // Reading the property throws a SecurityError when site data is blocked.
    console.warn("Autosave cannot use localStorage; unsaved work is kept only while the page is open:", error);
    return null;
  }
}
