// @ts-nocheck
// The planner's "Predicted" readouts: boost, power, torque, blower speed and charge at a glance.
import type { UnitSystem } from "@/calc";
import { figure, percentText, quantityText } from "@/lib/units/format";
import type { SolvedResults } from "./use-planner-results";
import { outsideRangeText } from "@/lib/planner/range-words";
import { TitledSection } from "@/components/ui/titled-section";

export function PlannerReadouts({ results, system, stale }: { results: SolvedResults; system: UnitSystem; stale: boolean }) {
  // Only points within the model's range give figures; the redline point outside it says why.
  const trusted = results.curve.filter((p) => p.withinRange);
  const redlineAny = results.curve.find((p) => p.rpm === results.spec.engine.redlineRpm) ?? null;
  const redline = redlineAny?.withinRange ? redlineAny : null;
  const peakPoint = trusted.find((p) => p.rpm === results.peak) ?? null;
  const peakBoost = trusted.length ? trusted.reduce((a, b) => (b.boostGauge > a.boostGauge ? b : a)) : null;
  const peakTorque = trusted.length ? trusted.reduce((a, b) => (b.torque > a.torque ? b : a)) : null;
  return (
    <TitledSection id="summary-heading" title={stale ? "Predicted (out of date)" : "Predicted"} className="flex flex-col gap-2">
      {redlineAny && !redlineAny.withinRange ? (
        <p className="text-sm text-warn" data-testid="readout-outside-range">
          At redline: {outsideRangeText(redlineAny.rangeReasons, system)}.
        </p>
      ) : null}
      <dl className={`grid grid-cols-2 gap-x-4 gap-y-2 text-sm sm:grid-cols-3 ${stale ? "opacity-60" : ""}`} aria-live="polite" data-stale={stale ? "true" : "false"}>
        <Readout id="boost-redline" label="Boost at redline" value={redline ? quantityText("pressure", redline.boostGauge, system) : "–"} si={redline?.boostGauge} />
        <Readout id="boost-peak" label="Highest boost" value={peakBoost ? `${quantityText("pressure", peakBoost.boostGauge, system)} at ${figure("speed", peakBoost.rpm, system)} rpm` : "–"} si={peakBoost?.boostGauge} />
        <Readout id="power-peak" label="Peak net power" value={peakPoint ? `${quantityText("power", peakPoint.netPower, system)} at ${figure("speed", peakPoint.rpm, system)} rpm` : "–"} si={peakPoint?.netPower} />
        <Readout id="torque-peak" label="Peak net torque" value={peakTorque ? `${quantityText("torque", peakTorque.torque, system)} at ${figure("speed", peakTorque.rpm, system)} rpm` : "–"} si={peakTorque?.torque} />
        <Readout
          id="blower-speed-redline"
          label="Blower speed at redline"
          value={redline ? `${figure("speed", redline.blowerRpm, system)} of ${figure("speed", results.spec.blower.maxRpm, system)} rpm` : "–"}
          si={redline?.blowerRpm}
          danger={!!redline && redline.blowerRpm > results.spec.blower.maxRpm}
        />
        <Readout id="charge-temperature-redline" label="Charge temperature at redline" value={redline ? quantityText("temperature", redline.manifoldTemperature, system) : "–"} si={redline?.manifoldTemperature} />
        <Readout id="drive-power-redline" label="Blower drive power at redline" value={redline ? quantityText("power", redline.drivePower, system) : "–"} si={redline?.drivePower} />
        <Readout id="overdrive" label="Drive ratio (overdrive)" value={redline ? `${redline.driveRatio.toFixed(2)} (${percentText(redline.driveRatio - 1)})` : "–"} si={redline?.driveRatio} />
        {redline?.injectorDuty != null ? <Readout id="injector-duty-redline" label="Injector duty at redline" value={percentText(redline.injectorDuty)} si={redline.injectorDuty} /> : null}
      </dl>
    </TitledSection>
  );
}

function Readout({ id, label, value, si, danger }: { id: string; label: string; value: string; si?: number; danger?: boolean }) {
  return (
    <div className="flex flex-col">
      <dt className="text-xs text-muted">{label}</dt>
      <dd className={`num text-base font-semibold tabular-nums ${danger ? "text-danger" : ""}`} data-testid={`readout-${id}`} data-si={si ?? ""}>
        {value}
      </dd>
    </div>
  );
}
