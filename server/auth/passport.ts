import type { Request } from 'express';
import { Passport } from 'passport';
import { Strategy as GitHubStrategy, type Profile as GitHubProfile, type StrategyOptionsWithRequest } from 'passport-github2';
import { Strategy as LocalStrategy } from 'passport-local';
import type { User as UserModel } from '../models/User';
import { authenticateWithPassword, type AccountDeps } from '../services/accounts';
import { linkGithub, signInWithGithub, type GithubProfile } from '../services/githubAccounts';
import { clientKeyFor } from '../services/signInThrottle';
import { FAKE_GITHUB_MOUNT } from './fakeGithub';
import { sessionUserHandoff } from './sessionUser';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // req.user is the racer's model row, loaded fresh for every request.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends UserModel {}
  }
}

type RawEmail = { value: string; primary?: boolean; verified?: boolean };

function toGithubProfile(profile: GitHubProfile): GithubProfile {
  const emails = (profile.emails ?? []) as RawEmail[];
  const verified = emails.find((e) => e.primary && e.verified) ?? emails.find((e) => e.verified);
  return {
    id: String(profile.id),
    login: profile.username ?? `github-${profile.id}`,
    name: profile.displayName || null,
    verifiedEmail: verified?.value ?? null,
  };
}

/** A passport instance per app (tests build many apps): local and GitHub strategies, sessions by id. */
export function createPassport(deps: AccountDeps) {
  const passport = new Passport();
  passport.use(
    new LocalStrategy({ usernameField: 'login', passwordField: 'password', passReqToCallback: true }, (req, login, password, done) => {
      authenticateWithPassword(deps, login, password, clientKeyFor(req.ip)).then((user) => done(null, user), done);
    }),
  );

  const github = deps.config.github;
  if (github) {
    const fakeBase = `${deps.config.publicUrl}${FAKE_GITHUB_MOUNT}`;
    passport.use(
      new GitHubStrategy(
        {
          clientID: github.clientId,
          clientSecret: github.clientSecret,
          callbackURL: `${deps.config.publicUrl}/api/auth/github/callback`,
          scope: ['user:email'],
          // passport-oauth2 keeps a random state in the session and checks it on return (CSRF on
          // the callback); its typings only allow a fixed string here, hence the cast below.
          state: true,
          allRawEmails: true,
          passReqToCallback: true,
          ...(github.useFakeProvider
            ? {
                authorizationURL: `${fakeBase}/login/oauth/authorize`,
                tokenURL: `${fakeBase}/login/oauth/access_token`,
                userProfileURL: `${fakeBase}/api/user`,
                userEmailURL: `${fakeBase}/api/user/emails`,
              }
            : {}),
        } as unknown as StrategyOptionsWithRequest,
        (req: Request, _accessToken: string, _refreshToken: string, profile: GitHubProfile, done: (err: unknown, user?: Express.User | false) => void) => {
          const p = toGithubProfile(profile);
          const result = req.user ? linkGithub(deps, req.user, p) : signInWithGithub(deps, p);
          result.then((user) => done(null, user), (err: unknown) => done(err));
        },
      ),
    );
  }

  passport.serializeUser((user, done) => done(null, user.id));
  const handoff = sessionUserHandoff(deps.db);
  passport.deserializeUser((id: number, done) => {
    // Usually read with the session a moment ago (sessionUser.ts); otherwise read now.
    // Only ever a user id we wrote; anything else names nobody rather than failing the request.
    if (!Number.isInteger(id) || id < 1 || id > 2_147_483_647) return done(null, false);
    const loaded = handoff.take(id);
    if (loaded) return done(null, loaded.isSuspended() ? false : loaded);
    deps.db.models.User.findByPk(id).then(
      // A suspended racer's existing sessions stop working at once.
      (user) => done(null, user && !user.isSuspended() ? user : false),
      (err: unknown) => done(err),
    );
  });
  return passport;
}

export type TunePassport = ReturnType<typeof createPassport>;
