import { Passport } from "passport";
import { Strategy as LocalStrategy } from "passport-local";
import type { AppContext } from "../context";
import type { CheckCredentials } from "./credentials";
import { toPublicUser } from "./public-user";

export type PassportInstance = InstanceType<typeof Passport>;

export interface LoginFailure {
  reason: "invalid" | "throttled" | "unpaid";
  retryAfterS?: number;
}

/**
 * One Passport instance per app (not the global singleton) so isolated test apps don't share
 * strategies. The session stores only the user id; deserializeUser re-reads the user on every
 * request, so a role change applies at once and a disabled user is signed out.
 */
export function createPassport(ctx: AppContext, checkCredentials: CheckCredentials): PassportInstance {
  const passport = new Passport();
  const { User } = ctx.db.models;

  passport.use(
    "local",
    new LocalStrategy(
      { usernameField: "email", passwordField: "password", passReqToCallback: true, session: true },
      (req, email, password, done) => {
        checkCredentials(email, password, req.ip).then((result) => {
          if (result.ok) return done(null, result.user);
          const failure: LoginFailure =
            result.reason === "throttled" ? { reason: "throttled", retryAfterS: result.retryAfterS } : { reason: result.reason };
          return done(null, false, failure as unknown as { message: string });
        }, done);
      },
    ),
  );

  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: unknown, done: (err: unknown, user?: Express.User | false) => void) => {
    if (typeof id !== "number") return done(null, false);
    ctx.db
      .read(() => User.findByPk(id))
      .then((user) => done(null, user && !user.disabledAt ? toPublicUser(user) : false), done);
  });
  return passport;
}
