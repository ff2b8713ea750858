import type { Request } from 'express';
import rateLimit, { ipKeyGenerator } from 'express-rate-limit';
import type { Sequelize } from 'sequelize';
import { AppError } from './errors';
import { PostgresRateLimitStore } from './rate-limit-store';

const MINUTE = 60 * 1000;

interface Rule {
  windowMs: number;
  limit: number;
  /** what the person reads when refused, after "Too many …" */
  what: string;
  /** count only answers of 400 and above, e.g. failed sign-ins */
  failuresOnly?: boolean;
  /** whose count a request adds to; the caller's address when unset */
  key?: (req: Request) => string | undefined;
}

const byAddress = (req: Request) => ipKeyGenerator(req.ip ?? 'unknown');

/** The signed-in person's own count; a request without a session counts against its address. */
export const byPerson = (req: Request) => (req.user ? `person:${req.user.id}` : byAddress(req));

/** A limit whose counts live in PostgreSQL, shared by every app process. */
export function limit(sequelize: Sequelize, name: string, rule: Rule) {
  const minutes = Math.round(rule.windowMs / MINUTE);
  const wait = minutes >= 120 ? `${Math.round(minutes / 60)} hours` : `${minutes} minutes`;
  return rateLimit({
    windowMs: rule.windowMs,
    limit: rule.limit,
    store: new PostgresRateLimitStore(sequelize, name),
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: rule.failuresOnly ?? false,
    keyGenerator: (req) => rule.key?.(req) ?? byAddress(req),
    handler: (_req, _res, next) =>
      next(new AppError(429, 'too_many_requests', `Too many ${rule.what}. Wait ${wait}, then try again.`)),
  });
}

/** Sign-up and invitation accepts (both hash a password): every attempt counts, per address. */
export const passwordHashingLimit = (sequelize: Sequelize, perWindow: number) =>
  limit(sequelize, 'password-hashing', { windowMs: 15 * MINUTE, limit: perWindow, what: 'attempts' });

export { MINUTE };
