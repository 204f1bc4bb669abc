// @ts-nocheck
"use client";
import { SegmentError, type SegmentErrorProps } from "@/components/segment-error";

export default function CompareError(props: Pick<SegmentErrorProps, "error" | "reset">) {
  return <SegmentError {...props} title="Side by side could not be shown." />;
}
