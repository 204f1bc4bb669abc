// @ts-nocheck
import Link from "next/link";

export default function NotFound() {
  return (
    <main id="main" className="mx-auto max-w-lg px-4 py-16">
      <h1 className="text-2xl font-semibold">Not found</h1>
      <p className="mt-2 text-muted">There is nothing here, or you do not have access to it.</p>
      <Link href="/" className="mt-4 inline-block underline">
        Back to the start
      </Link>
    </main>
  );
}
