import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';
import { LRUCache } from 'lru-cache';

type Counter = { windowStartMs: number; current: number; previous: number };

/**
 * A rate-limit store that counts in a sliding window: the previous fixed window's count, weighted by how much of it
 * still overlaps the last `windowMs`, plus the current window's count. A burst at the end of one window therefore
 * still counts at the start of the next, so a burst across the edge cannot pass twice the limit (a fixed window lets
 * it). Keys are kept in a bounded LRU, so a flood of new keys cannot grow memory without bound.
 */
export class SlidingWindowStore implements Store {
  readonly localKeys = true;
  private windowMs: number;
  private counters: LRUCache<string, Counter>;

  constructor({ windowMs = 60_000, maxKeys = 100_000, now = () => Date.now() } = {}) {
    this.windowMs = windowMs;
    this.now = now;
    this.counters = new LRUCache({ max: maxKeys });
  }

  private now: () => number;

  init(options: Options) {
    this.windowMs = options.windowMs;
  }

  private counterOf(key: string, nowMs: number): Counter {
    const windowStartMs = Math.floor(nowMs / this.windowMs) * this.windowMs;
    const counter = this.counters.get(key);
    if (!counter) return { windowStartMs, current: 0, previous: 0 };
    if (counter.windowStartMs === windowStartMs) return counter;
    // One window on: the current count becomes the previous one; two or more windows on: both are over.
    const previous = counter.windowStartMs === windowStartMs - this.windowMs ? counter.current : 0;
    return { windowStartMs, current: 0, previous };
  }

  private infoOf(counter: Counter, nowMs: number): ClientRateLimitInfo {
    const overlap = 1 - (nowMs - counter.windowStartMs) / this.windowMs;
    return {
      totalHits: Math.ceil(counter.previous * overlap + counter.current),
      resetTime: new Date(counter.windowStartMs + this.windowMs),
    };
  }

  get(key: string) {
    const nowMs = this.now();
    return this.infoOf(this.counterOf(key, nowMs), nowMs);
  }

  increment(key: string) {
    const nowMs = this.now();
    const counter = this.counterOf(key, nowMs);
    counter.current += 1;
    this.counters.set(key, counter);
    return this.infoOf(counter, nowMs);
  }

  decrement(key: string) {
    const counter = this.counters.get(key);
    if (counter && counter.current > 0) counter.current -= 1;
  }

  resetKey(key: string) {
    this.counters.delete(key);
  }

  resetAll() {
    this.counters.clear();
  }
}
