import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import { LRUCache } from 'lru-cache';
import type pg from 'pg';

/** How often a session in use has its stored expiry moved on (30 days from then); the cookie's rolls with every answer. */
export const SESSION_TOUCH_EVERY_MS = 10 * 60 * 1000;
/** Sessions whose last write this process remembers; beyond these the least recently written is touched again next time. */
const REMEMBERED_SESSIONS = 20_000;

const PgStore = connectPgSimple(session);

/**
 * The PostgreSQL session store (connect-pg-simple, table "session") that moves a session's expiry
 * on at most once per `touchEveryMs` per process rather than on every request. express-session
 * holds back an answer's last byte until the store's touch has been written, so a signed-in cook's
 * every request waited for an UPDATE and its commit. The price: the stored expiry may lag the
 * cookie's by up to `touchEveryMs`, so a session left unused for its whole 30 days ends up to that
 * much earlier than its cookie says. Reads, saves and sign-outs go to the database every time.
 */
export class SessionStore extends PgStore {
  /** sid → when this process last wrote its expiry (a save or a touch) */
  private readonly written = new LRUCache<string, number>({ max: REMEMBERED_SESSIONS });

  constructor(
    options: connectPgSimple.PGStoreOptions,
    private readonly touchEveryMs = SESSION_TOUCH_EVERY_MS,
    private readonly now: () => number = Date.now,
  ) {
    super(options);
  }

  override set(sid: string, sess: session.SessionData, callback?: (err?: unknown) => void): void {
    this.written.delete(sid);
    super.set(sid, sess, (err?: unknown) => {
      if (!err) this.written.set(sid, this.now());
      callback?.(err);
    });
  }

  override destroy(sid: string, callback?: (err?: unknown) => void): void {
    this.written.delete(sid);
    super.destroy(sid, callback);
  }

  override touch(sid: string, sess: session.SessionData, callback?: (err?: unknown) => void): void {
    const last = this.written.get(sid);
    if (last !== undefined && this.now() - last < this.touchEveryMs) {
      callback?.();
      return;
    }
    // connect-pg-simple answers its touch callback with the query's error, which its types leave out
    const touched = (err?: unknown) => {
      if (!err) this.written.set(sid, this.now());
      callback?.(err);
    };
    super.touch(sid, sess, touched as () => void);
  }
}
