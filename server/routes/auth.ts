import { Router, type NextFunction, type Request, type Response } from 'express';
import passport from 'passport';
import { loginBody, signupBody, signUpToken } from '../../shared/schemas/auth';
import { BAD_CREDENTIALS } from '../auth/passport';
import { requireUser } from '../auth/guards';
import type { AppContext } from '../context';
import { AppError } from '../http/errors';
import { limit, MINUTE, passwordHashingLimit } from '../http/rate-limits';
import { body, params } from '../http/validate';
import { confirmSignUp, describeMe, requestSignUp } from '../services/accounts';

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

export function authRouter(ctx: AppContext, options: { authLimit: number }) {
  const router = Router();
  // Failed sign-ins count, per address: a household signing in all day is never locked out.
  const failedSignIns = limit(ctx.sequelize, 'failed-sign-in', {
    windowMs: 15 * MINUTE,
    limit: options.authLimit,
    what: 'attempts',
    failuresOnly: true,
  });
  const hashing = passwordHashingLimit(ctx.sequelize, options.authLimit);
  // Tokens are 32 random bytes; the limit keeps guessing slow.
  const confirmations = limit(ctx.sequelize, 'sign-up-confirm', {
    windowMs: 15 * MINUTE,
    limit: 100,
    what: 'sign-up links',
  });

  // The same 202 whether or not the address has an account: only its mailbox learns which.
  router.post('/signup', hashing, async (req, res) => {
    res.status(202).json(await requestSignUp(ctx, body(req, signupBody)));
  });

  // The mailed link's page posts its token: the account and household are made, and the person signed in.
  router.post('/signup/confirm/:token', confirmations, async (req, res) => {
    const { token } = params(req, signUpToken);
    const user = await confirmSignUp(ctx.sequelize, token);
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
