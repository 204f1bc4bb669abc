// @ts-nocheck
import { redirect } from "next/navigation";

/** A lesson's own address opens its classroom view (read-only for members, with an edit link for its instructor). */
export default async function LessonPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  redirect(`/classroom/${encodeURIComponent(id)}`);
}
