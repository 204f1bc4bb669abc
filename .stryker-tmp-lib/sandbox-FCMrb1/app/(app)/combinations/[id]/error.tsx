// @ts-nocheck
"use client";
import { SegmentError, type SegmentErrorProps } from "@/components/segment-error";

export default function PlannerError(props: Pick<SegmentErrorProps, "error" | "reset">) {
  return <SegmentError {...props} title="The planner could not be shown." reassurance="Nothing you saved was changed; unsaved edits are kept in this browser." back={{ href: "/combinations", label: "Back to combinations" }} />;
}
