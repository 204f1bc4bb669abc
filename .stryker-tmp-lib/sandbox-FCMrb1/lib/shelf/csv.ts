// @ts-nocheck
// The shelf's CSV files without the database: reading a file into checked records (SI) with an
// error per line, and the cell formats that export writes so a file survives a round trip.
function stryNS_9fa48() {
  var g = typeof globalThis === 'object' && globalThis && globalThis.Math === Math && globalThis || new Function("return this")();
  var ns = g.__stryker__ || (g.__stryker__ = {});
  if (ns.activeMutant === undefined && g.process && g.process.env && g.process.env.__STRYKER_ACTIVE_MUTANT__) {
    ns.activeMutant = g.process.env.__STRYKER_ACTIVE_MUTANT__;
  }
  function retrieveNS() {
    return ns;
  }
  stryNS_9fa48 = retrieveNS;
  return retrieveNS();
}
stryNS_9fa48();
function stryCov_9fa48() {
  var ns = stryNS_9fa48();
  var cov = ns.mutantCoverage || (ns.mutantCoverage = {
    static: {},
    perTest: {}
  });
  function cover() {
    var c = cov.static;
    if (ns.currentTestId) {
      c = cov.perTest[ns.currentTestId] = cov.perTest[ns.currentTestId] || {};
    }
    var a = arguments;
    for (var i = 0; i < a.length; i++) {
      c[a[i]] = (c[a[i]] || 0) + 1;
    }
  }
  stryCov_9fa48 = cover;
  cover.apply(null, arguments);
}
function stryMutAct_9fa48(id) {
  var ns = stryNS_9fa48();
  function isActive(id) {
    if (ns.activeMutant === id) {
      if (ns.hitCount !== void 0 && ++ns.hitCount > ns.hitLimit) {
        throw new Error('Stryker: Hit count limit reached (' + ns.hitCount + ')');
      }
      return true;
    }
    return false;
  }
  stryMutAct_9fa48 = isActive;
  return isActive(id);
}
import Papa from "papaparse";
import { FieldError } from "@/lib/errors";
import { BLOWER_CSV_COLUMNS, MAX_CSV_BYTES, MAX_CSV_ROWS, PULLEY_CSV_COLUMNS, blowerRecordSchema, pulleyRecordSchema, type BlowerRecord, type CsvParseResult, type CsvPreviewRow, type CsvRowError, type PulleyRecord, type ShelfKind } from "@/lib/shelf/rules";
const OPTIONAL_COLUMNS = new Set(stryMutAct_9fa48("3932") ? [] : (stryCov_9fa48("3932"), [stryMutAct_9fa48("3933") ? "" : (stryCov_9fa48("3933"), "notes"), stryMutAct_9fa48("3934") ? "" : (stryCov_9fa48("3934"), "min_belt_diameter_mm")]));
export const csvColumns = stryMutAct_9fa48("3935") ? () => undefined : (stryCov_9fa48("3935"), (() => {
  const csvColumns = (kind: ShelfKind): readonly string[] => (stryMutAct_9fa48("3938") ? kind !== "pulleys" : stryMutAct_9fa48("3937") ? false : stryMutAct_9fa48("3936") ? true : (stryCov_9fa48("3936", "3937", "3938"), kind === (stryMutAct_9fa48("3939") ? "" : (stryCov_9fa48("3939"), "pulleys")))) ? PULLEY_CSV_COLUMNS : BLOWER_CSV_COLUMNS;
  return csvColumns;
})());

