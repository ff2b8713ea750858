import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type pg from 'pg';

export const SESSION_COOKIE = 'larderly.sid';

/** Sessions live in PostgreSQL so any app process can serve any request and restarts keep people signed in. */
export function sessionMiddleware(options: { pool: pg.Pool; secret: string; secure: boolean }) {
  const PgStore = connectPgSimple(session);
  return session({
    name: SESSION_COOKIE,
    store: new PgStore({ pool: options.pool, tableName: 'sessions', createTableIfMissing: false, pruneSessionInterval: 15 * 60 }),
    secret: options.secret,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: options.secure,
      maxAge: 30 * 24 * 60 * 60 * 1000,
    },
  });
}
