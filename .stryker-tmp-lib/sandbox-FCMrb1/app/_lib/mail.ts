// @ts-nocheck
import "server-only";
import nodemailer from "nodemailer";
import { env } from "./env";

let transport: nodemailer.Transporter | undefined;

/** Sends one message through the configured SMTP server (the local mail fake in development and tests). */
export async function sendMail(msg: { to: string; subject: string; text: string; html?: string; attachments?: nodemailer.SendMailOptions["attachments"] }) {
  transport ??= nodemailer.createTransport(env().SMTP_URL, { connectionTimeout: 5_000, greetingTimeout: 5_000, socketTimeout: 10_000 });
  return transport.sendMail({ from: env().MAIL_FROM, ...msg });
}

/** Absolute URL of a path in this app, for links in e-mails. */
export function appUrl(path: string) {
  return new URL(path, env().NEXTAUTH_URL).toString();
}
