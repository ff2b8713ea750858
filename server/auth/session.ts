import connectPgSimple from 'connect-pg-simple';
import { parse as parseCookies } from 'cookie';
import { unsign } from 'cookie-signature';
import type { Request, RequestHandler } from 'express';
import session from 'express-session';
import type pg from 'pg';
import type { Role } from '../../shared/roles';
import { sessionReads } from './session-reads';

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
 * The membership the session read joined for the household in the path (`member_role` and the household's
 * versions; null when the person is no member), left on the request for householdAccess.
 */
export interface JoinedMembership {
  householdId: string;
  userId: string;
  row: { member_role: Role; data_version: string; plan_version: string } | null;
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
  SELECT s.sess, u.id AS person_id, u.email AS person_email, u.name AS person_name, m.role AS member_role, h.data_version, h.plan_version
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
      (this as unknown as { query: StoreQuery }).query(
        SESSION_READ,
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
          if (slot?.householdId && row.person_id) slot.joined = joinedFrom(slot.householdId, row.person_id, row);
          fn(null, sess);
        },
      );
    }
  };
}

/** The session's one query, named: each pooled connection plans it once, where planning cost more than running it. */
const SESSION_READ = { name: 'larderly-session-read', text: PERSON_AND_MEMBERSHIP };

/** The same read for several requests at once (session-reads.ts): row `slot` answers the slot-th session id. */
export const PEOPLE_AND_MEMBERSHIPS = `
  SELECT q.slot, s.sess, u.id AS person_id, u.email AS person_email, u.name AS person_name, m.role AS member_role, h.data_version, h.plan_version
    FROM unnest($1::text[], $2::uuid[]) WITH ORDINALITY AS q(sid, household_id, slot)
    JOIN sessions s ON s.sid = q.sid AND s.expire >= now()
    LEFT JOIN users u ON u.id = CASE WHEN s.sess#>>'{passport,user}' ~ '^[0-9a-f-]{36}$' THEN (s.sess#>>'{passport,user}')::uuid END
    LEFT JOIN memberships m ON m.household_id = q.household_id AND m.user_id = u.id
    LEFT JOIN households h ON h.id = m.household_id`;
const SESSIONS_READ = { name: 'larderly-sessions-read', text: PEOPLE_AND_MEMBERSHIPS };
/** Both statements, as the session middleware gives them to sessionReads (exported for its test). */
export const SESSION_STATEMENTS = { one: SESSION_READ, many: SESSIONS_READ };

/** Where sign-in, sign-up, sign-out and accepting an invitation change the session itself (their writes, not reads). */
const CHANGES_SESSION = /^\/(?:auth|invitations)(?:\/|$)/;
const changesSession = (req: Request) =>
  req.method !== 'GET' && req.method !== 'HEAD' && CHANGES_SESSION.test(req.path);

/**
 * Sessions live in PostgreSQL so any app process can serve any request and restarts keep people signed in.
 * One handler for the session, the signed-in person and keeping the session alive. A request that only reads a
 * live session (any request but the writes of sign-in, sign-up, sign-out and invitations, with a signed cookie of a session seen
 * within the day) takes the short way: the cookie checked, the one query, req.user set; express-session and
 * passport, which would find the same and write nothing, are skipped. Anything else takes the full way.
 * Either way the session row is read on every request, so a sign-out or a removed membership counts at once on
 * every process.
 */
export function sessionMiddleware(options: {
  pool: pg.Pool;
  secret: string;
  secure: boolean;
  passport: { session(): RequestHandler };
}) {
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
  const person = options.passport.session();
  const full: RequestHandler = (req, res, next) => {
    const slot: Slot = { householdId: householdInPath(req) };
    reading = slot;
    try {
      middleware(req, res, (error?: unknown) => {
        if (error) return next(error);
        if (slot.joined) (req as unknown as Record<symbol, JoinedMembership>)[JOINED_MEMBERSHIP] = slot.joined;
        person(req, res, (personError?: unknown) =>
          personError ? next(personError) : keepSessionAlive(req, res, next),
        );
      });
    } finally {
      reading = undefined;
    }
  };
  const sessionIdOf = verifiedSessionIds(options.secret);
  const read = sessionReads<SessionRow>(options.pool, SESSION_STATEMENTS);
  return ((req, res, next) => {
    const sid = changesSession(req) ? null : sessionIdOf(req.headers.cookie);
    if (!sid) return full(req, res, next);
    const householdId = householdInPath(req);
    read({ sid, householdId }, (error, row) => {
      if (error) return next(error);
      const sess = row?.sess;
      const seenAt = typeof sess?.seenAt === 'number' ? sess.seenAt : 0;
      // Not a live, signed-in session seen within the day: express-session and passport decide, as they always did.
      if (!row?.person_id || sess?.passport?.user !== row.person_id || Date.now() - seenAt > TOUCH_EVERY_MS)
        return full(req, res, next);
      req.user = { id: row.person_id, email: row.person_email!, name: row.person_name! };
      if (householdId)
        (req as unknown as Record<symbol, JoinedMembership>)[JOINED_MEMBERSHIP] = joinedFrom(
          householdId,
          row.person_id,
          row,
        );
      next();
    });
  }) satisfies RequestHandler;
}

/** The membership a session read's row joined for the household in the path (null row: the person is no member). */
const joinedFrom = (householdId: string, userId: string, row: SessionRow): JoinedMembership => ({
  householdId,
  userId,
  row: row.member_role ? (row as unknown as JoinedMembership['row']) : null,
});

const householdInPath = (req: Request) => HOUSEHOLD_IN_PATH.exec(req.path)?.[1]?.toLowerCase() ?? null;

/**
 * The session id in a request's cookie when its signature is good (as express-session reads it: the first
 * cookie of that name, `s:` and the signed id), else null. A cookie's verdict never changes for one secret, so
 * the good ones are remembered (a bounded map) and the HMAC is worked out once per session, not per request.
 */
function verifiedSessionIds(secret: string) {
  // By the whole Cookie header: a browser sends the same one with every request, so it is parsed once too.
  const known = new Map<string, string>();
  return (header: string | undefined) => {
    if (!header || !header.includes(SESSION_COOKIE)) return null;
    const cached = known.get(header);
    if (cached) return cached;
    const raw = parseCookies(header)[SESSION_COOKIE];
    if (!raw?.startsWith('s:')) return null;
    const sid = unsign(raw.slice(2), secret);
    if (sid === false) return null;
    if (known.size >= 10_000) known.clear();
    known.set(header, sid);
    return sid;
  };
}

/** The membership the session read joined for this household and person, if it did (see sessionMiddleware). */
export function joinedMembership(req: object, householdId: string, userId: string) {
  const joined = (req as Record<symbol, JoinedMembership | undefined>)[JOINED_MEMBERSHIP];
  return joined && joined.householdId === householdId.toLowerCase() && joined.userId === userId ? joined : undefined;
}

/** Marks a signed-in session seen when it was last written over a day ago, so it (and its cookie) last another 30 days. */
const keepSessionAlive: RequestHandler = (req, _res, next) => {
  if (req.user && req.session && Date.now() - (req.session.seenAt ?? 0) > TOUCH_EVERY_MS)
    req.session.seenAt = Date.now();
  next();
};
