// @ts-nocheck
// A step item as the classroom receives it (a snapshot with an optional what-if), for tests of
// the pure lesson helpers.
import { combinationSchema, type CombinationInput } from "@/calc";
import type { ItemChange, StepItemSnapshot } from "@/lib/lessons/rules";

export const snapshotItem = (label: string, spec: CombinationInput, change: ItemChange | null = null): StepItemSnapshot => ({
  combinationId: "00000000-0000-4000-8000-000000000000",
  revision: 1,
  label,
  name: label,
  spec: combinationSchema.parse(spec),
  change,
});
