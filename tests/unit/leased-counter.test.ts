/**
 * The compute limits' leased counter (server/middleware/leased-counter.ts): a request need not wait for
 * the shared counter, and processes sharing it still admit at most the limit per key and window.
 * Two LeasedCounters over one RateLimiterMemory stand for two server processes over PostgreSQL.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';
import { LeasedCounter } from '../../server/middleware/leased-counter';
import { leaseBlock } from '../../server/middleware/rate-limits';

const MINUTE_S = 60;

/** Admitted requests out of `n` consumed one after another; a refusal must carry when to retry. */
async function admitted(counter: LeasedCounter, key: string, n: number): Promise<number> {
  let ok = 0;
  for (let i = 0; i < n; i++) {
    try {
      await counter.consume(key);
      ok++;
    } catch (error) {
      expect(error).toBeInstanceOf(RateLimiterRes);
      expect((error as RateLimiterRes).msBeforeNext).toBeGreaterThan(0);
    }
  }
  return ok;
}

/** Lets background takings (already resolved promises) settle. */
const settle = () => new Promise((r) => setImmediate(r));

describe('leased rate-limit counter', () => {
  beforeEach(() => {
    vi.useFakeTimers({ toFake: ['Date', 'setTimeout', 'clearTimeout'] });
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('alone, admits exactly the limit in a window, also when the limit is no multiple of the block', async () => {
    for (const [points, block] of [
      [60, 3],
      [7, 3],
      [3, 1],
      [25, 10],
    ]) {
      const counter = new LeasedCounter(new RateLimiterMemory({ points, duration: MINUTE_S }), block);
      let ok = 0;
      for (let i = 0; i < points + 5; i++) {
        ok += await admitted(counter, 'addr', 1);
        await settle();
      }
      expect(ok, `${points} points in blocks of ${block}`).toBe(points);
    }
  });

  it('admits again once the window is over', async () => {
    const counter = new LeasedCounter(new RateLimiterMemory({ points: 5, duration: MINUTE_S }), 2);
    expect(await admitted(counter, 'addr', 8)).toBe(5);
    vi.advanceTimersByTime(MINUTE_S * 1000 + 1);
    expect(await admitted(counter, 'addr', 8)).toBe(5);
  });

  it('two processes on one shared counter never admit more than the limit together, and lose at most their unused leases', async () => {
    const points = 60;
    const block = leaseBlock(points);
    const shared = new RateLimiterMemory({ points, duration: MINUTE_S });
    const a = new LeasedCounter(shared, block);
    const b = new LeasedCounter(shared, block);
    let ok = 0;
    // a load balancer alternating, in runs of unequal length
    for (let i = 0; i < 200; i++) {
      ok += await admitted(i % 5 < 2 ? a : b, 'addr', 1);
      await settle();
    }
    expect(ok).toBeLessThanOrEqual(points);
    expect(ok).toBeGreaterThanOrEqual(points - 2 * Math.ceil(1.5 * block));
  });

  it('counts keys apart', async () => {
    const counter = new LeasedCounter(new RateLimiterMemory({ points: 4, duration: MINUTE_S }), 2);
    expect(await admitted(counter, 'one', 6)).toBe(4);
    expect(await admitted(counter, 'two', 6)).toBe(4);
  });

  it('waits for the shared counter only when it holds no points: the next block is taken in the background', async () => {
    const memory = new RateLimiterMemory({ points: 100, duration: MINUTE_S });
    const gates: (() => void)[] = [];
    // a shared counter that answers only when the test opens its gate, as a slow database would
    const slow = {
      points: 100,
      consume: (key: string, n?: number) => new Promise<void>((open) => gates.push(open)).then(() => memory.consume(key, n)),
    };
    const counter = new LeasedCounter(slow, 4);
    const first = counter.consume('addr');
    await settle();
    expect(gates).toHaveLength(1);
    gates.shift()!();
    await expect(first).resolves.toMatchObject({ remainingPoints: 99 });
    // three more points are in memory: these answer without asking the shared counter
    await counter.consume('addr');
    expect(gates).toHaveLength(0);
    // half the block used: the next block is asked for, and the last point answers while that is pending
    await counter.consume('addr');
    expect(gates).toHaveLength(1);
    await counter.consume('addr');
    // the block is used up and the next one has not come: this request waits for it
    let fifthDone = false;
    const fifth = counter.consume('addr').then(() => (fifthDone = true));
    await settle();
    expect(fifthDone).toBe(false);
    gates.shift()!();
    await fifth;
    expect(fifthDone).toBe(true);
  });

  it('passes on an error of the shared counter to the request that waits for it', async () => {
    const broken = { points: 10, consume: () => Promise.reject(new Error('database away')) };
    const counter = new LeasedCounter(broken, 2);
    await expect(counter.consume('addr')).rejects.toThrow('database away');
  });
});
