import type { AutosaveTimers, TimerHandle } from "./autosave-timers";

/** A timer that is either pending or not; starting it again replaces the earlier wait. */
export class OneShotTimer {
  private handle: TimerHandle | null = null;

  constructor(private readonly timers: AutosaveTimers) {}

  get pending(): boolean {
    return this.handle !== null;
  }

  start(ms: number, callback: () => void): void {
    this.cancel();
    this.handle = this.timers.setTimeout(() => {
      this.handle = null;
      callback();
    }, ms);
  }

  cancel(): void {
    if (this.handle !== null) this.timers.clearTimeout(this.handle);
    this.handle = null;
  }
}
