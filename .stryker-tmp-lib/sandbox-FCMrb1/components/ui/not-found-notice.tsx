// @ts-nocheck
// The body of a "no such …" page: what is missing, why it may be, and the way back to the list.
import Link from "next/link";

export function NotFoundNotice({ title, why, href, back }: { title: string; why: string; href: string; back: string }) {
  return (
    <div className="flex flex-col gap-3">
      <h1 className="text-2xl font-semibold">{title}</h1>
      <p className="text-muted">{why}</p>
      <Link href={href} className="underline">
        {back}
      </Link>
    </div>
  );
}
