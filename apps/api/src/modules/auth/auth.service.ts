import passport from 'passport';
import { Strategy as GitHubStrategy, type Profile } from 'passport-github2';
import type { DataSource } from 'typeorm';
import type { Env } from '../../config/env';
import { findSessionUser, signInFromProfile } from '../users/users.service';

/**
 * Configures passport with the GitHub OAuth strategy. Its endpoints come from config, so that
 * development and tests use the local stand-in provider and production the hosted service.
 */
export function configurePassport(ds: DataSource, env: Env): passport.PassportStatic {
  const p = new passport.Passport();
  p.use(
    new GitHubStrategy(
      {
        clientID: env.GITHUB_CLIENT_ID,
        clientSecret: env.GITHUB_CLIENT_SECRET,
        callbackURL: new URL('/auth/github/callback', env.PUBLIC_URL).toString(),
        authorizationURL: env.GITHUB_AUTHORIZATION_URL,
        tokenURL: env.GITHUB_TOKEN_URL,
        userProfileURL: env.GITHUB_PROFILE_URL,
        userEmailURL: env.GITHUB_EMAILS_URL,
        scope: ['user:email'],
        // passport-oauth2 keeps the OAuth state in the session when given `true`; the types say string.
        state: true as unknown as string,
      },
      (_accessToken: string, _refreshToken: string, profile: Profile, done: (err: unknown, user?: Express.User) => void) => {
        signInFromProfile(
          ds,
          {
            providerId: profile.id,
            login: profile.username ?? `user-${profile.id}`,
            displayName: profile.displayName || null,
            email: profile.emails?.[0]?.value ?? null,
          },
          env.FIRST_ADMIN_LOGIN,
        ).then(
          (user) => done(null, user),
          (err: unknown) => done(err),
        );
      },
    ),
  );
  p.serializeUser((user, done) => done(null, user.id));
  // Read the user on every request, so a role change counts at once.
  p.deserializeUser((id: string, done) => {
    findSessionUser(ds, id).then(
      (user) => done(null, user ?? false),
      (err: unknown) => done(err),
    );
  });
  return p as unknown as passport.PassportStatic;
}
