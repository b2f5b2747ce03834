import { LRUCache } from 'lru-cache';
import { RateLimiterRes, type RateLimiterAbstract } from 'rate-limiter-flexible';

/** What a request learns from a counter: room left (across every process) and when the window ends. */
export interface CounterAnswer {
  remainingPoints: number;
  msBeforeNext: number;
}

/** The counter a per-request limit consumes one point of; a rejection is a RateLimiterRes, as rate-limiter-flexible's. */
export interface RequestCounter {
  readonly points: number;
  consume(key: string): Promise<CounterAnswer>;
}

interface Lease {
  /** points taken from the shared counter and not yet used by a request of this process */
  left: number;
  /** the shared window's end (ms since the epoch): unused points lapse with it */
  expiresAt: number;
  /** room the shared counter had at its last answer, the leases of every process deducted */
  sharedRemaining: number;
  /** the shared counter is spent for this window: there is nothing more to take */
  spent: boolean;
}

/** Keys (addresses, accounts) whose leases a process keeps at once; the least recently used lapse first. */
const LEASED_KEYS = 20_000;

/**
 * A fixed-window counter shared by every process (rate-limiter-flexible on PostgreSQL) that a request
 * need not wait for: each process takes `block` points at a time from the shared counter and hands
 * them out from memory, taking the next block in the background once half is used. Only a key's first
 * request in a window, or one arriving before the next block is in, waits for the database.
 *
 * Across processes the limit still holds: every point handed out was first counted in the shared
 * counter, so all processes together admit at most `points` per key and window. The price: points a
 * process leased and did not use lapse with the window, so a key that spreads its requests over N
 * processes may be refused up to about N × 1.5 × `block` points early.
 */
export class LeasedCounter implements RequestCounter {
  private readonly leases = new LRUCache<string, Lease>({ max: LEASED_KEYS });
  private readonly taking = new Map<string, Promise<void>>();

  constructor(
    private readonly shared: Pick<RateLimiterAbstract, 'points' | 'consume'>,
    readonly block: number,
    private readonly now: () => number = Date.now,
  ) {
    if (!Number.isInteger(block) || block < 1) throw new Error(`A lease block is a whole number of points, at least 1 (got ${block}).`);
  }

  get points(): number {
    return this.shared.points;
  }

  async consume(key: string): Promise<CounterAnswer> {
    let lease = this.current(key);
    // requests waiting together on one block may use it up: the rest wait for the next
    for (let tries = 0; !lease || (lease.left === 0 && !lease.spent); tries++) {
      if (tries === 3) throw new Error(`The shared rate-limit counter gave no points for ${key} three times in a row.`);
      await this.take(key);
      lease = this.current(key);
    }
    const msBeforeNext = Math.max(0, lease.expiresAt - this.now());
    if (lease.left === 0) throw new RateLimiterRes(0, msBeforeNext, this.points + 1);
    lease.left -= 1;
    if (!lease.spent && lease.left < this.block / 2) {
      // the next block while this one lasts; should it fail, the request that finds none left waits for another
      this.take(key).catch(() => {});
    }
    return { remainingPoints: lease.sharedRemaining + lease.left, msBeforeNext };
  }

  private current(key: string): Lease | undefined {
    const lease = this.leases.get(key);
    if (lease && lease.expiresAt <= this.now()) {
      this.leases.delete(key);
      return undefined;
    }
    return lease;
  }

  /** Takes a block from the shared counter, one taking at a time per key. */
  private take(key: string): Promise<void> {
    let taking = this.taking.get(key);
    if (taking) return taking;
    taking = this.shared
      .consume(key, this.block)
      .then(
        (r) => this.settle(key, r, this.block),
        (rejection: unknown) => {
          if (!(rejection instanceof RateLimiterRes)) throw rejection;
          // Over the limit: the shared counter added the whole block anyway. What fitted under the limit
          // is this process's; a key already blocked in memory (consumedPoints 0) got nothing.
          const before = rejection.consumedPoints - this.block;
          const granted = rejection.consumedPoints > 0 ? Math.min(this.block, Math.max(0, this.points - before)) : 0;
          this.settle(key, rejection, granted);
        },
      )
      .finally(() => this.taking.delete(key));
    this.taking.set(key, taking);
    return taking;
  }

  private settle(key: string, r: RateLimiterRes, granted: number) {
    const expiresAt = this.now() + r.msBeforeNext;
    const lease = this.current(key);
    // a block from the same window adds to what is left; a new window starts afresh
    const carried = lease && Math.abs(lease.expiresAt - expiresAt) < 1_000 ? lease.left : 0;
    this.leases.set(key, { left: carried + granted, expiresAt, sharedRemaining: Math.max(0, r.remainingPoints), spent: r.remainingPoints <= 0 });
  }
}
