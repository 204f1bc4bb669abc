// @ts-nocheck
// The demo parts shelf: invented, generic blowers described by kind and displacement only, and
// crank and blower pulleys under our own part numbers (PW-BP-0340-8: blower pulley, 3.40 in,
// 8-rib; PW-CP-: crank pulley). Prices and stock are invented; some sizes are out of stock.
// Idempotent: only part numbers not yet on the shelf are added, so edits by the admin survive.
import type { Db } from "../connect";
import { Money } from "@/lib/shelf/rules";
import { blowers, pulleys } from "../schema";

const inch = 0.0254;
const litre = 0.001;

/** Blowers matching the demo combinations (lib/combinations/demo-specs.ts), plus one more for the list. */
export const DEMO_BLOWERS = [
  { partNumber: "PW-BL-R160", name: "Roots 1.6 L/rev", kind: "roots", displacementPerRev: 1.6 * litre, builtInVolumeRatio: 1, maxRpm: 14_000, volumetricEfficiencyRef: 0.82, referenceRpm: 10_000, internalEfficiency: 0.85, mechanicalEfficiency: 0.95, price: "2640.00", stock: 2, notes: "Demo blower: generic Roots for V6 and small V8 trucks. Data-sheet slip; one demo truck's logs show more." },
  { partNumber: "PW-BL-R230", name: "Roots 2.3 L/rev", kind: "roots", displacementPerRev: 2.3 * litre, builtInVolumeRatio: 1, maxRpm: 13_000, volumetricEfficiencyRef: 0.8, referenceRpm: 9_000, internalEfficiency: 0.85, mechanicalEfficiency: 0.95, price: "3180.00", stock: 1, notes: "Demo blower: generic Roots, carburettor on top (draw-through) or throttle body ahead." },
  { partNumber: "PW-BL-T290", name: "Twin-screw 2.9 L/rev", kind: "twin-screw", displacementPerRev: 2.9 * litre, builtInVolumeRatio: 1.6, maxRpm: 16_000, volumetricEfficiencyRef: 0.92, referenceRpm: 10_000, internalEfficiency: 0.88, mechanicalEfficiency: 0.95, price: "4650.00", stock: 1, notes: "Demo blower: generic twin-screw for big-inch engines; pair it with an intercooler." },
  { partNumber: "PW-BL-T120", name: "Twin-screw 1.2 L/rev", kind: "twin-screw", displacementPerRev: 1.2 * litre, builtInVolumeRatio: 1.5, maxRpm: 18_000, volumetricEfficiencyRef: 0.9, referenceRpm: 12_000, internalEfficiency: 0.86, mechanicalEfficiency: 0.95, price: "2980.00", stock: 0, notes: "Demo blower: generic twin-screw for four-cylinder road cars. On order." },
] as const;

/** PW-BP-0340-8: position letter, diameter in hundredths of an inch, rib count. */
export function demoPartNumber(position: "crank" | "blower", inches: number, ribs: number) {
  return `PW-${position === "crank" ? "CP" : "BP"}-${String(Math.round(inches * 100)).padStart(4, "0")}-${ribs}`;
}

function sizes(from: number, to: number, step: number) {
  const out: number[] = [];
  for (let x = from; x <= to + 1e-9; x += step) out.push(Math.round(x * 10) / 10);
  return out;
}

/** The demo pulleys, SI. */
export function demoPulleys() {
  const rows: (typeof pulleys.$inferInsert)[] = [];
  const blowerPulley = (inches: number, ribs: number, i: number) => ({
    partNumber: demoPartNumber("blower", inches, ribs),
    position: "blower" as const,
    diameter: inches * inch,
    ribCount: ribs,
    // Invented demo figure for the belt's smallest wrap, not a belt maker's.
    minBeltDiameter: (ribs === 8 ? 2.8 : 2.7) * inch,
    // Smaller pulleys cost a little more to machine (invented).
    price: new Money(ribs === 8 ? "94.00" : "79.00").minus(new Money("1.50").times(i)).toFixed(2),
    stock: (i * 7 + ribs) % 5 === 0 ? 0 : ((i * 3 + ribs) % 6) + 1,
    notes: "",
  });
  sizes(2.6, 4.0, 0.1).forEach((d, i) => rows.push(blowerPulley(d, 8, i)));
  sizes(2.6, 4.0, 0.2).forEach((d, i) => rows.push(blowerPulley(d, 6, i)));
  const crank = [
    { d: 5.5, ribs: 8, price: "189.00", stock: 2 },
    { d: 6.0, ribs: 8, price: "199.00", stock: 2 },
    { d: 6.5, ribs: 8, price: "215.00", stock: 3 },
    { d: 7.0, ribs: 8, price: "229.00", stock: 0 },
    { d: 8.0, ribs: 8, price: "259.00", stock: 1 },
    { d: 5.5, ribs: 6, price: "169.00", stock: 2 },
  ];
  for (const c of crank) {
    rows.push({ partNumber: demoPartNumber("crank", c.d, c.ribs), position: "crank", diameter: c.d * inch, ribCount: c.ribs, minBeltDiameter: null, price: c.price, stock: c.stock, notes: "Balanced crank pulley (demo)." });
  }
  return rows;
}

export async function seedShelf(db: Db) {
  await db
    .insert(blowers)
    .values(DEMO_BLOWERS.map((b) => ({ ...b })))
    .onConflictDoNothing({ target: blowers.partNumber });
  await db.insert(pulleys).values(demoPulleys()).onConflictDoNothing({ target: pulleys.partNumber });
}
