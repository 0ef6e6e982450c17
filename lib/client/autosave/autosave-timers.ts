export type TimerHandle = ReturnType<typeof globalThis.setTimeout>;

/** The clock autosave waits on; injected so tests can run debounce and backoff on fake time. */
export type AutosaveTimers = {
  setTimeout(callback: () => void, ms: number): TimerHandle;
  clearTimeout(handle: TimerHandle): void;
};

/** Looks the globals up on every call, so fake timers installed after construction still apply. */
export const globalTimers: AutosaveTimers = {
  setTimeout: (callback, ms) => globalThis.setTimeout(callback, ms),
  clearTimeout: (handle) => globalThis.clearTimeout(handle),
};
