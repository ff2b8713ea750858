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

/**
 * The membership row the session read joined for the household in the path (the household's columns and
 * `member_role`; null when the person is no member), left on the request for householdAccess.
 */
export interface JoinedMembership {
  householdId: string;
  userId: string;
  row: (Record<string, unknown> & { member_role: string; data_version: string }) | null;
}
export const JOINED_MEMBERSHIP = Symbol('larderly.joinedMembership');

type StoreQuery = (
  sql: string | { name: string; text: string },
  params: unknown[],
  fn: (error: unknown, row?: SessionRow) => void,
) => void;

type SessionRow = Record<string, unknown> & {
  sess: session.SessionData & { passport?: { user?: string } };
  person_id: string | null;
  person_email: string | null;
  person_name: string | null;
  member_role: string | null;
};

const UUID = '[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}';
const HOUSEHOLD_IN_PATH = new RegExp(`^/households/(${UUID})(?:/|$)`, 'i');

/** What one request's session read is asked to join, and where it leaves what it found. */
interface Slot {
  householdId: string | null;
  joined?: JoinedMembership;
}
/**
 * The slot of the request whose session is being read. express-session calls store.get synchronously
 * inside its middleware (express-session 1.19, index.js), so the wrapper below sets this just around that
 * call; were that ever not so, get() finds no slot, joins no membership, and the guard reads its own.
 */
let reading: Slot | undefined;

/** The session read's one query (exported for the bench's EXPLAIN). */
export const PERSON_AND_MEMBERSHIP = `
  SELECT s.sess, u.id AS person_id, u.email AS person_email, u.name AS person_name, m.role AS member_role, h.*
    FROM sessions s
    LEFT JOIN users u ON u.id = CASE WHEN s.sess#>>'{passport,user}' ~ '^[0-9a-f-]{36}$' THEN (s.sess#>>'{passport,user}')::uuid END
    LEFT JOIN memberships m ON m.household_id = $2::uuid AND m.user_id = u.id
    LEFT JOIN households h ON h.id = m.household_id
   WHERE s.sid = $1 AND s.expire >= now()`;

/**
 * connect-pg-simple's store, but one round trip reads the session, the person it belongs to (only id, e-mail
 * and name) and, on a household route, that person's membership with its household: passport and the
 * guard need no query of their own.
 */
function personJoiningStore(PgStore: ReturnType<typeof connectPgSimple>) {
  return class PersonJoiningStore extends PgStore {
    override get(sid: string, fn: (error: unknown, sess?: session.SessionData | null) => void) {
      const slot = reading;
      reading = undefined;
      // Raw SQL through connect-pg-simple's own query helper (its pool, its error handling, the first row):
      // session, person and membership in one round trip, where Sequelize would make three.
      // A named statement: each pooled connection plans it once, where planning cost more than running it.
      (this as unknown as { query: StoreQuery }).query(
        { name: 'larderly-session-read', text: PERSON_AND_MEMBERSHIP },
        [sid, slot?.householdId ?? null],
        (error: unknown, row?: SessionRow) => {
          if (error) return fn(error);
          if (!row) return fn(null, null);
          const sess = typeof row.sess === 'string' ? JSON.parse(row.sess) : row.sess;
          // A symbol key: express-session keeps the passport object by reference and JSON never writes it.
          if (sess.passport)
            sess.passport[PERSON] = row.person_id
              ? { id: row.person_id, email: row.person_email!, name: row.person_name! }
              : null;
          if (slot?.householdId && row.person_id)
            slot.joined = {
              householdId: slot.householdId,
              userId: row.person_id,
              row: row.member_role ? (row as unknown as JoinedMembership['row']) : null,
            };
          fn(null, sess);
        },
      );
    }
  };
}

/** Sessions live in PostgreSQL so any app process can serve any request and restarts keep people signed in. */
export function sessionMiddleware(options: { pool: pg.Pool; secret: string; secure: boolean }) {
  const Store = personJoiningStore(connectPgSimple(session));
  const middleware = session({
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
  const handler: RequestHandler = (req, res, next) => {
    const slot: Slot = { householdId: HOUSEHOLD_IN_PATH.exec(req.path)?.[1]?.toLowerCase() ?? null };
    reading = slot;
    try {
      middleware(req, res, (error?: unknown) => {
        if (slot.joined) (req as unknown as Record<symbol, JoinedMembership>)[JOINED_MEMBERSHIP] = slot.joined;
        next(error);
      });
    } finally {
      reading = undefined;
    }
  };
  return handler;
}

/** The membership the session read joined for this household and person, if it did (see sessionMiddleware). */
export function joinedMembership(req: object, householdId: string, userId: string) {
  const joined = (req as Record<symbol, JoinedMembership | undefined>)[JOINED_MEMBERSHIP];
  return joined && joined.householdId === householdId.toLowerCase() && joined.userId === userId ? joined : undefined;
}

/** Marks a signed-in session seen when it was last written over a day ago, so it (and its cookie) last another 30 days. */
export const keepSessionAlive: RequestHandler = (req, _res, next) => {
  if (req.user && req.session && Date.now() - (req.session.seenAt ?? 0) > TOUCH_EVERY_MS)
    req.session.seenAt = Date.now();
  next();
};
