// Idempotency keys (the `Idempotency-Key` request header, as in the IETF httpapi draft of that name): a change
// made offline is sent again when the network returns, maybe more than once; the first answer is kept under its
// key and given again to every replay, so the change applies once.
import { createHash } from 'node:crypto';
import type { RequestHandler } from 'express';
import { QueryTypes, type Sequelize } from 'sequelize';
import { currentMembership } from '../auth/guards';
import { AppError } from './errors';

const KEY = /^[A-Za-z0-9_-]{16,100}$/;
const inProgress = () =>
  new AppError(409, 'conflict', 'This change is being applied right now. Try again in a moment.');
/** Keys are kept this long: a phone offline for longer sends its changes as new ones. */
export const KEPT_DAYS = 30;

/** After householdAccess: replays the stored answer for a key already applied, else records this one's. */
export function idempotent(sequelize: Sequelize): RequestHandler {
  return async (req, res, next) => {
    const key = req.get('Idempotency-Key');
    if (key === undefined) return next();
    if (!KEY.test(key))
      return next(
        new AppError(400, 'invalid_input', 'The Idempotency-Key header must be 16 to 100 letters, digits, "-" or "_".'),
      );
    const userId = req.user!.id;
    const fingerprint = createHash('sha256')
      .update(`${req.method} ${req.baseUrl}${req.path}\n${JSON.stringify(req.body ?? {})}`)
      .digest('hex');
    try {
      const claimed = await sequelize.query(
        `INSERT INTO applied_requests (user_id, key, household_id, fingerprint) VALUES (:userId, :key, :householdId, :fingerprint)
         ON CONFLICT (user_id, key) DO NOTHING RETURNING key`,
        {
          replacements: { userId, key, householdId: currentMembership(req).householdId, fingerprint },
          type: QueryTypes.SELECT,
        },
      );
      if (claimed.length === 0) {
        const [earlier] = await sequelize.query<{ fingerprint: string; status: number | null; body: unknown }>(
          'SELECT fingerprint, status, body FROM applied_requests WHERE user_id = :userId AND key = :key',
          { replacements: { userId, key }, type: QueryTypes.SELECT },
        );
        if (!earlier) return next(inProgress());
        if (earlier.fingerprint !== fingerprint)
          return next(
            new AppError(
              422,
              'invalid_input',
              'This Idempotency-Key was already used for a different change. Send a new key for a new change.',
            ),
          );
        if (earlier.status === null) return next(inProgress());
        res.set('Idempotent-Replayed', 'true').status(earlier.status).json(earlier.body);
        return;
      }
    } catch (error) {
      return next(error);
    }

    // The first answer is stored before it goes out. A server error forgets the key, so a retry can apply.
    const send = res.json.bind(res);
    res.json = (payload: unknown) => {
      const status = res.statusCode;
      const record =
        status >= 500
          ? sequelize.query('DELETE FROM applied_requests WHERE user_id = :userId AND key = :key', {
              replacements: { userId, key },
            })
          : sequelize.query(
              'UPDATE applied_requests SET status = :status, body = :body WHERE user_id = :userId AND key = :key',
              {
                replacements: { userId, key, status, body: JSON.stringify(payload ?? null) },
              },
            );
      record.then(
        () => send(payload),
        (error: Error) => {
          res.json = send;
          next(error);
        },
      );
      return res;
    };
    next();
  };
}

/** Drops keys older than KEPT_DAYS; run by a daily job. */
export async function forgetOldRequestKeys(sequelize: Sequelize) {
  await sequelize.query(`DELETE FROM applied_requests WHERE created_at < now() - interval '${KEPT_DAYS} days'`);
}
