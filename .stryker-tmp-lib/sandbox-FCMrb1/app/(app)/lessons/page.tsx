// @ts-nocheck
import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { canAuthorLessons } from "@/db/policy";
import { listLessons } from "@/db/repo/lessons";
import { toActor } from "@/db/repo/users";
import { ACTIONS_COLUMN, DataTable } from "@/components/ui/data-table";
import { NewLessonForm } from "./new-lesson-form";

export const metadata: Metadata = { title: "Lessons" };

export default async function LessonsPage() {
  const user = await requirePageUser();
  const actor = toActor(user);
  const author = canAuthorLessons(actor);
  const { authored, joined } = await listLessons(getDb(), actor);

  return (
    <div className="flex flex-col gap-8">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-semibold">Lessons</h1>
        <Link href="/lessons/join" className="rounded-md border border-line bg-panel px-3 py-1.5 text-sm font-medium hover:bg-bg">
          Join a lesson with a class code
        </Link>
      </div>

      {author ? (
        <section aria-labelledby="mine" className="flex flex-col gap-4">
          <h2 id="mine" className="text-lg font-semibold">
            {actor.role === "admin" ? "All lessons" : "Your lessons"}
          </h2>
          <NewLessonForm />
          <DataTable
            caption={actor.role === "admin" ? "All lessons" : "Your lessons"}
            rows={authored}
            rowKey={(l) => l.id}
            empty="No lessons yet. Give the first one a title above."
            columns={[
              { label: "Title", cell: (l) => <Link href={`/lessons/${l.id}/edit`} className="font-medium hover:underline">{l.title}</Link> },
              actor.role === "admin" && { label: "Instructor", cell: (l) => l.ownerName },
              { label: "Steps", cellClassName: "tabular-nums", cell: (l) => l.steps },
              { label: "Status", cell: (l) => (l.published ? <span className="text-ok">Published</span> : <span className="text-muted">Draft</span>) },
              { label: "Class code", cellClassName: "font-mono tracking-widest", cell: (l) => l.classCode },
              {
                ...ACTIONS_COLUMN,
                align: "right",
                cellClassName: "whitespace-nowrap",
                cell: (l) => (
                  <>
                    <Link href={`/lessons/${l.id}/edit`} className="mr-3 text-accent underline underline-offset-2">Edit</Link>
                    <Link href={`/classroom/${l.id}`} className="text-accent underline underline-offset-2">Classroom view</Link>
                  </>
                ),
              },
            ]}
          />
        </section>
      ) : null}

      <section aria-labelledby="joined" className="flex flex-col gap-3">
        <h2 id="joined" className="text-lg font-semibold">
          Lessons you joined
        </h2>
        {joined.length === 0 ? (
          <p className="text-sm text-muted">
            None yet. Your instructor gives the class a short code; <Link href="/lessons/join" className="text-accent underline">type it here</Link> to join.
          </p>
        ) : (
          <ul className="flex flex-col gap-2">
            {joined.map((l) => (
              <li key={l.id} className="rounded-lg border border-line bg-panel p-3">
                <Link href={`/classroom/${l.id}`} className="font-medium text-accent underline underline-offset-2">{l.title}</Link>
                <p className="text-sm text-muted">
                  {l.ownerName} · {l.steps} {l.steps === 1 ? "step" : "steps"}
                </p>
                {l.summary ? <p className="mt-1 text-sm">{l.summary}</p> : null}
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
