import 'server-only';
import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { SignInInput } from '../schemas/auth';
import { authenticateUser } from '../services/users/authenticate-user';
import { authSecret, env } from '../env';

export function authOptions(): NextAuthOptions {
  return {
    secret: authSecret(),
    session: { strategy: 'jwt', maxAge: env().SESSION_MAX_AGE_S },
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
      async jwt({ token, user }) {
        if (user) token.sub = user.id;
        return token;
      },
      async session({ session, token }) {
        if (session.user && token.sub) (session.user as { id?: string }).id = token.sub;
        return session;
      },
    },
  };
}
