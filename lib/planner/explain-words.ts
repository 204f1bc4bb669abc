// The planner's one sentence on why boost and power moved, from calc's explainChange, in the
// person's units. Pure, so the words a test expects and the words on screen agree.
import { explainChange, type ChangeDriver, type OperatingPoint, type UnitSystem } from "@/calc";
import { deltaText, figure } from "@/lib/units/format";

/** Shares smaller than this part of ln(Pm) are not worth a word (an author's bound). */
const NEGLIGIBLE_SHARE = 0.002;

function driverText(d: ChangeDriver, system: UnitSystem): string {
  const pct = (x: number) => `${x > 0 ? "+" : "−"}${Math.abs(x * 100).toFixed(1)} %`;
  switch (d.driver) {
    case "blower-speed":
      return `blower speed ${pct(d.change)}`;
    case "blower-slip":
      return `blower slip ${d.change > 0 ? "down" : "up"} ${Math.abs(d.change * 100).toFixed(1)} points`;
    case "charge-temperature":
      return `charge temperature ${deltaText("temperature", d.change, system)}`;
    case "engine-breathing":
      return `engine breathing (VE) ${pct(d.change)}`;
    case "engine-speed":
      return `engine speed ${pct(d.change)}`;
    case "other":
      return `inlet air and sizes ${pct(d.change)}`;
  }
}

/**
 * E.g. "Against the saved revision at 5,500 rpm: boost +1.8 psi and net power +21 hp; boost
 * rose with blower speed +6.0 %, held back by charge temperature +14 °F; blower drive power +9 hp." Null when a or b is
 * missing or nothing moved.
 */
export function explainSentence(a: OperatingPoint | null, b: OperatingPoint | null, system: UnitSystem, against = "the saved revision"): string | null {
  if (!a || !b) return null;
  const e = explainChange(a, b);
  const lnTotal = Math.log(e.manifoldPressureRatio);
  const moved = e.drivers.filter((d) => Math.abs(d.manifoldPressureShare) >= NEGLIGIBLE_SHARE);
  if (!moved.length && Math.abs(e.netPowerChange) < 1) return null;
  const head = `Against ${against} at ${figure("speed", b.rpm, system)} rpm: boost ${deltaText("pressure", e.boostChange, system)} and net power ${deltaText("power", e.netPowerChange, system)}`;
  if (!moved.length) return `${head}.`;
  const up = lnTotal >= 0;
  const drivers = moved.filter((d) => d.manifoldPressureShare >= 0 === up);
  const against_ = moved.filter((d) => d.manifoldPressureShare >= 0 !== up);
  const main = drivers.length ? `; boost ${up ? "rose" : "fell"} with ${drivers.map((d) => driverText(d, system)).join(" and ")}` : "";
  const offset = against_.length ? `, held back by ${against_.map((d) => driverText(d, system)).join(" and ")}` : "";
  const power = Math.abs(e.drivePowerChange) >= 1 ? `; blower drive power ${deltaText("power", e.drivePowerChange, system)}` : "";
  return `${head}${main}${offset}${power}.`;
}
