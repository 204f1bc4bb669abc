// @ts-nocheck
"use server";
import { z } from "zod";
import { headers } from "next/headers";
import { act, formFields } from "@/app/_lib/action";
import { type ActionState } from "@/lib/action-state";
import { clientAddress } from "@/app/_lib/client-address";
import { appUrl } from "@/app/_lib/mail";
import { queueMail } from "@/app/_lib/mail-sender";
import { getDb } from "@/db/client";
import { FieldError } from "@/lib/errors";
import { takeHit } from "@/db/repo/rate-limits";
import { plainText } from "@/lib/validation/text";
import { consumeToken, createMember, getUserByEmail, hashPassword, issueToken, setPassword } from "@/db/repo/users";

const email = z.string().trim().toLowerCase().email("Enter a valid e-mail address.").max(200, "E-mail is too long.");
const password = z.string().min(10, "Password must be at least 10 characters.").max(200, "Password is too long.");

// Limits on e-mail a signed-out visitor can make the app send (the app's own numbers; common
// practice, no published source): per recipient and per client address, in one hour.
const MAILS_PER_RECIPIENT = 3;
const MAILS_PER_ADDRESS = 20;
const HOUR_MS = 3600_000;

const signUpSchema = z.object({ name: plainText("Name", 100).pipe(z.string().min(1, "Enter your name.")), email, password });

/**
 * Sign-up makes a member account; the form then signs in with the same password. An address that
 * already has an account gets the same answer after the same work (a password hash), and its owner
 * an e-mail saying so, so the answer does not tell which addresses have accounts. Limited per
 * client address (the app's own number; common practice, no published source).
 */
export async function signUp(_prev: ActionState | undefined, form: FormData): Promise<ActionState> {
  return act(async () => {
    const input = signUpSchema.parse(formFields(form));
    const db = getDb();
    if (!(await takeHit(db, `sign-up-from:${clientAddress(await headers())}`, 10, HOUR_MS))) {
      throw new FieldError("email", "Too many accounts were made from here in the last hour. Try again later.");
    }
    try {
      await createMember(db, input);
    } catch (e) {
      if ((e as { status?: number }).status !== 409) throw e;
      await hashPassword(input.password);
      if (await takeHit(db, `mail-to:${input.email}`, MAILS_PER_RECIPIENT, HOUR_MS)) {
        await queueMail({
          to: input.email,
          subject: "Someone tried to make a Pulleywright account with your address",
          text: `Someone tried to create a new account with this e-mail address, which already has one.\n\nIf it was you, sign in (${appUrl("/sign-in")}) or reset your password (${appUrl("/forgot-password")}). If not, ignore this e-mail; nothing has changed.`,
        }, db);
      }
    }
    return undefined;
  });
}

const SAME_ANSWER = "If an account exists for that address, we have sent it an e-mail. Check your inbox.";

/**
 * The shared path of the link and reset requests. The same work is done whether or not the
 * account exists (the limits are counted on the typed address), the mail is queued rather than
 * sent while the visitor waits, and the answer is the same: neither words nor time tell whether
 * an address has an account.
 */
async function mailToAccount(form: FormData, kind: "magic-link" | "password-reset", build: (token: string) => { subject: string; text: string; html: string }, ttlMinutes: number): Promise<ActionState> {
  const r = await act(async () => {
    const addr = email.parse(formFields(form).email);
    const db = getDb();
    const from = clientAddress(await headers());
    const allowed = (await takeHit(db, `public-mail-from:${from}`, MAILS_PER_ADDRESS, HOUR_MS)) && (await takeHit(db, `mail-to:${addr}`, MAILS_PER_RECIPIENT, HOUR_MS));
    const u = await getUserByEmail(db, addr);
    if (allowed && u && !u.disabled) {
      // Not awaited: the token and the queued mail are work only an existing account costs, and
      // the answer must not take longer for it.
      void issueToken(db, u.id, kind, ttlMinutes)
        .then((token) => queueMail({ to: u.email, ...build(token) }, db))
        .catch((e) => console.error("[mail] could not queue:", e instanceof Error ? e.message : e));
    }
  });
  return r.ok ? { ok: true, message: SAME_ANSWER } : r;
}

/** E-mails a one-time sign-in link (valid 15 minutes). */
export async function requestSignInLink(_prev: ActionState | undefined, form: FormData): Promise<ActionState> {
  return mailToAccount(form, "magic-link", (token) => {
    const link = appUrl(`/sign-in/link?token=${encodeURIComponent(token)}`);
    return {
      subject: "Your Pulleywright sign-in link",
      text: `Sign in to Pulleywright with this link (valid for 15 minutes, once):\n\n${link}\n\nIf you did not ask for it, ignore this e-mail.`,
      html: `<p>Sign in to Pulleywright with this link (valid for 15 minutes, once):</p><p><a href="${link}">Sign in</a></p><p>If you did not ask for it, ignore this e-mail.</p>`,
    };
  }, 15);
}

/** E-mails a password-reset link (valid 30 minutes); a newer one replaces it. */
export async function requestPasswordReset(_prev: ActionState | undefined, form: FormData): Promise<ActionState> {
  return mailToAccount(form, "password-reset", (token) => {
    const link = appUrl(`/reset-password?token=${encodeURIComponent(token)}`);
    return {
      subject: "Reset your Pulleywright password",
      text: `Choose a new password with this link (valid for 30 minutes, once):\n\n${link}\n\nIf you did not ask for it, ignore this e-mail; your password is unchanged.`,
      html: `<p>Choose a new password with this link (valid for 30 minutes, once):</p><p><a href="${link}">Reset password</a></p><p>If you did not ask for it, ignore this e-mail; your password is unchanged.</p>`,
    };
  }, 30);
}

const resetSchema = z
  .object({ token: z.string().min(10, "The reset link is incomplete."), password, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ." });

export async function resetPassword(_prev: ActionState | undefined, form: FormData): Promise<ActionState> {
  return act(async () => {
    const input = resetSchema.parse(formFields(form));
    const u = await consumeToken(getDb(), input.token, "password-reset");
    if (!u) throw new FieldError("token", "This reset link has expired or was already used. Ask for a new one.");
    await setPassword(getDb(), u.id, input.password);
  });
}
