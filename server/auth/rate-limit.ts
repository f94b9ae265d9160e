/**
 * Counts events per key in a sliding window (in memory: one server process). A key is blocked once
 * it holds `max` events younger than `windowMs`; it is free again when the oldest of them ages out.
 */
export class SlidingWindow {
  private readonly hits = new Map<string, number[]>();

  constructor(
    readonly max: number,
    readonly windowMs: number,
  ) {}

  private recent(key: string, now: number): number[] {
    const list = (this.hits.get(key) ?? []).filter((t) => now - t < this.windowMs);
    if (list.length === 0) this.hits.delete(key);
    else this.hits.set(key, list);
    return list;
  }

  /** Milliseconds until the key may try again (0 when it may now). */
  blockedFor(key: string, now = Date.now()): number {
    const list = this.recent(key, now);
    if (list.length < this.max) return 0;
    return (list[list.length - this.max] as number) + this.windowMs - now;
  }

  hit(key: string, now = Date.now()): void {
    const list = this.recent(key, now);
    list.push(now);
    this.hits.set(key, list);
    if (this.hits.size > 50_000) this.prune(now);
  }

  clear(key: string): void {
    this.hits.delete(key);
  }

  private prune(now: number): void {
    for (const key of [...this.hits.keys()]) this.recent(key, now);
  }
}

/** "N minutes" for a wait, rounded up, at least 1. */
export function minutesText(ms: number): string {
  const n = Math.max(1, Math.ceil(ms / 60_000));
  return n === 1 ? '1 minute' : `${n} minutes`;
}
