import type { AutosaveState } from "./autosave-state";

/** The one current autosave state and who watches it; shaped for React's `useSyncExternalStore`. */
export class AutosaveStateCell {
  private readonly listeners = new Set<() => void>();

  constructor(private state: AutosaveState) {}

  get = (): AutosaveState => this.state;

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => {
      this.listeners.delete(listener);
    };
  };

  /** Replaces the state with a new object (never mutates), so snapshots compare by identity. */
  set(patch: Partial<AutosaveState>): void {
    this.state = { ...this.state, ...patch };
    for (const listener of this.listeners) listener();
  }

  close(): void {
    this.listeners.clear();
  }
}
