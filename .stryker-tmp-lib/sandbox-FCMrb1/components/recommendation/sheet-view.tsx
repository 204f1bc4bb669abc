// @ts-nocheck
// The recommendation sheet itself, as the customer sees it: on screen, printed (one page, black
// on white) and behind a share link. Server-rendered; only the chart runs in the browser.
import type { UnitSystem } from "@/calc";
import { CautionsPanel } from "@/components/cautions-panel";
import { CurveChart } from "@/components/charts/curve-chart";
import { quantityText } from "@/lib/units/format";
import { defaultSheetTitle } from "@/lib/recommendations/rules";
import type { ShopDetails } from "@/db/repo/shop";
import type { SheetSnapshot } from "@/db/repo/sheet-versions";
import { formatPrice } from "@/lib/orders/price-text";
import { computeSheet } from "@/lib/recommendations/sheet-data";
import { figureOrRange, outsideRangeText, type RangeOf } from "@/lib/planner/range-words";
import { HeadCells, TotalFoot } from "@/components/ui/data-table";
import { dateText } from "@/lib/format/dates";

/** What the sheet shows: a sent snapshot has it all, and so does a draft read from the database. */
export type SheetRecord = Pick<
  SheetSnapshot,
  "id" | "title" | "customerName" | "customerEmail" | "vehicleNotes" | "notes" | "status" | "sentAt" | "createdAt" | "revision" | "targetRpm" | "parts" | "total" | "spec"
>;

/** `currency`: ISO 4217 code of the prices (the shop's, or the one frozen with a sent version). */
export type SheetViewProps = { sheet: SheetRecord; shop: ShopDetails; currency: string; unitSystem: UnitSystem; locale?: string; print?: boolean };

const rpm = (n: number) => `${Math.round(n).toLocaleString("en-US")} rpm`;

