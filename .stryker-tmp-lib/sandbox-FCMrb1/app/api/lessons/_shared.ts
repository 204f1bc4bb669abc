// @ts-nocheck
import "server-only";
import type { LessonView } from "@/db/repo/lessons";

/** Route context of /api/lessons/[id]/… (params are a Promise in current Next.js). */
export type LessonContext = { params: Promise<{ id: string }> };
export type StepContext = { params: Promise<{ id: string; stepId: string }> };

/** A lesson as the API shows it: the class code only to those who may edit the lesson. */
export function lessonJson(l: LessonView) {
  return l.canEdit ? l : { ...l, classCode: null };
}
