// @ts-nocheck
import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { copyItemAction } from "@/app/(app)/lessons/actions";
import { requirePageUser } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { NotFoundError } from "@/lib/errors";
import { getLesson } from "@/db/repo/lessons";
import { toActor } from "@/db/repo/users";
import { ClassroomView } from "@/components/lessons/classroom-view";
import { personUnits } from "@/lib/units/person";

export const metadata: Metadata = { title: "Classroom" };

export default async function ClassroomPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ step?: string }> }) {
  const [{ id }, { step }] = await Promise.all([params, searchParams]);
  const user = await requirePageUser();
  const lesson = await getLesson(getDb(), toActor(user), id).catch((e) => {
    if (e instanceof NotFoundError) notFound();
    throw e;
  });
  const start = Math.max(0, (Number.parseInt(typeof step === "string" ? step : "1", 10) || 1) - 1);

  return (
    <div className="flex flex-col gap-4">
      {lesson.canEdit ? (
        <div className="flex flex-wrap items-center gap-3 text-sm">
          <span className={lesson.published ? "text-ok" : "text-warn"}>{lesson.published ? "Published" : "Draft: only you can see it"}</span>
          <span className="text-muted">Students join at Lessons → Join with the class code shown below.</span>
          <Link href={`/lessons/${lesson.id}/edit`} className="text-accent underline underline-offset-2">
            Edit this lesson
          </Link>
        </div>
      ) : null}
      {lesson.canEdit ? (
        <p className="flex flex-wrap items-baseline gap-4" data-testid="classroom-class-code">
          <span className="text-2xl text-muted">Class code</span>
          <span className="font-mono text-5xl font-bold tracking-[0.3em] sm:text-7xl">{lesson.classCode}</span>
        </p>
      ) : null}
      <ClassroomView
        title={lesson.title}
        ownerName={lesson.ownerName}
        steps={lesson.steps}
        unitSystem={personUnits(user)}
        initialStep={start}
        copyItem={copyItemAction.bind(null, lesson.id)}
      />
    </div>
  );
}