// Schema paths back to the file's column names, so an error names what the person sees.
const PULLEY_FIELD_TO_COLUMN: Record<string, string> = stryMutAct_9fa48("3940") ? {} : (stryCov_9fa48("3940"), {
  partNumber: stryMutAct_9fa48("3941") ? "" : (stryCov_9fa48("3941"), "part_number"),
  position: stryMutAct_9fa48("3942") ? "" : (stryCov_9fa48("3942"), "position"),
  diameter: stryMutAct_9fa48("3943") ? "" : (stryCov_9fa48("3943"), "diameter_mm"),
  ribCount: stryMutAct_9fa48("3944") ? "" : (stryCov_9fa48("3944"), "rib_count"),
  minBeltDiameter: stryMutAct_9fa48("3945") ? "" : (stryCov_9fa48("3945"), "min_belt_diameter_mm"),
  price: stryMutAct_9fa48("3946") ? "" : (stryCov_9fa48("3946"), "price"),
  stock: stryMutAct_9fa48("3947") ? "" : (stryCov_9fa48("3947"), "stock"),
  notes: stryMutAct_9fa48("3948") ? "" : (stryCov_9fa48("3948"), "notes")
});
const BLOWER_FIELD_TO_COLUMN: Record<string, string> = stryMutAct_9fa48("3949") ? {} : (stryCov_9fa48("3949"), {
  partNumber: stryMutAct_9fa48("3950") ? "" : (stryCov_9fa48("3950"), "part_number"),
  name: stryMutAct_9fa48("3951") ? "" : (stryCov_9fa48("3951"), "name"),
  kind: stryMutAct_9fa48("3952") ? "" : (stryCov_9fa48("3952"), "kind"),
  displacementPerRev: stryMutAct_9fa48("3953") ? "" : (stryCov_9fa48("3953"), "displacement_l_per_rev"),
  builtInVolumeRatio: stryMutAct_9fa48("3954") ? "" : (stryCov_9fa48("3954"), "built_in_volume_ratio"),
  maxRpm: stryMutAct_9fa48("3955") ? "" : (stryCov_9fa48("3955"), "max_rpm"),
  volumetricEfficiencyRef: stryMutAct_9fa48("3956") ? "" : (stryCov_9fa48("3956"), "volumetric_efficiency_ref"),
  referenceRpm: stryMutAct_9fa48("3957") ? "" : (stryCov_9fa48("3957"), "reference_rpm"),
  internalEfficiency: stryMutAct_9fa48("3958") ? "" : (stryCov_9fa48("3958"), "internal_efficiency"),
  mechanicalEfficiency: stryMutAct_9fa48("3959") ? "" : (stryCov_9fa48("3959"), "mechanical_efficiency"),
  price: stryMutAct_9fa48("3960") ? "" : (stryCov_9fa48("3960"), "price"),
  stock: stryMutAct_9fa48("3961") ? "" : (stryCov_9fa48("3961"), "stock"),
  notes: stryMutAct_9fa48("3962") ? "" : (stryCov_9fa48("3962"), "notes")
});

/** A text cell: a leading apostrophe that export added to defuse spreadsheet formulas is dropped. */
const textCell = stryMutAct_9fa48("3963") ? () => undefined : (stryCov_9fa48("3963"), (() => {
  const textCell = (s: string | undefined) => (stryMutAct_9fa48("3964") ? s && "" : (stryCov_9fa48("3964"), s ?? (stryMutAct_9fa48("3965") ? "Stryker was here!" : (stryCov_9fa48("3965"), "")))).replace(stryMutAct_9fa48("3968") ? /^'(?=[^=+\-@])/ : stryMutAct_9fa48("3967") ? /^'(?![=+\-@])/ : stryMutAct_9fa48("3966") ? /'(?=[=+\-@])/ : (stryCov_9fa48("3966", "3967", "3968"), /^'(?=[=+\-@])/), stryMutAct_9fa48("3969") ? "Stryker was here!" : (stryCov_9fa48("3969"), ""));
  return textCell;
})());
/** On export, text that a spreadsheet would run as a formula gets a leading apostrophe. */
export const safeText = stryMutAct_9fa48("3970") ? () => undefined : (stryCov_9fa48("3970"), (() => {
  const safeText = (s: string) => (stryMutAct_9fa48("3972") ? /^[^=+\-@]/ : stryMutAct_9fa48("3971") ? /[=+\-@]/ : (stryCov_9fa48("3971", "3972"), /^[=+\-@]/)).test(s) ? stryMutAct_9fa48("3973") ? `` : (stryCov_9fa48("3973"), `'${s}`) : s;
  return safeText;
})());

/** A cell as a number; empty or not a number → NaN so the schema names the field. */
const num = stryMutAct_9fa48("3974") ? () => undefined : (stryCov_9fa48("3974"), (() => {
  const num = (s: string | undefined) => (stryMutAct_9fa48("3977") ? s === undefined && s.trim() === "" : stryMutAct_9fa48("3976") ? false : stryMutAct_9fa48("3975") ? true : (stryCov_9fa48("3975", "3976", "3977"), (stryMutAct_9fa48("3979") ? s !== undefined : stryMutAct_9fa48("3978") ? false : (stryCov_9fa48("3978", "3979"), s === undefined)) || (stryMutAct_9fa48("3981") ? s.trim() !== "" : stryMutAct_9fa48("3980") ? false : (stryCov_9fa48("3980", "3981"), (stryMutAct_9fa48("3982") ? s : (stryCov_9fa48("3982"), s.trim())) === (stryMutAct_9fa48("3983") ? "Stryker was here!" : (stryCov_9fa48("3983"), "")))))) ? NaN : Number(stryMutAct_9fa48("3984") ? s : (stryCov_9fa48("3984"), s.trim()));
  return num;
})());

