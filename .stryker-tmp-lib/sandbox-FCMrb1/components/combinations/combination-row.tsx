// @ts-nocheck
"use client";
// One row of the combinations list, with rename in place and a confirmed delete.
import { useMutation } from "@tanstack/react-query";
import Link from "next/link";
import { useId, useState } from "react";
import { formatQuantity, type UnitSystem } from "@/calc";
import { Button } from "@/components/ui/button";
import type { Role } from "@/db/schema";
import { must, type CombinationListActions, type ListedCombination } from "./use-combinations-list";
import { digitsOf } from "@/lib/units/format";
import { useDates } from "@/components/locale";
import { FieldError } from "@/components/ui/field";

export function CombinationRow(props: {
  c: ListedCombination;
  role: Role;
  staff: boolean;
  unitSystem: UnitSystem;
  busy: boolean;
  rename: CombinationListActions["rename"];
  onRenamed: () => void;
  onDuplicate: () => void;
  onDelete: () => void;
}) {
  const { c, role, staff, unitSystem } = props;
  const dates = useDates();
  const [renaming, setRenaming] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const [name, setName] = useState(c.name);
  const inputId = useId();
  const rename = useMutation({
    mutationFn: () => must(props.rename(c.id, name, c.revision)),
    onSuccess: () => {
      setRenaming(false);
      props.onRenamed();
    },
  });
  const eng = formatQuantity("displacement", c.displacement, unitSystem);
  const pulley = formatQuantity("length-small", c.blowerPulleyDiameter, unitSystem);
  // Instructors see the demo examples but may not change them: only duplicate.
  const writable = !(role === "instructor" && c.isDemo);

  return (
    <tr className="border-b border-line last:border-0 align-top">
      <td className="px-3 py-2">
        {renaming ? (
          <form
            className="flex flex-col gap-1"
            onSubmit={(e) => {
              e.preventDefault();
              rename.mutate();
            }}
          >
            <label htmlFor={inputId} className="sr-only">
              New name for {c.name}
            </label>
            <div className="flex gap-1">
              <input
                id={inputId}
                value={name}
                onChange={(e) => setName(e.target.value)}
                maxLength={120}
                required
                autoFocus
                aria-invalid={rename.isError || undefined}
                aria-describedby={rename.isError ? `${inputId}-error` : undefined}
                className="w-56 rounded-md border border-line bg-bg px-2 py-1"
                onKeyDown={(e) => e.key === "Escape" && setRenaming(false)}
              />
              <Button type="submit" disabled={rename.isPending}>
                Save name
              </Button>
              <Button type="button" variant="ghost" onClick={() => setRenaming(false)}>
                Cancel
              </Button>
            </div>
            <FieldError id={`${inputId}-error`}>{rename.isError ? rename.error.message : null}</FieldError>
          </form>
        ) : (
          <Link href={`/combinations/${c.id}`} className="font-medium text-accent underline underline-offset-2">
            {c.name}
          </Link>
        )}
        {c.isDemo ? <span className="ml-2 rounded border border-line px-1 text-xs text-muted">demo</span> : null}
      </td>
      {staff ? (
        <td className="px-3 py-2">
          {c.customerName ?? <span className="text-muted">—</span>}
          {c.customerContact ? <div className="text-xs text-muted">{c.customerContact}</div> : null}
        </td>
      ) : null}
      {role !== "member" ? <td className="px-3 py-2">{c.ownerName || c.ownerEmail}</td> : null}
      <td className="px-3 py-2 text-right">
        {eng.value.toFixed(digitsOf("displacement", unitSystem))} {eng.unit}
      </td>
      <td className="px-3 py-2">{c.blowerKind === "roots" ? "Roots" : "Twin-screw"}</td>
      <td className="px-3 py-2 text-right">
        {pulley.value.toFixed(digitsOf("length-small", unitSystem))} {pulley.unit}
      </td>
      <td className="px-3 py-2 text-right">
        <Link href={`/combinations/${c.id}/revisions`} className="hover:underline" title="History">
          {c.revision}
        </Link>
      </td>
      <td className="px-3 py-2 whitespace-nowrap">
        <time dateTime={c.updatedAt}>{dates.dateTime(c.updatedAt)}</time>
      </td>
      <td className="px-3 py-2">
        <div className="flex flex-wrap justify-end gap-1">
          <Link href={`/combinations/${c.id}`} className="rounded-md px-2 py-1 hover:bg-bg" aria-label={`Open ${c.name}`}>
            Open
          </Link>
          <Link href={`/combinations/${c.id}/revisions`} className="rounded-md px-2 py-1 hover:bg-bg" aria-label={`History of ${c.name}`}>
            History
          </Link>
          {writable ? (
            <Button variant="ghost" onClick={() => (setName(c.name), setRenaming(true))} aria-label={`Rename ${c.name}`}>
              Rename
            </Button>
          ) : null}
          <Button variant="ghost" disabled={props.busy} onClick={props.onDuplicate} aria-label={`Duplicate ${c.name}`}>
            Duplicate
          </Button>
          <a href={`/api/combinations/export?ids=${c.id}`} download className="rounded-md px-2 py-1 hover:bg-bg" aria-label={`Export ${c.name} as JSON`}>
            Export
          </a>
          {writable ? (
            confirmDelete ? (
              <span className="flex items-center gap-1">
                <Button variant="danger" disabled={props.busy} onClick={() => (setConfirmDelete(false), props.onDelete())} aria-label={`Yes, delete ${c.name}`}>
                  Yes, delete
                </Button>
                <Button variant="ghost" onClick={() => setConfirmDelete(false)}>
                  Keep
                </Button>
              </span>
            ) : (
              <Button variant="ghost" className="text-danger" onClick={() => setConfirmDelete(true)} aria-label={`Delete ${c.name}`}>
                Delete
              </Button>
            )
          ) : null}
        </div>
      </td>
    </tr>
  );
}
