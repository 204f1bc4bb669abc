// @ts-nocheck
// The local mail fake's inbox, as the e2e tests read it (MAIL_FAKE_URL, set by the test runner).
export type InboxMail = { subject: string; text: string; html: string };

/** Mail to `to` (optionally only subjects matching), waiting up to `wait` ms for the first. */
export async function inbox(to: string, opts: { subject?: RegExp; wait?: number } = {}): Promise<InboxMail[]> {
  const until = Date.now() + (opts.wait ?? 15_000);
  for (;;) {
    const list = (await (await fetch(`${process.env.MAIL_FAKE_URL ?? ""}/messages?to=${encodeURIComponent(to)}`)).json()) as InboxMail[];
    const found = opts.subject ? list.filter((m) => opts.subject!.test(m.subject)) : list;
    if (found.length || Date.now() > until) return found;
    await new Promise((r) => setTimeout(r, 300));
  }
}
