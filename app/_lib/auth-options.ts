import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { getDb } from "@/db/client";
import { consumeToken, verifyPassword } from "@/db/repo/users";
import { authSecret, env } from "./env";

function clientIp(headers: Record<string, unknown> | undefined): string {
  const fwd = headers?.["x-forwarded-for"];
  const first = typeof fwd === "string" ? fwd.split(",")[0]?.trim() : undefined;
  const real = headers?.["x-real-ip"];
  return first || (typeof real === "string" ? real : "") || "local";
}

/**
 * Two ways in: e-mail and password, and a one-time link sent by e-mail (its token is checked
 * here, then spent). Sessions are signed JWTs in an httpOnly cookie; the role in them is only a
 * hint: every server entry point reloads the user (see session.ts).
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
          const result = await verifyPassword(getDb(), credentials.email, credentials.password, clientIp(req?.headers));
          if (result === "rate-limited") throw new Error("RateLimited");
          if (!result) return null;
          return { id: result.id, email: result.email, name: result.name };
        },
      }),
      CredentialsProvider({
        id: "link",
        name: "E-mailed sign-in link",
        credentials: { token: { label: "Token", type: "text" } },
        async authorize(credentials) {
          if (!credentials?.token) return null;
          const u = await consumeToken(getDb(), credentials.token, "magic-link");
          return u ? { id: u.id, email: u.email, name: u.name } : null;
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
