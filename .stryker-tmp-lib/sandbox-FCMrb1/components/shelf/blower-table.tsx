// @ts-nocheck
"use client";
// The shelf's blowers: their columns and the kind filter; the rest is the shared shelf list.
import { useState } from "react";
import { fromSI, type UnitSystem, unitLabel } from "@/calc";
import { usePrice } from "@/components/price";
import { BlowerForm, type BlowerJson } from "./blower-form";
import { ShelfList, type ShelfColumn } from "./shelf-list";
import { stockCell, stockClass } from "@/lib/shelf/stock";
import { SelectField } from "@/components/ui/select-field";
import { digitsOf } from "@/lib/units/format";

type Sort = "partNumber" | "name" | "displacementPerRev" | "maxRpm" | "price" | "stock";

const pct = (f: number) => `${Math.round(f * 100)} %`;
const rpm = (n: number) => Math.round(n).toLocaleString("en-US");

function columns(system: UnitSystem, price: (amount: string) => string): ShelfColumn<BlowerJson, Sort>[] {
  return [
    { label: "Part number", sortBy: "partNumber", cell: (b) => b.partNumber, cellClassName: () => "font-mono text-xs" },
    {
      label: "Name",
      sortBy: "name",
      cell: (b) => (
        <>
          {b.name}
          {b.notes ? <span className="block text-xs text-muted">{b.notes}</span> : null}
        </>
      ),
    },
    { label: "Kind", cell: (b) => (b.kind === "roots" ? "Roots" : "Twin-screw") },
    {
      label: "Displacement",
      unit: unitLabel("blower-displacement", system),
      sortBy: "displacementPerRev",
      align: "right",
      cell: (b) => fromSI("blower-displacement", b.displacementPerRev, system).toFixed(digitsOf("blower-displacement", system)),
    },
    { label: "Volume ratio", align: "right", cell: (b) => b.builtInVolumeRatio.toFixed(2) },
    { label: "Speed limit", unit: "rpm", sortBy: "maxRpm", align: "right", cell: (b) => rpm(b.maxRpm) },
    {
      label: "Efficiencies",
      unit: "VE @ rpm / internal / drive",
      title: "Reference volumetric efficiency at the reference speed; internal and drive efficiencies",
      align: "right",
      cell: (b) => `${pct(b.volumetricEfficiencyRef)} @ ${rpm(b.referenceRpm)} / ${pct(b.internalEfficiency)} / ${pct(b.mechanicalEfficiency)}`,
    },
    { label: "Price", sortBy: "price", align: "right", cell: (b) => price(b.price), testId: "price" },
    { label: "Stock", sortBy: "stock", align: "right", cell: stockCell, cellClassName: stockClass },
  ];
}

export function BlowerTable({ system, isAdmin }: { system: UnitSystem; isAdmin: boolean }) {
  const [kind, setKind] = useState("");
  const price = usePrice();
  return (
    <ShelfList<BlowerJson, Sort>
      kind="blowers"
      names={["Blower", "Blowers"]}
      searchHint="Name, part number or notes"
      filters={<SelectField id="blower-kind" label="Kind" value={kind} onChange={setKind} options={[["", "Roots and twin-screw"], ["roots", "Roots"], ["twin-screw", "Twin-screw"]]} />}
      filterParams={{ kind }}
      defaultSort={{ sort: "displacementPerRev", dir: "asc" }}
      columns={columns(system, price)}
      rowClassName="align-top"
      form={(p) => <BlowerForm system={system} {...p} />}
      isAdmin={isAdmin}
    />
  );
}
