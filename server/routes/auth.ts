import { Router, type NextFunction, type Request, type Response } from 'express';
import passport from 'passport';
import type { Sequelize } from 'sequelize';
import { loginBody, signupBody } from '../../shared/schemas/auth';
import { BAD_CREDENTIALS } from '../auth/passport';
import { requireUser } from '../auth/guards';
import { AppError } from '../http/errors';
import { limit, MINUTE, passwordHashingLimit } from '../http/rate-limits';
import { body } from '../http/validate';
import { describeMe, signUp } from '../services/accounts';

export function signIn(req: Request, user: Express.User) {
  // A fresh session id at sign-in, so a planted id is worth nothing.
  return new Promise<void>((resolve, reject) => {
    req.session.regenerate((error) => {
      if (error) return reject(error);
      req.login(user, (loginError) => {
        if (loginError) return reject(loginError);
        // passport makes the session anew at sign-in; it is saved with the answer.
        req.session.seenAt = Date.now();
        resolve();
      });
    });
  });
}

function authenticate(req: Request, res: Response, next: NextFunction) {
  return new Promise<Express.User>((resolve, reject) => {
    passport.authenticate('local', { session: false }, (error: unknown, user: Express.User | false) => {
      if (error) return reject(error);
      if (!user) return reject(new AppError(401, 'signed_out', BAD_CREDENTIALS));
      resolve(user);
    })(req, res, next);
  });
}

export function authRouter(options: { sequelize: Sequelize; bcryptCost: number; authLimit: number }) {
  const router = Router();
  // Failed sign-ins count, per address: a household signing in all day is never locked out.
  const failedSignIns = limit(options.sequelize, 'failed-sign-in', { windowMs: 15 * MINUTE, limit: options.authLimit, what: 'attempts', failuresOnly: true });
  const hashing = passwordHashingLimit(options.sequelize, options.authLimit);

  router.post('/signup', hashing, async (req, res) => {
    const input = body(req, signupBody);
    const user = await signUp(options.sequelize, input, options.bcryptCost);
    await signIn(req, user);
    res.status(201).json(await describeMe(user));
  });

  router.post('/login', failedSignIns, async (req, res, next) => {
    body(req, loginBody);
    const user = await authenticate(req, res, next);
    await signIn(req, user);
    res.json({ user });
  });

  router.post('/logout', (req, res, next) => {
    req.logout((error) => {
      if (error) return next(error);
      req.session.destroy((destroyError) => {
        if (destroyError) return next(destroyError);
        res.clearCookie('larderly.sid');
        res.status(204).end();
      });
    });
  });

  router.get('/me', requireUser, async (req, res) => {
    res.json(await describeMe(req.user!));
  });

  return router;
}
