import type { IncomingMessage } from 'node:http';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { User } from '../db/models';
import { checkPassword } from './passwords';
import { PERSON, type SessionPerson } from './session';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface User {
      id: string;
      email: string;
      name: string;
    }
  }
}

export const BAD_CREDENTIALS = 'That e-mail and password do not match an account. Check both and try again.';

/** `bcryptCost`: the cost new accounts are hashed at, which an unknown address's comparison takes as long as. */
export function configurePassport(bcryptCost: number) {
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, async (email, password, done) => {
      try {
        const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
        const ok = await checkPassword(password, user?.passwordHash, bcryptCost);
        done(null, ok && user ? user.toPublic() : false, { message: BAD_CREDENTIALS });
      } catch (error) {
        done(error);
      }
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  // The session read already joined the person (see session.ts); only the columns a request needs.
  passport.deserializeUser(
    async (req: IncomingMessage, id: string, done: (error: unknown, user?: Express.User | false) => void) => {
      const joined = (req as IncomingMessage & { session?: { passport?: { [PERSON]?: SessionPerson } } }).session
        ?.passport;
      if (joined && PERSON in joined) return done(null, joined[PERSON]?.id === id ? joined[PERSON]! : false);
      try {
        const user = await User.findByPk(id, { attributes: ['id', 'email', 'name'] });
        done(null, user ? user.toPublic() : false);
      } catch (error) {
        done(error);
      }
    },
  );
  return passport;
}
