// @ts-nocheck
"use client";
import { SegmentError, type SegmentErrorProps } from "@/components/segment-error";

export default function ClassroomError(props: Pick<SegmentErrorProps, "error" | "reset">) {
  return <SegmentError {...props} title="This lesson could not be shown." reassurance="Nothing was changed." className="m-6" />;
}