export function SheetView({ sheet, shop, currency, unitSystem, locale, print = false }: SheetViewProps) {
  const { points, cautions, figures: f } = computeSheet(sheet.spec, sheet.targetRpm);
  const price = (a: string) => formatPrice(a, currency);
  const q = (kind: Parameters<typeof quantityText>[0], si: number) => quantityText(kind, si, unitSystem);
  const overLimit = f.blowerRpmAtRedline > f.blowerMaxRpm;
  // Figures read at one speed: the model's words instead where that point is outside its range.
  const at: <P extends RangeOf>(point: P, text: (p: P) => string) => string = (point, text) => figureOrRange(point, unitSystem, text);
  const rows: [string, string][] = [
    ["Blower", `${sheet.spec.blower.kind === "roots" ? "Roots" : "Twin-screw"}, ${q("blower-displacement", sheet.spec.blower.displacementPerRev)}`],
    ["Blower pulley / crank pulley", `${q("length-small", f.blowerPulleyDiameter)} / ${q("length-small", f.crankPulleyDiameter)}`],
    ["Drive ratio", `${f.driveRatio.toFixed(2)} : 1 (${(f.overdrive * 100).toFixed(0)} % overdrive)`],
    ["Boost at peak power", f.peakPower ? `${q("pressure", f.peakPower.boostGauge)} at ${rpm(f.peakPower.rpm)}` : "–"],
    ...(f.headline?.sold ? [["Boost where it was sold", at(f.headline, (h) => `${q("pressure", h.boostGauge)} at ${rpm(h.rpm)}`)] as [string, string]] : []),
    ["Boost at redline", f.atRedline ? at(f.atRedline, (r) => `${q("pressure", r.boostGauge)} at ${rpm(f.redlineRpm)}`) : "–"],
    [
      "Blower speed at redline",
      `${rpm(f.blowerRpmAtRedline)} of ${rpm(f.blowerMaxRpm)} limit (${Math.round((f.blowerRpmAtRedline / f.blowerMaxRpm) * 100)} %)${overLimit ? ": OVER THE LIMIT" : ""}`,
    ],
    ["Highest charge temperature", f.maxChargeTemperature ? at(f.maxChargeTemperature, (hot) => `${q("temperature", hot.manifoldTemperature)} at ${rpm(hot.rpm)}`) : "–"],
    ["Peak net power", f.peakPower ? `${q("power", f.peakPower.netPower)} at ${rpm(f.peakPower.rpm)}` : "–"],
    ["Peak net torque", f.peakTorque ? `${q("torque", f.peakTorque.torque)} at ${rpm(f.peakTorque.rpm)}` : "–"],
  ];
  const small = print ? "text-[10.5px] leading-snug" : "text-sm";
  return (
    <article className={`flex min-w-0 flex-col ${print ? "gap-2.5" : "gap-5"}`} data-testid="recommendation-sheet" aria-labelledby="sheet-title">
      <header className="flex flex-wrap items-start justify-between gap-3 border-b border-line pb-2 [overflow-wrap:anywhere]">
        <div>
          <p className="text-xs uppercase tracking-wide text-muted">Recommendation sheet</p>
          <h1 id="sheet-title" className={print ? "text-lg font-semibold" : "text-2xl font-semibold"}>
            {sheet.title || defaultSheetTitle(sheet.customerName)}
          </h1>
          <p className={`${small} text-muted`}>
            For <span data-testid="sheet-customer">{sheet.customerName}</span> · {dateText(sheet.sentAt ?? sheet.createdAt, locale)}
          </p>
        </div>
        <address className={`not-italic ${small} text-right`} aria-label="Shop">
          <p className="font-semibold">{shop.name}</p>
          {shop.address ? <p>{shop.address}</p> : null}
          {shop.phone || shop.email ? <p>{[shop.phone, shop.email].filter(Boolean).join(" · ")}</p> : null}
          {shop.website ? <p>{shop.website}</p> : null}
        </address>
      </header>

      <section aria-label="Customer and vehicle" className={`grid gap-2 ${print ? "grid-cols-[1fr_2fr]" : "sm:grid-cols-[1fr_2fr]"} ${small}`}>
        <div>
          <p className="font-semibold">Recommended blower pulley</p>
          <p className={print ? "text-base font-semibold" : "text-xl font-semibold"} data-testid="recommended-pulley">
            {q("length-small", f.blowerPulleyDiameter)}
          </p>
          {f.headline ? (
            <p data-testid="headline-boost">
              {f.headline.withinRange ? (
                <>
                  <span className="font-semibold">{q("pressure", f.headline.boostGauge)} boost</span> at {rpm(f.headline.rpm)}
                  {f.headline.sold ? "" : " (redline)"}, predicted
                </>
              ) : (
                <span className="font-semibold text-warn">
                  At {rpm(f.headline.rpm)}: {outsideRangeText(f.headline.rangeReasons, unitSystem)}
                </span>
              )}
            </p>
          ) : null}
        </div>
        <div>
          {sheet.vehicleNotes ? (
            <>
              <p className="font-semibold">Vehicle</p>
              <p className="whitespace-pre-line">{sheet.vehicleNotes}</p>
            </>
          ) : null}
        </div>
      </section>

      <section aria-label="Predicted boost, power and torque" className="break-inside-avoid">
        <CurveChart
          series={[{ label: "Predicted", points }]}
          metrics={["boostGauge", "netPower", "torque"]}
          unitSystem={unitSystem}
          redlineRpm={f.redlineRpm}
          height={print ? 230 : 320}
          ariaLabel={`Predicted boost, net power and net torque against engine speed for ${sheet.customerName}`}
          print={print}
        />
      </section>

      <div className={`grid gap-4 ${print ? "grid-cols-2" : "lg:grid-cols-2"}`}>
        <section aria-labelledby="figures-heading" className="break-inside-avoid">
          <h2 id="figures-heading" className={print ? "text-sm font-semibold" : "text-base font-semibold"}>
            Key figures (predicted)
          </h2>
          <table className={`w-full ${small}`}>
            <tbody>
              {rows.map(([label, value]) => (
                <tr key={label} className="border-b border-line">
                  <th scope="row" className="py-0.5 pr-2 text-left font-normal text-muted">
                    {label}
                  </th>
                  <td className={`py-0.5 text-right [overflow-wrap:anywhere] ${label.startsWith("Blower speed") && overLimit ? "font-semibold text-danger" : ""}`}>{value}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
        <section aria-labelledby="parts-heading" className="break-inside-avoid">
          <h2 id="parts-heading" className={print ? "text-sm font-semibold" : "text-base font-semibold"}>
            Parts
          </h2>
          {sheet.parts.length === 0 ? (
            <p className={`${small} text-muted`}>No parts listed.</p>
          ) : (
            <table className={`w-full ${small}`} data-testid="parts-table">
              <thead>
                <tr className="border-b border-line text-left text-muted">
                  <HeadCells cell="py-0.5 font-normal" right="pl-3 text-right" columns={["Part", { label: "Qty", right: true }, { label: "Each", right: true }, { label: "Amount", right: true }]} />
                </tr>
              </thead>
              <tbody>
                {sheet.parts.map((p, i) => (
                  <tr key={i} className="border-b border-line">
                    <td className="py-0.5 pr-2 [overflow-wrap:anywhere]">
                      {p.description}
                      {p.partNumber ? <span className="block text-xs text-muted">{p.partNumber}</span> : null}
                    </td>
                    <td className="py-0.5 pl-3 text-right tabular-nums" data-testid="part-qty">
                      {p.quantity}
                    </td>
                    <td className="whitespace-nowrap py-0.5 pl-3 text-right tabular-nums">{price(p.unitPrice)}</td>
                    <td className="whitespace-nowrap py-0.5 pl-3 text-right tabular-nums">{price(p.lineTotal)}</td>
                  </tr>
                ))}
              </tbody>
              <TotalFoot labelSpan={3} testId="sheet-total">
                {price(sheet.total)}
              </TotalFoot>
            </table>
          )}
        </section>
      </div>

      {sheet.notes ? (
        <section aria-labelledby="notes-heading" className={small}>
          <h2 id="notes-heading" className={print ? "text-sm font-semibold" : "text-base font-semibold"}>
            Notes
          </h2>
          <p className="whitespace-pre-line">{sheet.notes}</p>
        </section>
      ) : null}

      <div className={print ? "text-[10px] leading-snug" : ""}>
        <CautionsPanel cautions={cautions} units={unitSystem} compact={print} />
      </div>
      <p className={`text-muted ${print ? "text-[9px]" : "text-xs"}`}>
        Figures are predictions from a simplified model for this combination at revision {sheet.revision}; they are estimates, not measurements. Prices as quoted on the date above.
      </p>
    </article>
  );
}
