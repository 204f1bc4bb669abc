// @ts-nocheck
"use client";
// The shelf's pulleys: their columns and the position and rib filters; the rest is the shared shelf list.
import { useState } from "react";
import { fromSI, type UnitSystem, unitLabel } from "@/calc";
import { usePrice } from "@/components/price";
import { PulleyForm, type PulleyJson } from "./pulley-form";
import { ShelfList, type ShelfColumn } from "./shelf-list";
import { stockCell, stockClass } from "@/lib/shelf/stock";
import { SelectField } from "@/components/ui/select-field";
import { digitsOf } from "@/lib/units/format";

type Sort = "partNumber" | "diameter" | "ribCount" | "price" | "stock";

function columns(system: UnitSystem, price: (amount: string) => string): ShelfColumn<PulleyJson, Sort>[] {
  const unit = unitLabel("length-small", system);
  const len = (m: number) => fromSI("length-small", m, system).toFixed(digitsOf("length-small", system));
  return [
    { label: "Part number", sortBy: "partNumber", cell: (p) => p.partNumber, cellClassName: () => "font-mono text-xs" },
    { label: "Position", cell: (p) => (p.position === "crank" ? "Crank" : "Blower") },
    { label: "Diameter", unit, sortBy: "diameter", align: "right", cell: (p) => len(p.diameter) },
    { label: "Ribs", sortBy: "ribCount", align: "right", cell: (p) => p.ribCount },
    { label: "Belt minimum", unit, align: "right", cell: (p) => (p.minBeltDiameter === null ? "–" : len(p.minBeltDiameter)) },
    { label: "Price", sortBy: "price", align: "right", cell: (p) => price(p.price), testId: "price" },
    { label: "Stock", sortBy: "stock", align: "right", cell: stockCell, cellClassName: stockClass },
  ];
}

export function PulleyTable({ system, isAdmin }: { system: UnitSystem; isAdmin: boolean }) {
  const [position, setPosition] = useState("");
  const [ribCount, setRibCount] = useState("");
  const price = usePrice();
  return (
    <ShelfList<PulleyJson, Sort>
      kind="pulleys"
      names={["Pulley", "Pulleys"]}
      searchHint="Part number or notes"
      filters={
        <>
          <SelectField id="pulley-position" label="Position" value={position} onChange={setPosition} options={[["", "Crank and blower"], ["blower", "Blower"], ["crank", "Crank"]]} />
          <SelectField id="pulley-ribs" label="Ribs" value={ribCount} onChange={setRibCount} options={[["", "Any"], ["6", "6-rib"], ["8", "8-rib"], ["10", "10-rib"]]} />
        </>
      }
      filterParams={{ position, ribCount }}
      defaultSort={{ sort: "diameter", dir: "asc" }}
      columns={columns(system, price)}
      form={(p) => <PulleyForm system={system} {...p} />}
      isAdmin={isAdmin}
    />
  );
}
