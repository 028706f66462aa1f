import 'server-only';
import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { getDb } from '../../db';
import { SignInInput } from '../schemas/auth';
import { authenticateUser } from '../services/users/authenticate-user';
import { authSecret, env } from '../env';
import { safeNextPath } from '../security/safe-next-path';
import { currentSessionUser, newSessionId, revokeSession, SessionRevokedError } from './session-policy';

export function authOptions(): NextAuthOptions {
  return {
    secret: authSecret(),
    // maxAge is the idle limit (each visit renews it); session-policy adds an absolute limit and the epoch check.
    session: { strategy: 'jwt', maxAge: env().SESSION_MAX_AGE_S },
    jwt: { maxAge: env().SESSION_MAX_AGE_S },
    pages: { signIn: '/sign-in' },
    providers: [
      CredentialsProvider({
        name: 'E-mail and password',
        credentials: { email: { label: 'E-mail', type: 'email' }, password: { label: 'Password', type: 'password' } },
        async authorize(credentials) {
          const parsed = SignInInput.safeParse(credentials ?? {});
          if (!parsed.success) return null;
          const user = await authenticateUser(parsed.data);
          return user ? { id: String(user.id), email: user.email, name: user.name } : null;
        },
      }),
    ],
    callbacks: {
      // The one rule for every URL we follow after sign-in or sign-out: a path on our own origin, else the routes list.
      async redirect({ url, baseUrl }) {
        return new URL(safeNextPath(url, baseUrl), baseUrl).toString();
      },
      async jwt({ token, user }) {
        if (user) {
          const row = await getDb().models.User.findByPk(Number(user.id));
          token.sub = user.id;
          token.epoch = row?.sessionEpoch ?? 0;
          token.authAt = Math.floor(Date.now() / 1000);
          token.sid = newSessionId();
          return token;
        }
        // Throwing makes next-auth clear the cookie: the session was revoked, has hit its absolute limit, or its user is gone.
        if (!(await currentSessionUser(token))) throw new SessionRevokedError('This session has ended. Sign in again.');
        return token;
      },
      async session({ session, token }) {
        if (session.user && token.sub) (session.user as { id?: string }).id = token.sub;
        return session;
      },
    },
    events: {
      // next-auth's sign-out route awaits this before it clears the cookie: the session ends on the server first.
      async signOut({ token }) {
        await revokeSession(token);
      },
    },
    logger: {
      error(code, metadata) {
        // An ended session is expected, not an error worth a stack in the log.
        const cause = (metadata as { error?: unknown } | undefined)?.error ?? metadata;
        if (code === 'JWT_SESSION_ERROR' && (cause as Error | undefined)?.name === 'SessionRevokedError') return;
        console.error(`[next-auth][error][${code}]`, metadata);
      },
    },
  };
}
