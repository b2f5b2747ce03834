import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import { LRUCache } from 'lru-cache';
import type pg from 'pg';

/** How often a session in use has its stored expiry moved on (30 days from then); the cookie's rolls with every answer. */
export const SESSION_TOUCH_EVERY_MS = 10 * 60 * 1000;
/** Sessions whose last write this process remembers; beyond these the least recently written is touched again next time. */
const REMEMBERED_SESSIONS = 20_000;

const PgStore = connectPgSimple(session);

export interface SessionStoreOptions extends connectPgSimple.PGStoreOptions {
  pool: pg.Pool;
  /** where the signed-in user of a session is read with it (by `sess.passport.user`, its id); none: the session alone */
  usersTable?: string;
}

/** users rows read with their session, keyed by that session's `passport` object (each read parses a fresh one). */
const usersReadWithSessions = new WeakMap<object, Record<string, unknown>>();

/**
 * The users row the store read with this session (same query, same snapshot), if `session.passport`
 * names user `id` and the row exists. express-session copies a read session's fields onto
 * req.session, so req.session.passport is the object the row was kept under.
 */
export function userRowReadWithSession(session: unknown, id: unknown): Record<string, unknown> | undefined {
  const passport = (session as { passport?: unknown } | undefined)?.passport;
  if (!passport || typeof passport !== 'object') return undefined;
  const row = usersReadWithSessions.get(passport);
  return row && row.id === id ? row : undefined;
}

const quoted = (name: string) => `"${name.replace(/"/g, '""')}"`;

/**
 * The PostgreSQL session store (connect-pg-simple, table "session") that reads a session's user with
 * it (see `usersTable`) and moves a session's expiry on at most once per `touchEveryMs` per process
 * rather than on every request. express-session
 * holds back an answer's last byte until the store's touch has been written, so a signed-in cook's
 * every request waited for an UPDATE and its commit. The price: the stored expiry may lag the
 * cookie's by up to `touchEveryMs`, so a session left unused for its whole 30 days ends up to that
 * much earlier than its cookie says. Reads, saves and sign-outs go to the database every time:
 * nothing of a session or its user is kept between requests.
 */
export class SessionStore extends PgStore {
  /** sid → when this process last wrote its expiry (a save or a touch) */
  private readonly written = new LRUCache<string, number>({ max: REMEMBERED_SESSIONS });
  private readonly readQuery: string | null;

  constructor(
    private readonly options: SessionStoreOptions,
    private readonly touchEveryMs = SESSION_TOUCH_EVERY_MS,
    private readonly now: () => number = Date.now,
  ) {
    super(options);
    // A signed-in request read its session, then its user (passport's deserializeUser): two round
    // trips to PostgreSQL before any work. One query reads both; a user id that is not a plain
    // number matches no row rather than failing the cast.
    const userId = `CASE WHEN s.sess->'passport'->>'user' ~ '^[0-9]{1,9}$' THEN (s.sess->'passport'->>'user')::integer END`;
    this.readQuery = options.usersTable
      ? `SELECT s.sess AS "session.sess", u.* FROM ${quoted(options.tableName ?? 'session')} s ` +
        `LEFT JOIN ${quoted(options.usersTable)} u ON u.id = ${userId} WHERE s.sid = $1 AND s.expire >= to_timestamp($2)`
      : null;
  }

  /** As connect-pg-simple's get (a session past its stored expiry is none; an unreadable one is destroyed), with its user's row when `usersTable` is set. */
  override get(sid: string, callback: (err: unknown, session?: session.SessionData | null) => void): void {
    if (!this.readQuery) return super.get(sid, callback);
    // as connect-pg-simple does, the answer leaves the promise chain: what express-session does next is not this query's rejection
    this.options.pool.query<Record<string, unknown>>(this.readQuery, [sid, Math.ceil(this.now() / 1000)]).then(
      ({ rows }) => process.nextTick(() => this.answerRead(sid, rows[0], callback)),
      (err: unknown) => process.nextTick(callback, err),
    );
  }

  private answerRead(sid: string, row: Record<string, unknown> | undefined, callback: (err: unknown, session?: session.SessionData | null) => void) {
    if (!row) return callback(null, null);
    const { 'session.sess': stored, ...user } = row;
    let sess: session.SessionData;
    try {
      sess = (typeof stored === 'string' ? JSON.parse(stored) : stored) as session.SessionData;
    } catch {
      return this.destroy(sid, (err) => callback(err ?? null, null));
    }
    const passport = (sess as { passport?: unknown }).passport;
    if (user.id !== null && user.id !== undefined && passport && typeof passport === 'object') usersReadWithSessions.set(passport, user);
    callback(null, sess);
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
