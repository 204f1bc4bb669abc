// @ts-nocheck
import "server-only";
import { z } from "zod";

// Parsed once, when a server module first asks. Start and test scripts fill these in.
const schema = z.object({
  DATABASE_URL: z.string().min(1, "DATABASE_URL is required"),
  NEXTAUTH_URL: z.string().url().default("http://localhost:3000"),
  NEXTAUTH_SECRET: z.string().min(16, "AUTH_SECRET (or NEXTAUTH_SECRET) must be at least 16 characters").optional(),
  AUTH_SECRET: z.string().min(16).optional(),
  SMTP_URL: z.string().default("smtp://127.0.0.1:2525"),
  MAIL_FROM: z.string().default("Pulleywright <no-reply@pulleywright.local>"),
  /** The local mail fake's inbox; when set, admins can read captured mail in the app. */
  MAIL_FAKE_URL: z.string().url().optional(),
  /** Secret for signed share links; defaults to a key derived from the auth secret. */
  SHARE_SECRET: z.string().min(16).optional(),
  /** The payment service: secret API key, webhook signing secret, and its address (the local fake by default). */
  STRIPE_SECRET_KEY: z.string().min(1).optional(),
  STRIPE_WEBHOOK_SECRET: z.string().min(1).optional(),
  STRIPE_API_URL: z.string().url().optional(),
  /** How many proxies in front of the app append to X-Forwarded-For; 0 = use the socket address. */
  TRUSTED_PROXY_HOPS: z.coerce.number().int().min(0).max(5).default(0),
  /** Send Strict-Transport-Security; on by default when NEXTAUTH_URL is https. */
  HSTS: z.enum(["on", "off", "auto"]).default("auto"),
});

let parsed: z.infer<typeof schema> | undefined;

export function env() {
  parsed ??= schema.parse(process.env);
  return parsed;
}

export function authSecret(): string {
  const e = env();
  const s = e.AUTH_SECRET ?? e.NEXTAUTH_SECRET;
  if (!s) throw new Error("AUTH_SECRET is not set");
  return s;
}
