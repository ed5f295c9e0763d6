/**
 * Failed password checks per key (a username or an address) over a sliding window. A key at the
 * limit is refused until its oldest counted failure is a window old. Pure: the caller passes the
 * time, so the rules can be tested without waiting.
 */
export class FailureCounter {
  /** Times of counted failures per key, oldest first. */
  private readonly failures = new Map<string, number[]>();

  constructor(
    readonly limit: number,
    readonly windowMs: number,
  ) {}

  /** How long until `key` may try again: 0 when it may now. */
  retryAfterMs(key: string, now: number): number {
    const live = this.live(key, now);
    if (live.length < this.limit) return 0;
    // The count drops below the limit when the failure `limit` places from the newest ages out.
    return live[live.length - this.limit] + this.windowMs - now;
  }

  /** Counts a failure at `now` and returns the key's count. */
  add(key: string, now: number): number {
    const live = this.live(key, now);
    live.push(now);
    this.failures.set(key, live);
    return live.length;
  }

  /** Takes back one failure counted at `at` (a check counted before it ran, that then passed). */
  remove(key: string, at: number): void {
    const list = this.failures.get(key);
    const index = list?.lastIndexOf(at) ?? -1;
    if (list && index >= 0) list.splice(index, 1);
    if (list?.length === 0) this.failures.delete(key);
  }

  clear(key: string): boolean {
    return this.failures.delete(key);
  }

  /** Keys at the limit now, with their counts and wait. */
  locked(now: number): Array<{ key: string; failures: number; retryAfterMs: number }> {
    return [...this.failures.keys()]
      .map((key) => ({ key, failures: this.live(key, now).length, retryAfterMs: this.retryAfterMs(key, now) }))
      .filter((entry) => entry.retryAfterMs > 0);
  }

  /** Forgets keys whose failures have all aged out, so sprayed usernames do not pile up. */
  sweep(now: number): void {
    for (const key of [...this.failures.keys()]) {
      if (this.live(key, now).length === 0) this.failures.delete(key);
    }
  }

  private live(key: string, now: number): number[] {
    const list = this.failures.get(key) ?? [];
    const start = list.findIndex((at) => at > now - this.windowMs);
    const live = start < 0 ? [] : start === 0 ? list : list.slice(start);
    if (live.length === 0) this.failures.delete(key);
    else if (live !== list) this.failures.set(key, live);
    return live;
  }
}
