// @ts-nocheck
import Link from "next/link";

/** What a lesson page shows when the lesson does not exist or is not for this person (no hint which). */
export function LessonNotFound() {
  return (
    <div className="mx-auto max-w-lg py-16">
      <h1 className="text-3xl font-semibold">No such lesson</h1>
      <p className="mt-2 text-muted">It does not exist, it is not published, or you have not joined it. Ask your instructor for the class code.</p>
      <Link href="/lessons/join" className="mt-4 inline-block text-accent underline">
        Join a lesson with a class code
      </Link>
    </div>
  );
}