/** Checks the size, the header and every row; returns the records (SI) and per-line errors. Never writes. */
export function parseShelfCsv(kind: "pulleys", text: string): CsvParseResult<PulleyRecord>;
export function parseShelfCsv(kind: "blowers", text: string): CsvParseResult<BlowerRecord>;
export function parseShelfCsv(kind: ShelfKind, text: string): CsvParseResult<PulleyRecord | BlowerRecord>;
export function parseShelfCsv(kind: ShelfKind, text: string): CsvParseResult<PulleyRecord | BlowerRecord> {
  if (stryMutAct_9fa48("3985")) {
    {}
  } else {
    stryCov_9fa48("3985");
    const bytes = new TextEncoder().encode(text).length;
    if (stryMutAct_9fa48("3989") ? bytes <= MAX_CSV_BYTES : stryMutAct_9fa48("3988") ? bytes >= MAX_CSV_BYTES : stryMutAct_9fa48("3987") ? false : stryMutAct_9fa48("3986") ? true : (stryCov_9fa48("3986", "3987", "3988", "3989"), bytes > MAX_CSV_BYTES)) {
      if (stryMutAct_9fa48("3990")) {
        {}
      } else {
        stryCov_9fa48("3990");
        throw new FieldError(stryMutAct_9fa48("3991") ? "" : (stryCov_9fa48("3991"), "file"), stryMutAct_9fa48("3992") ? `` : (stryCov_9fa48("3992"), `The file is ${(stryMutAct_9fa48("3993") ? bytes * 1_000_000 : (stryCov_9fa48("3993"), bytes / 1_000_000)).toFixed(1)} MB; the limit is 1 MB and ${MAX_CSV_ROWS.toLocaleString(stryMutAct_9fa48("3994") ? "" : (stryCov_9fa48("3994"), "en-US"))} rows. Split it into smaller files.`));
      }
    }
    const body = text.replace(stryMutAct_9fa48("3995") ? /\uFEFF/ : (stryCov_9fa48("3995"), /^\uFEFF/), stryMutAct_9fa48("3996") ? "Stryker was here!" : (stryCov_9fa48("3996"), ""));
    if (stryMutAct_9fa48("3999") ? false : stryMutAct_9fa48("3998") ? true : stryMutAct_9fa48("3997") ? body.trim() : (stryCov_9fa48("3997", "3998", "3999"), !(stryMutAct_9fa48("4000") ? body : (stryCov_9fa48("4000"), body.trim())))) throw new FieldError(stryMutAct_9fa48("4001") ? "" : (stryCov_9fa48("4001"), "file"), stryMutAct_9fa48("4002") ? `` : (stryCov_9fa48("4002"), `The file is empty. Expected a header line with the columns: ${csvColumns(kind).join(stryMutAct_9fa48("4003") ? "" : (stryCov_9fa48("4003"), ", "))}.`));
    const parsed = Papa.parse<string[]>(body, stryMutAct_9fa48("4004") ? {} : (stryCov_9fa48("4004"), {
      header: stryMutAct_9fa48("4005") ? true : (stryCov_9fa48("4005"), false),
      skipEmptyLines: stryMutAct_9fa48("4006") ? true : (stryCov_9fa48("4006"), false)
    }));
    const table = parsed.data;
    const expected = csvColumns(kind);
    const header = (stryMutAct_9fa48("4007") ? table[0] && [] : (stryCov_9fa48("4007"), table[0] ?? (stryMutAct_9fa48("4008") ? ["Stryker was here"] : (stryCov_9fa48("4008"), [])))).map(stryMutAct_9fa48("4009") ? () => undefined : (stryCov_9fa48("4009"), h => stryMutAct_9fa48("4011") ? h.toLowerCase() : stryMutAct_9fa48("4010") ? h.trim().toUpperCase() : (stryCov_9fa48("4010", "4011"), h.trim().toLowerCase())));
    const missing = stryMutAct_9fa48("4012") ? expected : (stryCov_9fa48("4012"), expected.filter(stryMutAct_9fa48("4013") ? () => undefined : (stryCov_9fa48("4013"), c => stryMutAct_9fa48("4016") ? !OPTIONAL_COLUMNS.has(c) || !header.includes(c) : stryMutAct_9fa48("4015") ? false : stryMutAct_9fa48("4014") ? true : (stryCov_9fa48("4014", "4015", "4016"), (stryMutAct_9fa48("4017") ? OPTIONAL_COLUMNS.has(c) : (stryCov_9fa48("4017"), !OPTIONAL_COLUMNS.has(c))) && (stryMutAct_9fa48("4018") ? header.includes(c) : (stryCov_9fa48("4018"), !header.includes(c)))))));
    const unknown = stryMutAct_9fa48("4019") ? header : (stryCov_9fa48("4019"), header.filter(stryMutAct_9fa48("4020") ? () => undefined : (stryCov_9fa48("4020"), h => stryMutAct_9fa48("4023") ? h !== "" || !expected.includes(h) : stryMutAct_9fa48("4022") ? false : stryMutAct_9fa48("4021") ? true : (stryCov_9fa48("4021", "4022", "4023"), (stryMutAct_9fa48("4025") ? h === "" : stryMutAct_9fa48("4024") ? true : (stryCov_9fa48("4024", "4025"), h !== (stryMutAct_9fa48("4026") ? "Stryker was here!" : (stryCov_9fa48("4026"), "")))) && (stryMutAct_9fa48("4027") ? expected.includes(h) : (stryCov_9fa48("4027"), !expected.includes(h)))))));
    if (stryMutAct_9fa48("4030") ? missing.length && unknown.length : stryMutAct_9fa48("4029") ? false : stryMutAct_9fa48("4028") ? true : (stryCov_9fa48("4028", "4029", "4030"), missing.length || unknown.length)) {
      if (stryMutAct_9fa48("4031")) {
        {}
      } else {
        stryCov_9fa48("4031");
        const parts = stryMutAct_9fa48("4032") ? [missing.length ? `missing ${missing.join(", ")}` : "", unknown.length ? `unknown ${unknown.join(", ")}` : ""] : (stryCov_9fa48("4032"), (stryMutAct_9fa48("4033") ? [] : (stryCov_9fa48("4033"), [missing.length ? stryMutAct_9fa48("4034") ? `` : (stryCov_9fa48("4034"), `missing ${missing.join(stryMutAct_9fa48("4035") ? "" : (stryCov_9fa48("4035"), ", "))}`) : stryMutAct_9fa48("4036") ? "Stryker was here!" : (stryCov_9fa48("4036"), ""), unknown.length ? stryMutAct_9fa48("4037") ? `` : (stryCov_9fa48("4037"), `unknown ${unknown.join(stryMutAct_9fa48("4038") ? "" : (stryCov_9fa48("4038"), ", "))}`) : stryMutAct_9fa48("4039") ? "Stryker was here!" : (stryCov_9fa48("4039"), "")])).filter(Boolean));
        throw new FieldError(stryMutAct_9fa48("4040") ? "" : (stryCov_9fa48("4040"), "file"), stryMutAct_9fa48("4041") ? `` : (stryCov_9fa48("4041"), `The columns do not match a ${(stryMutAct_9fa48("4044") ? kind !== "pulleys" : stryMutAct_9fa48("4043") ? false : stryMutAct_9fa48("4042") ? true : (stryCov_9fa48("4042", "4043", "4044"), kind === (stryMutAct_9fa48("4045") ? "" : (stryCov_9fa48("4045"), "pulleys")))) ? stryMutAct_9fa48("4046") ? "" : (stryCov_9fa48("4046"), "pulley") : stryMutAct_9fa48("4047") ? "" : (stryCov_9fa48("4047"), "blower")} file (${parts.join(stryMutAct_9fa48("4048") ? "" : (stryCov_9fa48("4048"), "; "))}). Expected columns: ${expected.join(stryMutAct_9fa48("4049") ? "" : (stryCov_9fa48("4049"), ", "))}.`));
      }
    }
    const rows: CsvPreviewRow<PulleyRecord | BlowerRecord>[] = stryMutAct_9fa48("4050") ? ["Stryker was here"] : (stryCov_9fa48("4050"), []);
    const errors: CsvRowError[] = stryMutAct_9fa48("4051") ? ["Stryker was here"] : (stryCov_9fa48("4051"), []);
    const seen = new Map<string, number>();
    const toColumn = (stryMutAct_9fa48("4054") ? kind !== "pulleys" : stryMutAct_9fa48("4053") ? false : stryMutAct_9fa48("4052") ? true : (stryCov_9fa48("4052", "4053", "4054"), kind === (stryMutAct_9fa48("4055") ? "" : (stryCov_9fa48("4055"), "pulleys")))) ? PULLEY_FIELD_TO_COLUMN : BLOWER_FIELD_TO_COLUMN;
    let line = 1;
    let dataRows = 0;
    for (let i = 0; stryMutAct_9fa48("4058") ? i >= table.length : stryMutAct_9fa48("4057") ? i <= table.length : stryMutAct_9fa48("4056") ? false : (stryCov_9fa48("4056", "4057", "4058"), i < table.length); stryMutAct_9fa48("4059") ? i-- : (stryCov_9fa48("4059"), i++)) {
      if (stryMutAct_9fa48("4060")) {
        {}
      } else {
        stryCov_9fa48("4060");
        const cells = table[i];
        const here = line;
        // A quoted cell may span lines: the next row starts after them.
        stryMutAct_9fa48("4061") ? line -= 1 + cells.reduce((n, c) => n + (c.match(/\n/g)?.length ?? 0), 0) : (stryCov_9fa48("4061"), line += stryMutAct_9fa48("4062") ? 1 - cells.reduce((n, c) => n + (c.match(/\n/g)?.length ?? 0), 0) : (stryCov_9fa48("4062"), 1 + cells.reduce(stryMutAct_9fa48("4063") ? () => undefined : (stryCov_9fa48("4063"), (n, c) => stryMutAct_9fa48("4064") ? n - (c.match(/\n/g)?.length ?? 0) : (stryCov_9fa48("4064"), n + (stryMutAct_9fa48("4065") ? c.match(/\n/g)?.length && 0 : (stryCov_9fa48("4065"), (stryMutAct_9fa48("4066") ? c.match(/\n/g).length : (stryCov_9fa48("4066"), c.match(/\n/g)?.length)) ?? 0)))), 0)));
        if (stryMutAct_9fa48("4069") ? i !== 0 : stryMutAct_9fa48("4068") ? false : stryMutAct_9fa48("4067") ? true : (stryCov_9fa48("4067", "4068", "4069"), i === 0)) continue;
        if (stryMutAct_9fa48("4072") ? cells.some(c => c.trim() === "") : stryMutAct_9fa48("4071") ? false : stryMutAct_9fa48("4070") ? true : (stryCov_9fa48("4070", "4071", "4072"), cells.every(stryMutAct_9fa48("4073") ? () => undefined : (stryCov_9fa48("4073"), c => stryMutAct_9fa48("4076") ? c.trim() !== "" : stryMutAct_9fa48("4075") ? false : stryMutAct_9fa48("4074") ? true : (stryCov_9fa48("4074", "4075", "4076"), (stryMutAct_9fa48("4077") ? c : (stryCov_9fa48("4077"), c.trim())) === (stryMutAct_9fa48("4078") ? "Stryker was here!" : (stryCov_9fa48("4078"), ""))))))) continue;
        if (stryMutAct_9fa48("4082") ? ++dataRows <= MAX_CSV_ROWS : stryMutAct_9fa48("4081") ? ++dataRows >= MAX_CSV_ROWS : stryMutAct_9fa48("4080") ? false : stryMutAct_9fa48("4079") ? true : (stryCov_9fa48("4079", "4080", "4081", "4082"), (stryMutAct_9fa48("4083") ? --dataRows : (stryCov_9fa48("4083"), ++dataRows)) > MAX_CSV_ROWS)) {
          if (stryMutAct_9fa48("4084")) {
            {}
          } else {
            stryCov_9fa48("4084");
            throw new FieldError(stryMutAct_9fa48("4085") ? "" : (stryCov_9fa48("4085"), "file"), stryMutAct_9fa48("4086") ? `` : (stryCov_9fa48("4086"), `The file has more than ${MAX_CSV_ROWS.toLocaleString(stryMutAct_9fa48("4087") ? "" : (stryCov_9fa48("4087"), "en-US"))} rows; the limit is ${MAX_CSV_ROWS.toLocaleString(stryMutAct_9fa48("4088") ? "" : (stryCov_9fa48("4088"), "en-US"))} rows and 1 MB. Split it into smaller files.`));
          }
        }
        if (stryMutAct_9fa48("4091") ? cells.length === header.length : stryMutAct_9fa48("4090") ? false : stryMutAct_9fa48("4089") ? true : (stryCov_9fa48("4089", "4090", "4091"), cells.length !== header.length)) {
          if (stryMutAct_9fa48("4092")) {
            {}
          } else {
            stryCov_9fa48("4092");
            errors.push(stryMutAct_9fa48("4093") ? {} : (stryCov_9fa48("4093"), {
              line: here,
              column: stryMutAct_9fa48("4094") ? "Stryker was here!" : (stryCov_9fa48("4094"), ""),
              message: stryMutAct_9fa48("4095") ? `` : (stryCov_9fa48("4095"), `This line has ${cells.length} cells; the header has ${header.length}.`)
            }));
            continue;
          }
        }
        const cell = (name: string) => {
          if (stryMutAct_9fa48("4096")) {
            {}
          } else {
            stryCov_9fa48("4096");
            const k = header.indexOf(name);
            return (stryMutAct_9fa48("4100") ? k >= 0 : stryMutAct_9fa48("4099") ? k <= 0 : stryMutAct_9fa48("4098") ? false : stryMutAct_9fa48("4097") ? true : (stryCov_9fa48("4097", "4098", "4099", "4100"), k < 0)) ? undefined : cells[k];
          }
        };
        const raw = (stryMutAct_9fa48("4103") ? kind !== "pulleys" : stryMutAct_9fa48("4102") ? false : stryMutAct_9fa48("4101") ? true : (stryCov_9fa48("4101", "4102", "4103"), kind === (stryMutAct_9fa48("4104") ? "" : (stryCov_9fa48("4104"), "pulleys")))) ? stryMutAct_9fa48("4105") ? {} : (stryCov_9fa48("4105"), {
          partNumber: stryMutAct_9fa48("4106") ? cell("part_number") && "" : (stryCov_9fa48("4106"), cell(stryMutAct_9fa48("4107") ? "" : (stryCov_9fa48("4107"), "part_number")) ?? (stryMutAct_9fa48("4108") ? "Stryker was here!" : (stryCov_9fa48("4108"), ""))),
          position: stryMutAct_9fa48("4110") ? (cell("position") ?? "").toLowerCase() : stryMutAct_9fa48("4109") ? (cell("position") ?? "").trim().toUpperCase() : (stryCov_9fa48("4109", "4110"), (stryMutAct_9fa48("4111") ? cell("position") && "" : (stryCov_9fa48("4111"), cell(stryMutAct_9fa48("4112") ? "" : (stryCov_9fa48("4112"), "position")) ?? (stryMutAct_9fa48("4113") ? "Stryker was here!" : (stryCov_9fa48("4113"), "")))).trim().toLowerCase()),
          diameter: stryMutAct_9fa48("4114") ? num(cell("diameter_mm")) * 1000 : (stryCov_9fa48("4114"), num(cell(stryMutAct_9fa48("4115") ? "" : (stryCov_9fa48("4115"), "diameter_mm"))) / 1000),
          ribCount: num(cell(stryMutAct_9fa48("4116") ? "" : (stryCov_9fa48("4116"), "rib_count"))),
          minBeltDiameter: (stryMutAct_9fa48("4119") ? (cell("min_belt_diameter_mm") ?? "").trim() !== "" : stryMutAct_9fa48("4118") ? false : stryMutAct_9fa48("4117") ? true : (stryCov_9fa48("4117", "4118", "4119"), (stryMutAct_9fa48("4120") ? cell("min_belt_diameter_mm") ?? "" : (stryCov_9fa48("4120"), (stryMutAct_9fa48("4121") ? cell("min_belt_diameter_mm") && "" : (stryCov_9fa48("4121"), cell(stryMutAct_9fa48("4122") ? "" : (stryCov_9fa48("4122"), "min_belt_diameter_mm")) ?? (stryMutAct_9fa48("4123") ? "Stryker was here!" : (stryCov_9fa48("4123"), "")))).trim())) === (stryMutAct_9fa48("4124") ? "Stryker was here!" : (stryCov_9fa48("4124"), "")))) ? null : stryMutAct_9fa48("4125") ? num(cell("min_belt_diameter_mm")) * 1000 : (stryCov_9fa48("4125"), num(cell(stryMutAct_9fa48("4126") ? "" : (stryCov_9fa48("4126"), "min_belt_diameter_mm"))) / 1000),
          price: stryMutAct_9fa48("4127") ? cell("price") && "" : (stryCov_9fa48("4127"), cell(stryMutAct_9fa48("4128") ? "" : (stryCov_9fa48("4128"), "price")) ?? (stryMutAct_9fa48("4129") ? "Stryker was here!" : (stryCov_9fa48("4129"), ""))),
          stock: num(cell(stryMutAct_9fa48("4130") ? "" : (stryCov_9fa48("4130"), "stock"))),
          notes: textCell(cell(stryMutAct_9fa48("4131") ? "" : (stryCov_9fa48("4131"), "notes")))
        }) : stryMutAct_9fa48("4132") ? {} : (stryCov_9fa48("4132"), {
          partNumber: stryMutAct_9fa48("4133") ? cell("part_number") && "" : (stryCov_9fa48("4133"), cell(stryMutAct_9fa48("4134") ? "" : (stryCov_9fa48("4134"), "part_number")) ?? (stryMutAct_9fa48("4135") ? "Stryker was here!" : (stryCov_9fa48("4135"), ""))),
          name: textCell(cell(stryMutAct_9fa48("4136") ? "" : (stryCov_9fa48("4136"), "name"))),
          kind: stryMutAct_9fa48("4138") ? (cell("kind") ?? "").toLowerCase() : stryMutAct_9fa48("4137") ? (cell("kind") ?? "").trim().toUpperCase() : (stryCov_9fa48("4137", "4138"), (stryMutAct_9fa48("4139") ? cell("kind") && "" : (stryCov_9fa48("4139"), cell(stryMutAct_9fa48("4140") ? "" : (stryCov_9fa48("4140"), "kind")) ?? (stryMutAct_9fa48("4141") ? "Stryker was here!" : (stryCov_9fa48("4141"), "")))).trim().toLowerCase()),
          displacementPerRev: stryMutAct_9fa48("4142") ? num(cell("displacement_l_per_rev")) * 1000 : (stryCov_9fa48("4142"), num(cell(stryMutAct_9fa48("4143") ? "" : (stryCov_9fa48("4143"), "displacement_l_per_rev"))) / 1000),
          builtInVolumeRatio: num(cell(stryMutAct_9fa48("4144") ? "" : (stryCov_9fa48("4144"), "built_in_volume_ratio"))),
          maxRpm: num(cell(stryMutAct_9fa48("4145") ? "" : (stryCov_9fa48("4145"), "max_rpm"))),
          volumetricEfficiencyRef: num(cell(stryMutAct_9fa48("4146") ? "" : (stryCov_9fa48("4146"), "volumetric_efficiency_ref"))),
          referenceRpm: num(cell(stryMutAct_9fa48("4147") ? "" : (stryCov_9fa48("4147"), "reference_rpm"))),
          internalEfficiency: num(cell(stryMutAct_9fa48("4148") ? "" : (stryCov_9fa48("4148"), "internal_efficiency"))),
          mechanicalEfficiency: num(cell(stryMutAct_9fa48("4149") ? "" : (stryCov_9fa48("4149"), "mechanical_efficiency"))),
          price: stryMutAct_9fa48("4150") ? cell("price") && "" : (stryCov_9fa48("4150"), cell(stryMutAct_9fa48("4151") ? "" : (stryCov_9fa48("4151"), "price")) ?? (stryMutAct_9fa48("4152") ? "Stryker was here!" : (stryCov_9fa48("4152"), ""))),
          stock: num(cell(stryMutAct_9fa48("4153") ? "" : (stryCov_9fa48("4153"), "stock"))),
          notes: textCell(cell(stryMutAct_9fa48("4154") ? "" : (stryCov_9fa48("4154"), "notes")))
        });
        const result = ((stryMutAct_9fa48("4157") ? kind !== "pulleys" : stryMutAct_9fa48("4156") ? false : stryMutAct_9fa48("4155") ? true : (stryCov_9fa48("4155", "4156", "4157"), kind === (stryMutAct_9fa48("4158") ? "" : (stryCov_9fa48("4158"), "pulleys")))) ? pulleyRecordSchema : blowerRecordSchema).safeParse(raw);
        if (stryMutAct_9fa48("4161") ? false : stryMutAct_9fa48("4160") ? true : stryMutAct_9fa48("4159") ? result.success : (stryCov_9fa48("4159", "4160", "4161"), !result.success)) {
          if (stryMutAct_9fa48("4162")) {
            {}
          } else {
            stryCov_9fa48("4162");
            for (const issue of result.error.issues) {
              if (stryMutAct_9fa48("4163")) {
                {}
              } else {
                stryCov_9fa48("4163");
                const field = String(stryMutAct_9fa48("4164") ? issue.path[0] && "" : (stryCov_9fa48("4164"), issue.path[0] ?? (stryMutAct_9fa48("4165") ? "Stryker was here!" : (stryCov_9fa48("4165"), ""))));
                // SI bounds in a message would confuse: the file is in mm and L/rev.
                const message = issue.message.replace(stryMutAct_9fa48("4172") ? /between ([\d.]+) and ([\d.]+) m\b\./ : stryMutAct_9fa48("4171") ? /between ([\d.]+) and ([\D.]+) m\b\.?/ : stryMutAct_9fa48("4170") ? /between ([\d.]+) and ([^\d.]+) m\b\.?/ : stryMutAct_9fa48("4169") ? /between ([\d.]+) and ([\d.]) m\b\.?/ : stryMutAct_9fa48("4168") ? /between ([\D.]+) and ([\d.]+) m\b\.?/ : stryMutAct_9fa48("4167") ? /between ([^\d.]+) and ([\d.]+) m\b\.?/ : stryMutAct_9fa48("4166") ? /between ([\d.]) and ([\d.]+) m\b\.?/ : (stryCov_9fa48("4166", "4167", "4168", "4169", "4170", "4171", "4172"), /between ([\d.]+) and ([\d.]+) m\b\.?/), stryMutAct_9fa48("4173") ? () => undefined : (stryCov_9fa48("4173"), (_m, a, b) => stryMutAct_9fa48("4174") ? `` : (stryCov_9fa48("4174"), `between ${stryMutAct_9fa48("4175") ? Number(a) / 1000 : (stryCov_9fa48("4175"), Number(a) * 1000)} and ${stryMutAct_9fa48("4176") ? Number(b) / 1000 : (stryCov_9fa48("4176"), Number(b) * 1000)} mm.`)));
                errors.push(stryMutAct_9fa48("4177") ? {} : (stryCov_9fa48("4177"), {
                  line: here,
                  column: stryMutAct_9fa48("4178") ? toColumn[field] && field : (stryCov_9fa48("4178"), toColumn[field] ?? field),
                  message
                }));
              }
            }
            continue;
          }
        }
        const pn = result.data.partNumber;
        const first = seen.get(pn);
        if (stryMutAct_9fa48("4181") ? first === undefined : stryMutAct_9fa48("4180") ? false : stryMutAct_9fa48("4179") ? true : (stryCov_9fa48("4179", "4180", "4181"), first !== undefined)) {
          if (stryMutAct_9fa48("4182")) {
            {}
          } else {
            stryCov_9fa48("4182");
            errors.push(stryMutAct_9fa48("4183") ? {} : (stryCov_9fa48("4183"), {
              line: here,
              column: stryMutAct_9fa48("4184") ? "" : (stryCov_9fa48("4184"), "part_number"),
              message: stryMutAct_9fa48("4185") ? `` : (stryCov_9fa48("4185"), `Part number ${pn} is already on line ${first} of this file.`)
            }));
            continue;
          }
        }
        seen.set(pn, here);
        rows.push(stryMutAct_9fa48("4186") ? {} : (stryCov_9fa48("4186"), {
          line: here,
          record: result.data
        }));
      }
    }
    if (stryMutAct_9fa48("4189") ? !rows.length || !errors.length : stryMutAct_9fa48("4188") ? false : stryMutAct_9fa48("4187") ? true : (stryCov_9fa48("4187", "4188", "4189"), (stryMutAct_9fa48("4190") ? rows.length : (stryCov_9fa48("4190"), !rows.length)) && (stryMutAct_9fa48("4191") ? errors.length : (stryCov_9fa48("4191"), !errors.length)))) throw new FieldError(stryMutAct_9fa48("4192") ? "" : (stryCov_9fa48("4192"), "file"), stryMutAct_9fa48("4193") ? "" : (stryCov_9fa48("4193"), "The file has a header but no rows."));
    return stryMutAct_9fa48("4194") ? {} : (stryCov_9fa48("4194"), {
      rows,
      errors
    });
  }
}

// Lengths in mm and volumes in L with enough digits to survive a round trip through the file.
export const mm = stryMutAct_9fa48("4195") ? () => undefined : (stryCov_9fa48("4195"), (() => {
  const mm = (m: number) => String(Number((stryMutAct_9fa48("4196") ? m / 1000 : (stryCov_9fa48("4196"), m * 1000)).toFixed(4)));
  return mm;
})());
export const litres = stryMutAct_9fa48("4197") ? () => undefined : (stryCov_9fa48("4197"), (() => {
  const litres = (m3: number) => String(Number((stryMutAct_9fa48("4198") ? m3 / 1000 : (stryCov_9fa48("4198"), m3 * 1000)).toFixed(6)));
  return litres;
})());