// @ts-nocheck
"use client";
import { Button } from "@/components/ui/button";

/** Opens the browser's print dialogue (the print stylesheet makes it one page). */
export function PrintButton({ label = "Print" }: { label?: string }) {
  return (
    <Button type="button" onClick={() => window.print()}>
      {label}
    </Button>
  );
}
