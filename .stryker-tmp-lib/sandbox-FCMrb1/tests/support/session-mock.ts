// @ts-nocheck
// For integration tests that run route handlers and server actions for real: only "who is signed
// in" and "which database" are supplied, plus a mail stub. The session is read as
// app/_lib/session.ts reads it (next-auth's cookie, decrypted by next-auth/jwt), with the user id
// in `session.userId`. Call it before importing the handlers, which the tests import dynamically.
import { vi } from "vitest";

export type SentMail = { to: string; subject: string; text: string; attachments?: { filename: string }[] };
/** `sv`: the session version the cookie was made with (none, as in cookies from before versions, when unset). */
export type MockSession = { db: unknown; userId: string | null; sv?: number; mails: SentMail[] };

export function mockSession(): MockSession {
  const session: MockSession = { db: undefined, userId: null, mails: [] };
  vi.doMock("@/db/client", () => ({ getDb: () => session.db }));
  vi.doMock("@/app/_lib/auth-options", () => ({ authOptions: () => ({}) }));
  vi.doMock("@/app/_lib/env", () => ({
    authSecret: () => "a-test-secret-of-enough-length",
    env: () => ({
      NEXTAUTH_URL: "http://127.0.0.1:1",
      SMTP_URL: "smtp://127.0.0.1:1",
      MAIL_FROM: "test@example.com",
      // A test that starts the payment fake sets these before it imports the handlers.
      STRIPE_SECRET_KEY: process.env.STRIPE_SECRET_KEY,
      STRIPE_WEBHOOK_SECRET: process.env.STRIPE_WEBHOOK_SECRET,
      STRIPE_API_URL: process.env.STRIPE_API_URL,
    }),
  }));
  vi.doMock("@/app/_lib/mail", () => ({
    sendMail: async (m: SentMail) => {
      session.mails.push({ to: m.to, subject: m.subject, text: m.text, attachments: m.attachments?.map((a) => ({ filename: a.filename })) });
      return {};
    },
    appUrl: (p: string) => `http://127.0.0.1:1${p}`,
  }));
  vi.doMock("next/headers", () => ({
    cookies: async () => ({
      get: (name: string) => (session.userId && name === "next-auth.session-token" ? { value: "session" } : undefined),
      getAll: () => [],
      has: () => false,
    }),
    headers: async () => new Headers(),
  }));
  vi.doMock("next-auth/jwt", () => ({ decode: async () => (session.userId ? { sub: session.userId, ...(session.sv === undefined ? {} : { sv: session.sv }) } : null) }));
  vi.doMock("next/cache", () => ({ revalidatePath: () => {}, revalidateTag: () => {} }));
  return session;
}
