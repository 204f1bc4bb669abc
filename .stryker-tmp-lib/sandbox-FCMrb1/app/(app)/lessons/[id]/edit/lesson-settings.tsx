// @ts-nocheck
"use client";
// Publishing, the class code and deleting the lesson.
import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TitledSection } from "@/components/ui/titled-section";

type Result = { ok: true } | { ok: false; message: string };
type LessonSettingsProps = {
  published: boolean;
  classCode: string;
  stepCount: number;
  setPublished: (published: boolean) => Promise<Result>;
  regenerate: () => Promise<Result>;
  remove: () => Promise<Result>;
};

export function LessonSettings({ published, classCode, stepCount, setPublished, regenerate, remove }: LessonSettingsProps) {
  const [pending, start] = useTransition();
  const [message, setMessage] = useState<string | null>(null);
  const run = (fn: () => Promise<Result>, done?: string) =>
    start(async () => {
      const r = await fn();
      setMessage(r.ok ? (done ?? null) : r.message);
    });

  return (
    <TitledSection id="lesson-settings" title="Class" className="flex flex-col gap-3 rounded-lg border border-line bg-panel p-4">
      <p className="text-sm" data-testid="lesson-status">
        Status: {published ? <strong className="text-ok">Published</strong> : <strong className="text-muted">Draft, visible only to you</strong>}
      </p>
      <Button type="button" variant={published ? "secondary" : "primary"} disabled={pending || (!published && stepCount === 0)} onClick={() => run(() => setPublished(!published))} className="self-start">
        {published ? "Unpublish" : "Publish"}
      </Button>
      {!published && stepCount === 0 ? <p className="text-xs text-muted">Add a step before publishing.</p> : null}
      <div>
        <p className="text-sm text-muted">Class code</p>
        <p className="font-mono text-3xl tracking-[0.3em] tabular-nums" data-testid="class-code">
          {classCode}
        </p>
        <p className="text-xs text-muted">Members join at /lessons/join with this code.</p>
      </div>
      <Button type="button" variant="secondary" disabled={pending} onClick={() => run(regenerate, "A new class code is ready; the old one no longer works for new joiners.")} className="self-start">
        New class code
      </Button>
      {message ? <Notice tone="info">{message}</Notice> : null}
      <Button
        type="button"
        variant="danger"
        disabled={pending}
        className="mt-2 self-start"
        onClick={() => {
          if (window.confirm("Delete this lesson and all its steps? Members lose access to it.")) run(remove);
        }}
      >
        Delete lesson
      </Button>
    </TitledSection>
  );
}
