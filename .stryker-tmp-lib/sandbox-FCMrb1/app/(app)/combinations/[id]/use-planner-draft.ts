// @ts-nocheck
"use client";
// Drafts: unsaved edits kept in this browser per combination and revision, offered back on return.
import { useEffect, useRef, useState } from "react";
import type { UseFormReturn } from "react-hook-form";
import { unitsFromParam, unitsToParam, type UnitSystem } from "@/calc";
import { convertForm, type PlannerForm } from "@/lib/combinations/form-model";
import { draftKey } from "@/components/planner/use-unsaved-guard";

/** A kept draft; its units as a link parameter ("imperial", "metric~pressure.psi"). */
export type Draft = { system: string; values: PlannerForm; savedAt: number };

type DraftInput = {
  form: UseFormReturn<PlannerForm>;
  canWrite: boolean;
  combinationId: string;
  /** The revision the page opened on (where a kept draft is looked for). */
  openedRevision: number;
  baseRevision: number;
  system: UnitSystem;
  values: PlannerForm;
  /** Changes whenever the values or the units change. */
  valuesKey: string;
  dirty: boolean;
};

export function usePlannerDraft({ form, canWrite, combinationId, openedRevision, baseRevision, system, values, valuesKey, dirty }: DraftInput) {
  const key = draftKey(combinationId, baseRevision);
  const [offer, setOffer] = useState<Draft | null>(null);
  const decided = useRef(false);
  useEffect(() => {
    if (!canWrite) return;
    let found: Draft | null = null;
    try {
      const raw = window.localStorage.getItem(draftKey(combinationId, openedRevision));
      const d = raw ? (JSON.parse(raw) as Draft) : null;
      if (d && d.values && typeof d.system === "string" && /^(imperial|metric)/.test(d.system)) found = d;
    } catch {
      found = null;
    }
    if (found) setOffer(found); // eslint-disable-line react-hooks/set-state-in-effect
    else decided.current = true;
  }, [canWrite, combinationId, openedRevision]);
  useEffect(() => {
    if (!decided.current || !canWrite) return;
    const t = window.setTimeout(() => {
      try {
        if (dirty) window.localStorage.setItem(key, JSON.stringify({ system: unitsToParam(system), values, savedAt: Date.now() } satisfies Draft));
        else window.localStorage.removeItem(key);
      } catch {
        // Private browsing or a full store: the leave warning still guards the edits.
      }
    }, 300);
    return () => window.clearTimeout(t);
  }, [valuesKey, dirty, key, canWrite]); // eslint-disable-line react-hooks/exhaustive-deps

  const restoreDraft = () => {
    if (!offer) return;
    form.reset(convertForm(offer.values, unitsFromParam(offer.system), system));
    decided.current = true;
    setOffer(null);
  };
  const discardDraft = () => {
    try {
      window.localStorage.removeItem(key);
    } catch {
      // nothing to remove
    }
    decided.current = true;
    setOffer(null);
  };
  return { offer, restoreDraft, discardDraft };
}

/** Forgets the draft of a revision once it is saved. */
export function forgetDraft(combinationId: string, revision: number) {
  try {
    window.localStorage.removeItem(draftKey(combinationId, revision));
  } catch {
    // ignore
  }
}
