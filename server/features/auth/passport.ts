import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { findSessionUser } from './users.repo';
import { verifyCredentials } from './auth.service';

/** Sessions hold only the user id; each request reads the user and memberships afresh. */
export function configurePassport(bcryptCost: number) {
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, async (email, password, done) => {
      try {
        const userId = await verifyCredentials(email, password, bcryptCost);
        if (userId === null) return done(null, false);
        return done(null, (await findSessionUser(userId)) ?? false);
      } catch (error) {
        return done(error);
      }
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser(async (id: number, done) => {
    try {
      done(null, (await findSessionUser(id)) ?? false);
    } catch (error) {
      done(error);
    }
  });
  return passport;
}
