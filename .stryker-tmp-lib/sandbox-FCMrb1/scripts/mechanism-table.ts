// @ts-nocheck
// Each refinement of the model on and off against the pulley-change response and the net-power
// gain of a 10 % smaller blower pulley, for three demo engines. Prints the Markdown table kept
// in calc/README.md. Run: npx tsx scripts/mechanism-table.ts
import { exampleCombination, exampleTwinScrewCombination, solvePoint, type Combination } from "../calc/index";

const PULLEY_FACTOR = 0.9;

/** The plain model as it was before the refinements: n = 1, everything else off. */
const plain = (c: Combination): Combination => ({
  ...c,
  engine: { ...c.engine, chargeTemperatureExponent: 1, compressionRatio: null, exhaustBackPressure: 0 },
  ambient: { ...c.ambient, inletRestriction: null },
  fuel: { ...c.fuel, evaporatedInBlower: 0, evaporatedInPort: 0 },
});
const temperature = (c: Combination): Combination => ({ ...c, engine: { ...c.engine, chargeTemperatureExponent: 0.5 } });
const residual = (c: Combination): Combination => ({ ...c, engine: { ...c.engine, compressionRatio: 9.5, exhaustBackPressure: 10_000 } });
const restriction = (c: Combination): Combination => ({ ...c, ambient: { ...c.ambient, inletRestriction: { ratedFlow: 0.307 } } }); // ≈ 650 cfm at 1.5 inHg
const drawThrough = (c: Combination): Combination => ({ ...c, fuel: { ...c.fuel, evaporatedBeforeBlower: 0.3, evaporatedInBlower: 0.5 } });
const port = (c: Combination): Combination => ({ ...c, fuel: { ...c.fuel, evaporatedInPort: 0.5 } });

const variants: [string, (c: Combination) => Combination][] = [
  ["plain (n = 1, all off: the model before)", plain],
  ["charge temperature n = 0.5 alone (the default)", (c) => temperature(plain(c))],
  ["residual gas alone (rc 9.5, 10 kPa back pressure)", (c) => residual(plain(c))],
  ["inlet restriction alone (650 cfm at 1.5 inHg)", (c) => restriction(plain(c))],
  ["draw-through alone (30 % before, 50 % in the blower)", (c) => drawThrough(plain(c))],
  ["port cooling alone (50 % in the port)", (c) => port(plain(c))],
  ["default + residual gas", (c) => residual(temperature(plain(c)))],
  ["default + inlet restriction", (c) => restriction(temperature(plain(c)))],
  ["default + draw-through", (c) => drawThrough(temperature(plain(c)))],
  ["default + port cooling", (c) => port(temperature(plain(c)))],
  ["all on", (c) => port(restriction(residual(temperature(plain(c)))))],
];

const engines: [string, Combination][] = [
  ["demo 4.6 L V8, 1.6 L Roots, no intercooler", exampleCombination()],
  ["same V8, 1.2 L twin-screw, no intercooler", { ...exampleTwinScrewCombination(), intercooler: null }],
  ["same V8, 1.2 L twin-screw, intercooled", exampleTwinScrewCombination()],
];

/** Response range (3000 rpm–redline) and mean/min net-power gain (2500 rpm–redline) of a 10 % smaller pulley. */
function measure(c: Combination): string {
  const smaller: Combination = { ...c, drive: { ...c.drive, blowerPulleyDiameter: c.drive.blowerPulleyDiameter * PULLEY_FACTOR } };
  const responses: number[] = [];
  const gains: number[] = [];
  for (let n = 2500; n <= c.engine.redlineRpm; n += 250) {
    try {
      const a = solvePoint(c, n);
      const b = solvePoint(smaller, n);
      if (n >= 3000) responses.push(b.manifoldPressure / a.manifoldPressure / (b.driveRatio / a.driveRatio));
      gains.push(b.netPower / a.netPower - 1);
    } catch {
      return "no balance";
    }
  }
  const pct = (x: number): string => `${x >= 0 ? "+" : ""}${(x * 100).toFixed(1)} %`;
  const mean = gains.reduce((s, g) => s + g, 0) / gains.length;
  return `${pct(Math.min(...responses) - 1)} to ${pct(Math.max(...responses) - 1)}; ${pct(mean)} (min ${pct(Math.min(...gains))})`;
}

console.log(`| mechanism | ${engines.map(([name]) => name).join(" | ")} |`);
console.log(`| --- | ${engines.map(() => "---").join(" | ")} |`);
for (const [label, f] of variants) console.log(`| ${label} | ${engines.map(([, c]) => measure(f(c))).join(" | ")} |`);
