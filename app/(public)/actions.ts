"use server";
import { z } from "zod";
import { act, formFields } from "@/app/_lib/action";
import { type ActionState } from "@/lib/action-state";
import { appUrl, sendMail } from "@/app/_lib/mail";
import { getDb } from "@/db/client";
import { FieldError } from "@/lib/errors";
import { consumeToken, createMember, getUserByEmail, issueToken, setPassword } from "@/db/repo/users";

const email = z.string().trim().toLowerCase().email("Enter a valid e-mail address.").max(200, "E-mail is too long.");
const password = z.string().min(10, "Password must be at least 10 characters.").max(200, "Password is too long.");

const signUpSchema = z.object({ name: z.string().trim().min(1, "Enter your name.").max(100, "Name is too long."), email, password });

/** Sign-up makes a member account; the form then signs in with the same password. */
export async function signUp(_prev: ActionState | undefined, form: FormData): Promise<ActionState> {
  return act(async () => {
    const input = signUpSchema.parse(formFields(form));
    try {
      await createMember(getDb(), input);
    } catch (e) {
      if ((e as { status?: number }).status === 409) throw new FieldError("email", "An account with that e-mail already exists. Sign in instead.");
      throw e;
    }
    return undefined;
  });
}

const SAME_ANSWER = "If an account exists for that address, we have sent it an e-mail. Check your inbox.";

/** E-mails a one-time sign-in link (valid 15 minutes). Answers the same whether or not the account exists. */
export async function requestSignInLink(_prev: ActionState | undefined, form: FormData): Promise<ActionState> {
  const r = await act(async () => {
    const addr = email.parse(formFields(form).email);
    const u = await getUserByEmail(getDb(), addr);
    if (u && !u.disabled) {
      const token = await issueToken(getDb(), u.id, "magic-link", 15);
      const link = appUrl(`/sign-in/link?token=${encodeURIComponent(token)}`);
      await sendMail({
        to: u.email,
        subject: "Your Pulleywright sign-in link",
        text: `Sign in to Pulleywright with this link (valid for 15 minutes, once):\n\n${link}\n\nIf you did not ask for it, ignore this e-mail.`,
        html: `<p>Sign in to Pulleywright with this link (valid for 15 minutes, once):</p><p><a href="${link}">Sign in</a></p><p>If you did not ask for it, ignore this e-mail.</p>`,
      });
    }
  });
  return r.ok ? { ok: true, message: SAME_ANSWER } : r;
}

/** E-mails a password-reset link (valid 30 minutes). */
export async function requestPasswordReset(_prev: ActionState | undefined, form: FormData): Promise<ActionState> {
  const r = await act(async () => {
    const addr = email.parse(formFields(form).email);
    const u = await getUserByEmail(getDb(), addr);
    if (u && !u.disabled) {
      const token = await issueToken(getDb(), u.id, "password-reset", 30);
      const link = appUrl(`/reset-password?token=${encodeURIComponent(token)}`);
      await sendMail({
        to: u.email,
        subject: "Reset your Pulleywright password",
        text: `Choose a new password with this link (valid for 30 minutes, once):\n\n${link}\n\nIf you did not ask for it, ignore this e-mail; your password is unchanged.`,
        html: `<p>Choose a new password with this link (valid for 30 minutes, once):</p><p><a href="${link}">Reset password</a></p><p>If you did not ask for it, ignore this e-mail; your password is unchanged.</p>`,
      });
    }
  });
  return r.ok ? { ok: true, message: SAME_ANSWER } : r;
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
