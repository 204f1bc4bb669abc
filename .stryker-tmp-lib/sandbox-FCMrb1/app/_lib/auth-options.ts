// @ts-nocheck
import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { getDb } from "@/db/client";
import { consumeToken, endAllSessions, getUserById, sessionIsAlive, verifyPassword } from "@/db/repo/users";
import type { User } from "@/db/schema";
import { clientAddress } from "./client-address";
import { authSecret, env } from "./env";

const SESSION_ENDED = "The session was ended (signed out everywhere, new password, or account disabled).";
const signedInAs = (u: User) => ({ id: u.id, email: u.email, name: u.name, sv: u.sessionVersion });

/**
 * Two ways in: e-mail and password, and a one-time link sent by e-mail (its token is checked
 * here, then spent). Sessions are signed JWTs in an httpOnly cookie; the role in them is only a
 * hint: every server entry point reloads the user (see session.ts).
 *
 * Each cookie carries the account's session version (`sv`); sign-out and the other ways of ending
 * sessions bump it, and a cookie with an older one is refused everywhere, including by
 * `/api/auth/session`, which would otherwise renew it for another 30 days.
 */
export function authOptions(): NextAuthOptions {
  const secure = env().NEXTAUTH_URL.startsWith("https://");
  return {
    secret: authSecret(),
    session: { strategy: "jwt", maxAge: 30 * 24 * 60 * 60 },
    useSecureCookies: secure,
    pages: { signIn: "/sign-in", error: "/sign-in" },
    providers: [
      CredentialsProvider({
        id: "password",
        name: "E-mail and password",
        credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
        async authorize(credentials, req) {
          if (!credentials?.email || !credentials.password) return null;
          const result = await verifyPassword(getDb(), credentials.email, credentials.password, clientAddress(req?.headers));
          if (result === "rate-limited") throw new Error("RateLimited");
          if (!result) return null;
          return signedInAs(result);
        },
      }),
      CredentialsProvider({
        id: "link",
        name: "E-mailed sign-in link",
        credentials: { token: { label: "Token", type: "text" } },
        async authorize(credentials) {
          if (!credentials?.token) return null;
          const u = await consumeToken(getDb(), credentials.token, "magic-link");
          return u ? signedInAs(u) : null;
        },
      }),
    ],
    events: {
      // Signing out ends every session of the account, so a copied cookie dies with it.
      async signOut({ token }) {
        if (token?.sub) await endAllSessions(getDb(), token.sub);
      },
    },
    logger: {
      // An ended session is refused on purpose (the cookie is cleared); that is not an error to log.
      error(code, meta) {
        if ((meta as { message?: string })?.message === SESSION_ENDED) return;
        console.error(`[next-auth][error][${code}]`, meta);
      },
      warn(code) {
        console.warn(`[next-auth][warn][${code}]`);
      },
      debug() {},
    },
    callbacks: {
      async jwt({ token, user }) {
        if (user) {
          token.sub = user.id;
          token.sv = (user as { sv?: number }).sv ?? 0;
          return token;
        }
        // Every later use (chiefly /api/auth/session renewing the cookie): the session must still be alive.
        const u = token.sub ? await getUserById(getDb(), token.sub) : undefined;
        if (!sessionIsAlive(u, typeof token.sv === "number" ? token.sv : 0)) throw new Error(SESSION_ENDED);
        return token;
      },
      async session({ session, token }) {
        if (session.user && token.sub) (session.user as { id?: string }).id = token.sub;
        return session;
      },
    },
  };
}
