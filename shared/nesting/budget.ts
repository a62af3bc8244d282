/**
 * Search budget. The search counts its work (free rectangles looked at) and stops at a work limit
 * derived from the time limit, so the same input and seed give the same layout on any machine that is
 * fast enough; the injected clock and the cancel callback are checked as a hard stop.
 */
export const work = { n: 0 };

/** Free-rectangle checks per millisecond assumed when turning a time limit into a work limit. */
export const WORK_PER_MS = 40_000;

export class Budget {
  private readonly start: number;
  private readonly deadline: number;
  private stopped = false;
  private calls = 0;
  private lastTick = 0;
  private lastCall = -1;
  readonly workLimit: number;
  readonly workStart: number;

  constructor(
    readonly timeLimitMs: number,
    private readonly now: (() => number) | undefined,
    private readonly shouldStop: (() => boolean) | undefined,
    workPerMs = WORK_PER_MS,
    private readonly onTick?: () => void,
    /** Milliseconds of work allowed (default the time limit); fixed in advance, so runs repeat. */
    workMs = timeLimitMs,
  ) {
    this.start = now ? now() : 0;
    this.deadline = this.start + timeLimitMs;
    this.workStart = work.n;
    this.workLimit = work.n + workMs * workPerMs;
  }

  /** True once the work or time is used up or the caller asked to stop. */
  expired(): boolean {
    if (this.stopped) return true;
    if (work.n >= this.workLimit) return (this.stopped = true);
    // Called once per decode (tens of microseconds or more), so the clock is read every time.
    this.calls++;
    if (this.shouldStop?.()) return (this.stopped = true);
    if (this.now) {
      const t = this.now();
      // Stop when the next step, as long as the last one, would end past the deadline.
      const step = this.lastCall >= 0 ? t - this.lastCall : 0;
      this.lastCall = t;
      if (t + step >= this.deadline) return (this.stopped = true);
      // Progress about every 100 ms.
      if (t - this.lastTick >= 100) {
        this.lastTick = t;
        this.onTick?.();
      }
    } else if ((this.calls & 255) === 0) this.onTick?.();
    return false;
  }

  /** Share of the budget used, 0..1. */
  fraction(): number {
    const byWork = (work.n - this.workStart) / Math.max(1, this.workLimit - this.workStart);
    const byTime = this.now && this.timeLimitMs > 0 ? (this.now() - this.start) / this.timeLimitMs : 0;
    return Math.min(1, Math.max(byWork, byTime));
  }

  /** Milliseconds since the start (0 without a clock). */
  elapsedMs(): number {
    return this.now ? this.now() - this.start : 0;
  }

  /**
   * A budget for one part of the search: `share` of the work left, the same deadline and stop
   * callback. Its end does not end this one.
   */
  child(share: number): Budget {
    const workLeft = Math.max(0, this.workLimit - work.n);
    const msLeft = this.now ? Math.max(0, this.deadline - this.now()) : this.timeLimitMs;
    const b = new Budget(msLeft, this.now, this.shouldStop, 1, this.onTick, workLeft * share);
    if (this.stopped) b.stopped = true;
    return b;
  }

  cancelled(): boolean {
    return this.shouldStop?.() ?? false;
  }
}
