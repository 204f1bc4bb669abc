// @ts-nocheck
"use client";
import { SegmentError, type SegmentErrorProps } from "@/components/segment-error";

export default function CombinationsError(props: Pick<SegmentErrorProps, "error" | "reset">) {
  return <SegmentError {...props} title="Your combinations could not be shown." back={{ href: "/combinations", label: "Back to the list" }} />;
}
