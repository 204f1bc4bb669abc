/** Why a link opened no sheet: the share-link verdicts (app/_lib/share-link.ts), a stopped link or a removed sheet. */
// @ts-nocheck

export type LinkRefusalReason = "expired" | "forged" | "malformed" | "gone" | "revoked";
type Reason = LinkRefusalReason;

const TEXT: Record<Reason, { title: string; body: string }> = {
  expired: { title: "This link has expired", body: "Links to a recommendation sheet work for a limited time. Ask the shop to send you a new one." },
  forged: { title: "This link is not valid", body: "The link may have been changed or cut short. Open it again from the e-mail, copying the whole address, or ask the shop for a new one." },
  malformed: { title: "This link is not valid", body: "The link may have been changed or cut short. Open it again from the e-mail, copying the whole address, or ask the shop for a new one." },
  revoked: { title: "This link was withdrawn", body: "The shop has stopped the links to this sheet. Ask the shop for a new one." },
  gone: { title: "This sheet is no longer available", body: "The shop has removed it. Ask the shop for a new recommendation." },
};

/** What a customer sees when a share link does not open a sheet: plain words, no detail of why beyond that. */
export function LinkRefused({ reason }: { reason: Reason }) {
  const t = TEXT[reason];
  return (
    <section className="mx-auto flex max-w-lg flex-col gap-3 py-10" data-testid="link-refused" data-reason={reason}>
      <h1 className="text-2xl font-semibold">{t.title}</h1>
      <p className="text-muted">{t.body}</p>
    </section>
  );
}
