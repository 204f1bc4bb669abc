// @ts-nocheck
import type { Metadata } from "next";
import { requirePageUser } from "@/app/_lib/session";
import { NewCombinationForm } from "@/components/combinations/new-combination-form";
import { TEMPLATES } from "@/lib/combinations/templates";
import { specRows } from "@/lib/combinations/spec-fields";
import { createCombinationAction } from "../actions";
import { BackLink } from "@/components/ui/back-link";
import { personUnits } from "@/lib/units/person";

export const metadata: Metadata = { title: "New combination" };

const SUMMARY = ["engine.displacement", "blower.kind", "blower.displacementPerRev", "drive.crankPulleyDiameter", "drive.blowerPulleyDiameter"];

export default async function NewCombinationPage() {
  const user = await requirePageUser();
  const staff = user.role === "tuner" || user.role === "sales" || user.role === "admin";
  // A short description of each starting point, in the person's units.
  const templates = TEMPLATES.map((t) => ({
    key: t.key,
    label: t.label,
    summary: specRows(t.spec, personUnits(user))
      .filter((r) => SUMMARY.includes(r.path))
      .map((r) => `${r.label}: ${r.value}`)
      .join(" · "),
  }));
  return (
    <div className="max-w-2xl">
      <BackLink href="/combinations" label="Combinations" className="mb-2 text-sm" linkClassName="underline" />
      <h1 className="mb-1 text-2xl font-semibold">New combination</h1>
      <p className="mb-6 text-sm text-muted">
        Pick a starting point (or a blank start), type the main figures you know, and give it a name; the planner opens next, where you change the engine, blower and pulleys to
        match the real car. The starting points are invented demo values.
      </p>
      <NewCombinationForm templates={templates} units={personUnits(user)} staff={staff} createAction={createCombinationAction} />
    </div>
  );
}
