// @ts-nocheck
// The demo lesson's notes, written from the model at seed time: every figure in them is what
// calc predicts for the very specs the steps show, so the text and the curves cannot disagree.
// The words that depend on a direction (rises or falls) are chosen from the figures too.
import { combinationSchema, paToPsi, solvePoint, wToHp, type CombinationInput, type OperatingPoint } from "@/calc";

const at = (spec: CombinationInput, rpm: number): OperatingPoint => solvePoint(combinationSchema.parse(spec), rpm);
const psi = (p: OperatingPoint) => `${paToPsi(p.boostGauge).toFixed(1)} psi`;
const hp = (p: OperatingPoint) => `${Math.round(wToHp(p.netPower))} hp`;
const rpm = (n: number) => `${n.toLocaleString("en-US")} rpm`;
const moved = (a: number, b: number, up: string, down: string) => (b > a ? up : down);

/** Step 1: a Roots and a twin-screw, each across its rev range, at a low and a high engine speed. */
export function rootsAgainstTwinScrewNote(roots: CombinationInput, twinScrew: CombinationInput, low: number, high: number): string {
  const [r1, r2, t1, t2] = [at(roots, low), at(roots, high), at(twinScrew, low), at(twinScrew, high)];
  return `Two engines, two kinds of blower. Follow each **boost** line from left to right.

- The work truck's **Roots** blower moves air without squeezing it inside, and it leaks less of it back the faster it spins: ${psi(r1)} at ${rpm(low)}, ${psi(r2)} at ${rpm(high)}.
- The big-inch V8's **twin-screw** compresses the air inside its rotors, and its boost is much flatter: ${psi(t1)} at ${rpm(low)}, ${psi(t2)} at ${rpm(high)}.

Boost is not a setting on the blower. It is the pressure at which what the blower delivers equals what the engine takes in.`;
}

/** Step 2: the same blower and pulleys, a cam that lets the engine breathe better at speed. */
export function camChangeNote(before: CombinationInput, after: CombinationInput, speed: number): string {
  const [a, b] = [at(before, speed), at(after, speed)];
  return `The vintage V8 keeps its blower, carburettor and pulleys; only the **cam** is new.

- At ${rpm(speed)} the engine now fills its cylinders better (VE ${(a.engineVolumetricEfficiency * 100).toFixed(0)} % before, ${(b.engineVolumetricEfficiency * 100).toFixed(0)} % after), so it takes in more of what the blower delivers.
- Less air waits in the manifold, so boost ${moved(a.boostGauge, b.boostGauge, "rises", "drops")}: ${psi(a)} before, ${psi(b)} after.
- Net power ${moved(a.netPower, b.netPower, "goes up", "goes down")}: ${hp(a)} before, ${hp(b)} after. More air passes through the engine, and the blower needs less work to push it.

A lower gauge reading after a cam or head change is no fault. Judge the change by power and air, not by the boost figure.`;
}

/** Step 3: a smaller blower pulley on the same engine, at a low and a high speed, and the blower's speed at redline. */
export function smallerPulleyNote(before: CombinationInput, after: CombinationInput, low: number, high: number): string {
  const c = combinationSchema.parse(after);
  const redline = c.engine.redlineRpm;
  const [a1, a2, b1, b2] = [at(before, low), at(before, high), at(after, low), at(after, high)];
  const top = at(after, redline);
  const inches = (m: number) => `${(m / 0.0254).toFixed(1)} in`;
  return `The work truck's first dyno log read lower than the catalogue figures promised: its blower slips more than the data sheet says. The shop fitted a **smaller blower pulley**, ${inches(combinationSchema.parse(before).drive.blowerPulleyDiameter)} to ${inches(c.drive.blowerPulleyDiameter)}.

- The blower now turns faster at every engine speed, so it delivers more air.
- Boost at ${rpm(low)}: ${psi(a1)} before, ${psi(b1)} after; at ${rpm(high)}: ${psi(a2)} before, ${psi(b2)} after. Net power at ${rpm(high)}: ${hp(a2)} before, ${hp(b2)} after.
- At redline the blower now turns at ${rpm(Math.round(top.blowerRpm / 10) * 10)}, against the maker's limit of ${rpm(c.blower.maxRpm)}. Stay under it, and check belt wrap and fit before ordering a smaller pulley.

Move the pulley slider and watch how far each size moves the boost line.`;
}
