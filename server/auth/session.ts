import connectPgSimple from 'connect-pg-simple';
import type { RequestHandler } from 'express';
import session from 'express-session';
import type pg from 'pg';

export const SESSION_COOKIE = 'larderly.sid';
const SESSION_DAYS = 30;
/** A session is written back at most this often while it is only read, which keeps it alive for SESSION_DAYS. */
const TOUCH_EVERY_MS = 24 * 60 * 60 * 1000;
/** Where the session read leaves the signed-in person it joined, for passport's deserializeUser; never stored. */
export const PERSON = Symbol('larderly.person');

declare module 'express-session' {
  interface SessionData {
    /** When this session was last written back (ms since the epoch). */
    seenAt?: number;
  }
}

export type SessionPerson = { id: string; email: string; name: string } | null;

type StoreQuery = (sql: string, params: unknown[], fn: (error: unknown, row?: SessionRow) => void) => void;

interface SessionRow {
  sess: session.SessionData & { passport?: { user?: string } };
  person_id: string | null;
  email: string | null;
  name: string | null;
}

/**
 * connect-pg-simple's store, but one round trip reads the session and the person it belongs to
 * (only id, e-mail and name), so passport needs no query of its own.
 */
function personJoiningStore(PgStore: ReturnType<typeof connectPgSimple>) {
  return class PersonJoiningStore extends PgStore {
    override get(sid: string, fn: (error: unknown, sess?: session.SessionData | null) => void) {
      // connect-pg-simple's own query helper: its pool, its error handling, the first row.
      (this as unknown as { query: StoreQuery }).query(
        `SELECT s.sess, u.id AS person_id, u.email, u.name
           FROM sessions s
           LEFT JOIN users u ON u.id = CASE WHEN s.sess#>>'{passport,user}' ~ '^[0-9a-f-]{36}$' THEN (s.sess#>>'{passport,user}')::uuid END
          WHERE s.sid = $1 AND s.expire >= now()`,
        [sid],
        (error: unknown, row?: SessionRow) => {
          if (error) return fn(error);
          if (!row) return fn(null, null);
          const sess = typeof row.sess === 'string' ? JSON.parse(row.sess) : row.sess;
          // A symbol key: express-session keeps the passport object by reference and JSON never writes it.
          if (sess.passport)
            sess.passport[PERSON] = row.person_id ? { id: row.person_id, email: row.email!, name: row.name! } : null;
          fn(null, sess);
        },
      );
    }
  };
}

/** Sessions live in PostgreSQL so any app process can serve any request and restarts keep people signed in. */
export function sessionMiddleware(options: { pool: pg.Pool; secret: string; secure: boolean }) {
  const Store = personJoiningStore(connectPgSimple(session));
  return session({
    name: SESSION_COOKIE,
    // No write on every read: the session is written back by keepSessionAlive at most once a day.
    store: new Store({
      pool: options.pool,
      tableName: 'sessions',
      createTableIfMissing: false,
      pruneSessionInterval: 15 * 60,
      disableTouch: true,
    }),
    secret: options.secret,
    resave: false,
    saveUninitialized: false,
    rolling: false,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: options.secure,
      maxAge: SESSION_DAYS * 24 * 60 * 60 * 1000,
    },
  });
}

/** Marks a signed-in session seen when it was last written over a day ago, so it (and its cookie) last another 30 days. */
export const keepSessionAlive: RequestHandler = (req, _res, next) => {
  if (req.user && req.session && Date.now() - (req.session.seenAt ?? 0) > TOUCH_EVERY_MS)
    req.session.seenAt = Date.now();
  next();
};
