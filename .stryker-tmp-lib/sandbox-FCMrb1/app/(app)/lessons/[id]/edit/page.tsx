// @ts-nocheck
import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { NotFoundError } from "@/lib/errors";
import { getLesson, listStepSources } from "@/db/repo/lessons";
import { toActor } from "@/db/repo/users";
import { personUnits } from "@/lib/units/person";
import { deleteLessonAction, deleteStepAction, moveStepAction, regenerateCodeAction, saveLessonAction, saveStepAction, setPublishedAction } from "../../actions";
import { LessonMetaForm } from "./lesson-meta-form";
import { LessonSettings } from "./lesson-settings";
import { StepList } from "./step-list";

export const metadata: Metadata = { title: "Edit lesson" };

export default async function EditLessonPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser(["instructor", "admin"]);
  const actor = toActor(user);
  const db = getDb();
  const lesson = await getLesson(db, actor, id).catch((e) => {
    if (e instanceof NotFoundError) notFound();
    throw e;
  });
  if (!lesson.canEdit) notFound();
  const sources = await listStepSources(db, actor);

  return (
    <div className="flex flex-col gap-8">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <p className="text-sm text-muted">
            <Link href="/lessons" className="hover:underline">Lessons</Link> / Edit
          </p>
          <h1 className="text-2xl font-semibold">{lesson.title}</h1>
        </div>
        <Link href={`/classroom/${lesson.id}`} className="rounded-md bg-accent px-3 py-1.5 text-sm font-medium text-accent-fg hover:opacity-90">
          Open the classroom view
        </Link>
      </div>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <LessonMetaForm title={lesson.title} summary={lesson.summary} action={saveLessonAction.bind(null, lesson.id)} />
        <LessonSettings
          published={lesson.published}
          classCode={lesson.classCode}
          stepCount={lesson.steps.length}
          setPublished={setPublishedAction.bind(null, lesson.id)}
          regenerate={regenerateCodeAction.bind(null, lesson.id)}
          remove={deleteLessonAction.bind(null, lesson.id)}
        />
      </div>
      <StepList
        steps={lesson.steps}
        sources={sources}
        save={saveStepAction.bind(null, lesson.id)}
        remove={deleteStepAction.bind(null, lesson.id)}
        move={moveStepAction.bind(null, lesson.id)}
        unitSystem={personUnits(user)}
      />
    </div>
  );
}
