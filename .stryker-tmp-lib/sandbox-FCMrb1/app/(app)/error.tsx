// @ts-nocheck
"use client";
import { SegmentError, type SegmentErrorProps } from "@/components/segment-error";

export default function AppError(props: Pick<SegmentErrorProps, "error" | "reset">) {
  return <SegmentError {...props} title="This page could not be shown." />;
}
