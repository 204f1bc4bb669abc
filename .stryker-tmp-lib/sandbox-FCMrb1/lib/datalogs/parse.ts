// @ts-nocheck
// Reading and cleaning a measured log (CSV text → SI points → wide-open-throttle bins).
// Pure: no I/O and no server-only imports, so the upload form previews exactly what the
// server will store, and the analysis pages bin exactly what the calibration uses.
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
import { z } from "zod";

/** Upload limits: a log past either is refused with a message naming the limit. */
export const DATALOG_LIMITS = {
  maxBytes: 5 * 1024 * 1024,
  maxRows: 200_000,
  maxErrorsListed: 50
} as const;
export const DELIMITERS = [",", ";", "\t", "|"] as const;
export type Delimiter = (typeof DELIMITERS)[number];
export const delimiterNames: Record<Delimiter, string> = stryMutAct_9fa48("1616") ? {} : (stryCov_9fa48("1616"), {
  ",": stryMutAct_9fa48("1617") ? "" : (stryCov_9fa48("1617"), "comma"),
  ";": stryMutAct_9fa48("1618") ? "" : (stryCov_9fa48("1618"), "semicolon"),
  "\t": stryMutAct_9fa48("1619") ? "" : (stryCov_9fa48("1619"), "tab"),
  "|": stryMutAct_9fa48("1620") ? "" : (stryCov_9fa48("1620"), "pipe")
});
const PSI_PA = 6894.757293168361; // lbf/in² in Pa (NIST SP 811, App. B)
const PRESSURE_TO_PA = {
  psi: PSI_PA,
  kPa: 1000,
  bar: 100_000
} as const;
export type PressureUnit = keyof typeof PRESSURE_TO_PA;
export const TEMPERATURE_UNITS = ["F", "C", "K"] as const;
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];
/** How a temperature unit is written ("°F", "°C", "K"). */
export const temperatureUnitText = stryMutAct_9fa48("1621") ? () => undefined : (stryCov_9fa48("1621"), (() => {
  const temperatureUnitText = (u: TemperatureUnit) => (stryMutAct_9fa48("1624") ? u !== "K" : stryMutAct_9fa48("1623") ? false : stryMutAct_9fa48("1622") ? true : (stryCov_9fa48("1622", "1623", "1624"), u === (stryMutAct_9fa48("1625") ? "" : (stryCov_9fa48("1625"), "K")))) ? stryMutAct_9fa48("1626") ? "" : (stryCov_9fa48("1626"), "K") : stryMutAct_9fa48("1627") ? `` : (stryCov_9fa48("1627"), `°${u}`);
  return temperatureUnitText;
})());
/** A reading in `unit` as kelvin. */
const toKelvin = stryMutAct_9fa48("1628") ? () => undefined : (stryCov_9fa48("1628"), (() => {
  const toKelvin = (v: number, unit: TemperatureUnit) => (stryMutAct_9fa48("1631") ? unit !== "F" : stryMutAct_9fa48("1630") ? false : stryMutAct_9fa48("1629") ? true : (stryCov_9fa48("1629", "1630", "1631"), unit === (stryMutAct_9fa48("1632") ? "" : (stryCov_9fa48("1632"), "F")))) ? stryMutAct_9fa48("1633") ? (v - 32) * 5 / 9 - 273.15 : (stryCov_9fa48("1633"), (stryMutAct_9fa48("1634") ? (v - 32) * 5 * 9 : (stryCov_9fa48("1634"), (stryMutAct_9fa48("1635") ? (v - 32) / 5 : (stryCov_9fa48("1635"), (stryMutAct_9fa48("1636") ? v + 32 : (stryCov_9fa48("1636"), v - 32)) * 5)) / 9)) + 273.15) : (stryMutAct_9fa48("1639") ? unit !== "C" : stryMutAct_9fa48("1638") ? false : stryMutAct_9fa48("1637") ? true : (stryCov_9fa48("1637", "1638", "1639"), unit === (stryMutAct_9fa48("1640") ? "" : (stryCov_9fa48("1640"), "C")))) ? stryMutAct_9fa48("1641") ? v - 273.15 : (stryCov_9fa48("1641"), v + 273.15) : v;
  return toKelvin;
})());

/** The fields that name a column, in the order the form shows them, with their names in messages. */
export const MAPPED_COLUMNS = ["rpm", "pressure", "intakeTemperature", "throttle", "time"] as const;
export type MappedColumn = (typeof MAPPED_COLUMNS)[number];
export const columnLabels: Record<MappedColumn, string> = stryMutAct_9fa48("1642") ? {} : (stryCov_9fa48("1642"), {
  rpm: stryMutAct_9fa48("1643") ? "" : (stryCov_9fa48("1643"), "engine speed"),
  pressure: stryMutAct_9fa48("1644") ? "" : (stryCov_9fa48("1644"), "manifold pressure"),
  intakeTemperature: stryMutAct_9fa48("1645") ? "" : (stryCov_9fa48("1645"), "intake air temperature"),
  throttle: stryMutAct_9fa48("1646") ? "" : (stryCov_9fa48("1646"), "throttle"),
  time: stryMutAct_9fa48("1647") ? "" : (stryCov_9fa48("1647"), "time")
});
const column = stryMutAct_9fa48("1648") ? () => undefined : (stryCov_9fa48("1648"), (() => {
  const column = (label: string) => stryMutAct_9fa48("1650") ? z.number({
    error: `Pick the column for ${label}`
  }).int().max(0, `Pick the column for ${label}`).max(255) : stryMutAct_9fa48("1649") ? z.number({
    error: `Pick the column for ${label}`
  }).int().min(0, `Pick the column for ${label}`).min(255) : (stryCov_9fa48("1649", "1650"), z.number(stryMutAct_9fa48("1651") ? {} : (stryCov_9fa48("1651"), {
    error: stryMutAct_9fa48("1652") ? `` : (stryCov_9fa48("1652"), `Pick the column for ${label}`)
  })).int().min(0, stryMutAct_9fa48("1653") ? `` : (stryCov_9fa48("1653"), `Pick the column for ${label}`)).max(255));
  return column;
})());
const optionalColumn = stryMutAct_9fa48("1654") ? () => undefined : (stryCov_9fa48("1654"), (() => {
  const optionalColumn = (label: string) => column(label).nullish().transform(stryMutAct_9fa48("1655") ? () => undefined : (stryCov_9fa48("1655"), v => stryMutAct_9fa48("1656") ? v && null : (stryCov_9fa48("1656"), v ?? null)));
  return optionalColumn;
})());

/** How the columns of a file map onto the quantities (column indexes from 0). */
export const datalogMappingSchema = z.object(stryMutAct_9fa48("1657") ? {} : (stryCov_9fa48("1657"), {
  delimiter: z.enum(DELIMITERS, stryMutAct_9fa48("1658") ? {} : (stryCov_9fa48("1658"), {
    error: stryMutAct_9fa48("1659") ? "" : (stryCov_9fa48("1659"), "Delimiter must be comma, semicolon, tab or pipe")
  })),
  decimalComma: z.boolean().default(stryMutAct_9fa48("1660") ? true : (stryCov_9fa48("1660"), false)),
  hasHeader: z.boolean().default(stryMutAct_9fa48("1661") ? false : (stryCov_9fa48("1661"), true)),
  rpm: column(columnLabels.rpm),
  pressure: column(columnLabels.pressure),
  pressureKind: z.enum(stryMutAct_9fa48("1662") ? [] : (stryCov_9fa48("1662"), [stryMutAct_9fa48("1663") ? "" : (stryCov_9fa48("1663"), "gauge"), stryMutAct_9fa48("1664") ? "" : (stryCov_9fa48("1664"), "absolute")]), stryMutAct_9fa48("1665") ? {} : (stryCov_9fa48("1665"), {
    error: stryMutAct_9fa48("1666") ? "" : (stryCov_9fa48("1666"), "Say whether the pressure is boost (gauge) or absolute")
  })),
  pressureUnit: z.enum(stryMutAct_9fa48("1667") ? [] : (stryCov_9fa48("1667"), [stryMutAct_9fa48("1668") ? "" : (stryCov_9fa48("1668"), "psi"), stryMutAct_9fa48("1669") ? "" : (stryCov_9fa48("1669"), "kPa"), stryMutAct_9fa48("1670") ? "" : (stryCov_9fa48("1670"), "bar")]), stryMutAct_9fa48("1671") ? {} : (stryCov_9fa48("1671"), {
    error: stryMutAct_9fa48("1672") ? "" : (stryCov_9fa48("1672"), "Pressure unit must be psi, kPa or bar")
  })),
  intakeTemperature: optionalColumn(columnLabels.intakeTemperature),
  temperatureUnit: z.enum(TEMPERATURE_UNITS, stryMutAct_9fa48("1673") ? {} : (stryCov_9fa48("1673"), {
    error: stryMutAct_9fa48("1674") ? "" : (stryCov_9fa48("1674"), "Temperature unit must be °F, °C or K")
  })).default(stryMutAct_9fa48("1675") ? "" : (stryCov_9fa48("1675"), "F")),
  time: optionalColumn(columnLabels.time),
  throttle: optionalColumn(columnLabels.throttle)
})).superRefine((m, ctx) => {
  if (stryMutAct_9fa48("1676")) {
    {}
  } else {
    stryCov_9fa48("1676");
    if (stryMutAct_9fa48("1679") ? m.decimalComma || m.delimiter === "," : stryMutAct_9fa48("1678") ? false : stryMutAct_9fa48("1677") ? true : (stryCov_9fa48("1677", "1678", "1679"), m.decimalComma && (stryMutAct_9fa48("1681") ? m.delimiter !== "," : stryMutAct_9fa48("1680") ? true : (stryCov_9fa48("1680", "1681"), m.delimiter === (stryMutAct_9fa48("1682") ? "" : (stryCov_9fa48("1682"), ",")))))) {
      if (stryMutAct_9fa48("1683")) {
        {}
      } else {
        stryCov_9fa48("1683");
        ctx.addIssue(stryMutAct_9fa48("1684") ? {} : (stryCov_9fa48("1684"), {
          code: stryMutAct_9fa48("1685") ? "" : (stryCov_9fa48("1685"), "custom"),
          path: stryMutAct_9fa48("1686") ? [] : (stryCov_9fa48("1686"), [stryMutAct_9fa48("1687") ? "" : (stryCov_9fa48("1687"), "decimalComma")]),
          message: stryMutAct_9fa48("1688") ? "" : (stryCov_9fa48("1688"), "Decimal commas need a delimiter other than the comma")
        }));
      }
    }
    // The error stands on the later field and names both: "column 1 is already used for engine speed".
    const used = new Map<number, string>();
    for (const key of MAPPED_COLUMNS) {
      if (stryMutAct_9fa48("1689")) {
        {}
      } else {
        stryCov_9fa48("1689");
        const col = m[key];
        if (stryMutAct_9fa48("1692") ? col !== null : stryMutAct_9fa48("1691") ? false : stryMutAct_9fa48("1690") ? true : (stryCov_9fa48("1690", "1691", "1692"), col === null)) continue;
        const taken = used.get(col);
        if (stryMutAct_9fa48("1694") ? false : stryMutAct_9fa48("1693") ? true : (stryCov_9fa48("1693", "1694"), taken)) ctx.addIssue(stryMutAct_9fa48("1695") ? {} : (stryCov_9fa48("1695"), {
          code: stryMutAct_9fa48("1696") ? "" : (stryCov_9fa48("1696"), "custom"),
          path: stryMutAct_9fa48("1697") ? [] : (stryCov_9fa48("1697"), [key]),
          message: stryMutAct_9fa48("1698") ? `` : (stryCov_9fa48("1698"), `Column ${stryMutAct_9fa48("1699") ? col - 1 : (stryCov_9fa48("1699"), col + 1)} is already used for ${taken}; pick another column for ${columnLabels[key]}`)
        }));else used.set(col, columnLabels[key]);
      }
    }
  }
});
export type DatalogMapping = z.output<typeof datalogMappingSchema>;
export type DatalogMappingInput = z.input<typeof datalogMappingSchema>;

/** Barometer (Pa absolute) and air temperature (K) at the time of the log. */
export const logAmbientSchema = z.object(stryMutAct_9fa48("1700") ? {} : (stryCov_9fa48("1700"), {
  pressure: stryMutAct_9fa48("1702") ? z.number({
    error: "Barometer must be a number"
  }).max(30_000, "Barometer must be between 30 and 110 kPa").max(110_000, "Barometer must be between 30 and 110 kPa") : stryMutAct_9fa48("1701") ? z.number({
    error: "Barometer must be a number"
  }).min(30_000, "Barometer must be between 30 and 110 kPa").min(110_000, "Barometer must be between 30 and 110 kPa") : (stryCov_9fa48("1701", "1702"), z.number(stryMutAct_9fa48("1703") ? {} : (stryCov_9fa48("1703"), {
    error: stryMutAct_9fa48("1704") ? "" : (stryCov_9fa48("1704"), "Barometer must be a number")
  })).min(30_000, stryMutAct_9fa48("1705") ? "" : (stryCov_9fa48("1705"), "Barometer must be between 30 and 110 kPa")).max(110_000, stryMutAct_9fa48("1706") ? "" : (stryCov_9fa48("1706"), "Barometer must be between 30 and 110 kPa"))),
  temperature: stryMutAct_9fa48("1708") ? z.number({
    error: "Air temperature must be a number"
  }).max(220, "Air temperature must be between −53 °C and 57 °C").max(330, "Air temperature must be between −53 °C and 57 °C") : stryMutAct_9fa48("1707") ? z.number({
    error: "Air temperature must be a number"
  }).min(220, "Air temperature must be between −53 °C and 57 °C").min(330, "Air temperature must be between −53 °C and 57 °C") : (stryCov_9fa48("1707", "1708"), z.number(stryMutAct_9fa48("1709") ? {} : (stryCov_9fa48("1709"), {
    error: stryMutAct_9fa48("1710") ? "" : (stryCov_9fa48("1710"), "Air temperature must be a number")
  })).min(220, stryMutAct_9fa48("1711") ? "" : (stryCov_9fa48("1711"), "Air temperature must be between −53 °C and 57 °C")).max(330, stryMutAct_9fa48("1712") ? "" : (stryCov_9fa48("1712"), "Air temperature must be between −53 °C and 57 °C")))
}));
export type LogAmbient = z.output<typeof logAmbientSchema>;

/** One stored sample, SI: rpm, Pa absolute, K, s, %. `line` is the 1-based line of the file. */
export interface LogPoint {
  line: number;
  time: number | null;
  rpm: number;
  manifoldPressure: number;
  intakeTemperature: number | null;
  throttle: number | null;
}
export interface LineError {
  line: number;
  message: string;
}

// ---------- encoding ----------

/**
 * Decodes file bytes as UTF-8, refusing what is not text: UTF-16 (by its byte-order mark or its
 * NUL bytes), binary files and invalid UTF-8. Returns the text or a message for the person.
 */
export function decodeLogBytes(bytes: Uint8Array): {
  ok: true;
  text: string;
} | {
  ok: false;
  message: string;
} {
  if (stryMutAct_9fa48("1713")) {
    {}
  } else {
    stryCov_9fa48("1713");
    if (stryMutAct_9fa48("1717") ? bytes.length <= DATALOG_LIMITS.maxBytes : stryMutAct_9fa48("1716") ? bytes.length >= DATALOG_LIMITS.maxBytes : stryMutAct_9fa48("1715") ? false : stryMutAct_9fa48("1714") ? true : (stryCov_9fa48("1714", "1715", "1716", "1717"), bytes.length > DATALOG_LIMITS.maxBytes)) return stryMutAct_9fa48("1718") ? {} : (stryCov_9fa48("1718"), {
      ok: stryMutAct_9fa48("1719") ? true : (stryCov_9fa48("1719"), false),
      message: tooBigMessage(bytes.length)
    });
    if (stryMutAct_9fa48("1722") ? bytes[0] === 0xff && bytes[1] === 0xfe && bytes[0] === 0xfe && bytes[1] === 0xff : stryMutAct_9fa48("1721") ? false : stryMutAct_9fa48("1720") ? true : (stryCov_9fa48("1720", "1721", "1722"), (stryMutAct_9fa48("1724") ? bytes[0] === 0xff || bytes[1] === 0xfe : stryMutAct_9fa48("1723") ? false : (stryCov_9fa48("1723", "1724"), (stryMutAct_9fa48("1726") ? bytes[0] !== 0xff : stryMutAct_9fa48("1725") ? true : (stryCov_9fa48("1725", "1726"), bytes[0] === 0xff)) && (stryMutAct_9fa48("1728") ? bytes[1] !== 0xfe : stryMutAct_9fa48("1727") ? true : (stryCov_9fa48("1727", "1728"), bytes[1] === 0xfe)))) || (stryMutAct_9fa48("1730") ? bytes[0] === 0xfe || bytes[1] === 0xff : stryMutAct_9fa48("1729") ? false : (stryCov_9fa48("1729", "1730"), (stryMutAct_9fa48("1732") ? bytes[0] !== 0xfe : stryMutAct_9fa48("1731") ? true : (stryCov_9fa48("1731", "1732"), bytes[0] === 0xfe)) && (stryMutAct_9fa48("1734") ? bytes[1] !== 0xff : stryMutAct_9fa48("1733") ? true : (stryCov_9fa48("1733", "1734"), bytes[1] === 0xff)))))) {
      if (stryMutAct_9fa48("1735")) {
        {}
      } else {
        stryCov_9fa48("1735");
        return stryMutAct_9fa48("1736") ? {} : (stryCov_9fa48("1736"), {
          ok: stryMutAct_9fa48("1737") ? true : (stryCov_9fa48("1737"), false),
          message: stryMutAct_9fa48("1738") ? "" : (stryCov_9fa48("1738"), "The file is UTF-16 text. Save it as UTF-8 (or plain ASCII) CSV and upload it again.")
        });
      }
    }
    const head = bytes.subarray(0, 4096);
    if (stryMutAct_9fa48("1740") ? false : stryMutAct_9fa48("1739") ? true : (stryCov_9fa48("1739", "1740"), head.includes(0))) {
      if (stryMutAct_9fa48("1741")) {
        {}
      } else {
        stryCov_9fa48("1741");
        return stryMutAct_9fa48("1742") ? {} : (stryCov_9fa48("1742"), {
          ok: stryMutAct_9fa48("1743") ? true : (stryCov_9fa48("1743"), false),
          message: stryMutAct_9fa48("1744") ? "" : (stryCov_9fa48("1744"), "The file holds NUL bytes: it is binary or UTF-16, not a UTF-8 CSV text file. Export the log as CSV and try again.")
        });
      }
    }
    try {
      if (stryMutAct_9fa48("1745")) {
        {}
      } else {
        stryCov_9fa48("1745");
        const text = new TextDecoder(stryMutAct_9fa48("1746") ? "" : (stryCov_9fa48("1746"), "utf-8"), stryMutAct_9fa48("1747") ? {} : (stryCov_9fa48("1747"), {
          fatal: stryMutAct_9fa48("1748") ? false : (stryCov_9fa48("1748"), true)
        })).decode(bytes);
        return stryMutAct_9fa48("1749") ? {} : (stryCov_9fa48("1749"), {
          ok: stryMutAct_9fa48("1750") ? false : (stryCov_9fa48("1750"), true),
          text: (stryMutAct_9fa48("1753") ? text.charCodeAt(0) !== 0xfeff : stryMutAct_9fa48("1752") ? false : stryMutAct_9fa48("1751") ? true : (stryCov_9fa48("1751", "1752", "1753"), text.charCodeAt(0) === 0xfeff)) ? stryMutAct_9fa48("1754") ? text : (stryCov_9fa48("1754"), text.slice(1)) : text
        });
      }
    } catch {
      if (stryMutAct_9fa48("1755")) {
        {}
      } else {
        stryCov_9fa48("1755");
        return stryMutAct_9fa48("1756") ? {} : (stryCov_9fa48("1756"), {
          ok: stryMutAct_9fa48("1757") ? true : (stryCov_9fa48("1757"), false),
          message: stryMutAct_9fa48("1758") ? "" : (stryCov_9fa48("1758"), "The file is not valid UTF-8 text. Save it as UTF-8 CSV and upload it again.")
        });
      }
    }
  }
}

/** Checks text that arrived without its bytes (the API): NUL or replacement characters mean a bad decode. */
export function checkLogText(text: string): string | null {
  if (stryMutAct_9fa48("1759")) {
    {}
  } else {
    stryCov_9fa48("1759");
    if (stryMutAct_9fa48("1762") ? false : stryMutAct_9fa48("1761") ? true : stryMutAct_9fa48("1760") ? text.trim() : (stryCov_9fa48("1760", "1761", "1762"), !(stryMutAct_9fa48("1763") ? text : (stryCov_9fa48("1763"), text.trim())))) return stryMutAct_9fa48("1764") ? "" : (stryCov_9fa48("1764"), "The file is empty.");
    const bytes = new TextEncoder().encode(text).length;
    if (stryMutAct_9fa48("1768") ? bytes <= DATALOG_LIMITS.maxBytes : stryMutAct_9fa48("1767") ? bytes >= DATALOG_LIMITS.maxBytes : stryMutAct_9fa48("1766") ? false : stryMutAct_9fa48("1765") ? true : (stryCov_9fa48("1765", "1766", "1767", "1768"), bytes > DATALOG_LIMITS.maxBytes)) return tooBigMessage(bytes);
    if (stryMutAct_9fa48("1770") ? false : stryMutAct_9fa48("1769") ? true : (stryCov_9fa48("1769", "1770"), text.includes(stryMutAct_9fa48("1771") ? "" : (stryCov_9fa48("1771"), "\u0000")))) return stryMutAct_9fa48("1772") ? "" : (stryCov_9fa48("1772"), "The file holds NUL bytes: it is binary or UTF-16, not a UTF-8 CSV text file.");
    if (stryMutAct_9fa48("1774") ? false : stryMutAct_9fa48("1773") ? true : (stryCov_9fa48("1773", "1774"), text.includes(stryMutAct_9fa48("1775") ? "" : (stryCov_9fa48("1775"), "\ufffd")))) return stryMutAct_9fa48("1776") ? "" : (stryCov_9fa48("1776"), "The file holds characters that could not be read as UTF-8. Save it as UTF-8 CSV and upload it again.");
    return null;
  }
}
function tooBigMessage(bytes: number) {
  if (stryMutAct_9fa48("1777")) {
    {}
  } else {
    stryCov_9fa48("1777");
    return stryMutAct_9fa48("1778") ? `` : (stryCov_9fa48("1778"), `The file is ${(stryMutAct_9fa48("1779") ? bytes / 1024 * 1024 : (stryCov_9fa48("1779"), (stryMutAct_9fa48("1780") ? bytes * 1024 : (stryCov_9fa48("1780"), bytes / 1024)) / 1024)).toFixed(1)} MB; the limit is ${stryMutAct_9fa48("1781") ? DATALOG_LIMITS.maxBytes / 1024 * 1024 : (stryCov_9fa48("1781"), (stryMutAct_9fa48("1782") ? DATALOG_LIMITS.maxBytes * 1024 : (stryCov_9fa48("1782"), DATALOG_LIMITS.maxBytes / 1024)) / 1024)} MB. Trim the log to the pulls you want to compare.`);
  }
}

// ---------- splitting ----------

/** Lines of the text with their 1-based numbers, blank lines left out. */
export function logLines(text: string): {
  line: number;
  text: string;
}[] {
  if (stryMutAct_9fa48("1783")) {
    {}
  } else {
    stryCov_9fa48("1783");
    const out: {
      line: number;
      text: string;
    }[] = stryMutAct_9fa48("1784") ? ["Stryker was here"] : (stryCov_9fa48("1784"), []);
    const raw = text.split(/\r\n|\n|\r/);
    for (let i = 0; stryMutAct_9fa48("1787") ? i >= raw.length : stryMutAct_9fa48("1786") ? i <= raw.length : stryMutAct_9fa48("1785") ? false : (stryCov_9fa48("1785", "1786", "1787"), i < raw.length); stryMutAct_9fa48("1788") ? i-- : (stryCov_9fa48("1788"), i++)) if (stryMutAct_9fa48("1791") ? raw[i].trim() === "" : stryMutAct_9fa48("1790") ? false : stryMutAct_9fa48("1789") ? true : (stryCov_9fa48("1789", "1790", "1791"), (stryMutAct_9fa48("1792") ? raw[i] : (stryCov_9fa48("1792"), raw[i].trim())) !== (stryMutAct_9fa48("1793") ? "Stryker was here!" : (stryCov_9fa48("1793"), "")))) out.push(stryMutAct_9fa48("1794") ? {} : (stryCov_9fa48("1794"), {
      line: stryMutAct_9fa48("1795") ? i - 1 : (stryCov_9fa48("1795"), i + 1),
      text: raw[i]
    }));
    return out;
  }
}

/** Splits one line on the delimiter, honouring double-quoted fields ("a,b" and "" escapes). */
export function splitLine(line: string, delimiter: Delimiter): string[] {
  if (stryMutAct_9fa48("1796")) {
    {}
  } else {
    stryCov_9fa48("1796");
    if (stryMutAct_9fa48("1799") ? false : stryMutAct_9fa48("1798") ? true : stryMutAct_9fa48("1797") ? line.includes('"') : (stryCov_9fa48("1797", "1798", "1799"), !line.includes(stryMutAct_9fa48("1800") ? "" : (stryCov_9fa48("1800"), '"')))) return line.split(delimiter).map(stryMutAct_9fa48("1801") ? () => undefined : (stryCov_9fa48("1801"), f => stryMutAct_9fa48("1802") ? f : (stryCov_9fa48("1802"), f.trim())));
    const out: string[] = stryMutAct_9fa48("1803") ? ["Stryker was here"] : (stryCov_9fa48("1803"), []);
    let cur = stryMutAct_9fa48("1804") ? "Stryker was here!" : (stryCov_9fa48("1804"), "");
    let quoted = stryMutAct_9fa48("1805") ? true : (stryCov_9fa48("1805"), false);
    for (let i = 0; stryMutAct_9fa48("1808") ? i >= line.length : stryMutAct_9fa48("1807") ? i <= line.length : stryMutAct_9fa48("1806") ? false : (stryCov_9fa48("1806", "1807", "1808"), i < line.length); stryMutAct_9fa48("1809") ? i-- : (stryCov_9fa48("1809"), i++)) {
      if (stryMutAct_9fa48("1810")) {
        {}
      } else {
        stryCov_9fa48("1810");
        const ch = line[i];
        if (stryMutAct_9fa48("1812") ? false : stryMutAct_9fa48("1811") ? true : (stryCov_9fa48("1811", "1812"), quoted)) {
          if (stryMutAct_9fa48("1813")) {
            {}
          } else {
            stryCov_9fa48("1813");
            if (stryMutAct_9fa48("1816") ? ch === '"' || line[i + 1] === '"' : stryMutAct_9fa48("1815") ? false : stryMutAct_9fa48("1814") ? true : (stryCov_9fa48("1814", "1815", "1816"), (stryMutAct_9fa48("1818") ? ch !== '"' : stryMutAct_9fa48("1817") ? true : (stryCov_9fa48("1817", "1818"), ch === (stryMutAct_9fa48("1819") ? "" : (stryCov_9fa48("1819"), '"')))) && (stryMutAct_9fa48("1821") ? line[i + 1] !== '"' : stryMutAct_9fa48("1820") ? true : (stryCov_9fa48("1820", "1821"), line[stryMutAct_9fa48("1822") ? i - 1 : (stryCov_9fa48("1822"), i + 1)] === (stryMutAct_9fa48("1823") ? "" : (stryCov_9fa48("1823"), '"')))))) {
              if (stryMutAct_9fa48("1824")) {
                {}
              } else {
                stryCov_9fa48("1824");
                cur += stryMutAct_9fa48("1825") ? "" : (stryCov_9fa48("1825"), '"');
                stryMutAct_9fa48("1826") ? i-- : (stryCov_9fa48("1826"), i++);
              }
            } else if (stryMutAct_9fa48("1829") ? ch !== '"' : stryMutAct_9fa48("1828") ? false : stryMutAct_9fa48("1827") ? true : (stryCov_9fa48("1827", "1828", "1829"), ch === (stryMutAct_9fa48("1830") ? "" : (stryCov_9fa48("1830"), '"')))) quoted = stryMutAct_9fa48("1831") ? true : (stryCov_9fa48("1831"), false);else stryMutAct_9fa48("1832") ? cur -= ch : (stryCov_9fa48("1832"), cur += ch);
          }
        } else if (stryMutAct_9fa48("1835") ? ch !== '"' : stryMutAct_9fa48("1834") ? false : stryMutAct_9fa48("1833") ? true : (stryCov_9fa48("1833", "1834", "1835"), ch === (stryMutAct_9fa48("1836") ? "" : (stryCov_9fa48("1836"), '"')))) quoted = stryMutAct_9fa48("1837") ? false : (stryCov_9fa48("1837"), true);else if (stryMutAct_9fa48("1840") ? ch !== delimiter : stryMutAct_9fa48("1839") ? false : stryMutAct_9fa48("1838") ? true : (stryCov_9fa48("1838", "1839", "1840"), ch === delimiter)) {
          if (stryMutAct_9fa48("1841")) {
            {}
          } else {
            stryCov_9fa48("1841");
            out.push(stryMutAct_9fa48("1842") ? cur : (stryCov_9fa48("1842"), cur.trim()));
            cur = stryMutAct_9fa48("1843") ? "Stryker was here!" : (stryCov_9fa48("1843"), "");
          }
        } else stryMutAct_9fa48("1844") ? cur -= ch : (stryCov_9fa48("1844"), cur += ch);
      }
    }
    out.push(stryMutAct_9fa48("1845") ? cur : (stryCov_9fa48("1845"), cur.trim()));
    return out;
  }
}

/** Reads a number as written in the file; null when it is not one. */
export function readNumber(field: string, decimalComma: boolean): number | null {
  if (stryMutAct_9fa48("1846")) {
    {}
  } else {
    stryCov_9fa48("1846");
    let s = stryMutAct_9fa48("1847") ? field : (stryCov_9fa48("1847"), field.trim());
    if (stryMutAct_9fa48("1850") ? s !== "" : stryMutAct_9fa48("1849") ? false : stryMutAct_9fa48("1848") ? true : (stryCov_9fa48("1848", "1849", "1850"), s === (stryMutAct_9fa48("1851") ? "Stryker was here!" : (stryCov_9fa48("1851"), "")))) return null;
    if (stryMutAct_9fa48("1853") ? false : stryMutAct_9fa48("1852") ? true : (stryCov_9fa48("1852", "1853"), decimalComma)) {
      if (stryMutAct_9fa48("1854")) {
        {}
      } else {
        stryCov_9fa48("1854");
        // "1.234,5" groups thousands with dots; otherwise the comma is the decimal mark.
        if (stryMutAct_9fa48("1856") ? false : stryMutAct_9fa48("1855") ? true : (stryCov_9fa48("1855", "1856"), (stryMutAct_9fa48("1868") ? /^[+-]?\d{1,3}(\.\d{3})+(,\D*)?$/ : stryMutAct_9fa48("1867") ? /^[+-]?\d{1,3}(\.\d{3})+(,\d)?$/ : stryMutAct_9fa48("1866") ? /^[+-]?\d{1,3}(\.\d{3})+(,\d*)$/ : stryMutAct_9fa48("1865") ? /^[+-]?\d{1,3}(\.\D{3})+(,\d*)?$/ : stryMutAct_9fa48("1864") ? /^[+-]?\d{1,3}(\.\d)+(,\d*)?$/ : stryMutAct_9fa48("1863") ? /^[+-]?\d{1,3}(\.\d{3})(,\d*)?$/ : stryMutAct_9fa48("1862") ? /^[+-]?\D{1,3}(\.\d{3})+(,\d*)?$/ : stryMutAct_9fa48("1861") ? /^[+-]?\d(\.\d{3})+(,\d*)?$/ : stryMutAct_9fa48("1860") ? /^[^+-]?\d{1,3}(\.\d{3})+(,\d*)?$/ : stryMutAct_9fa48("1859") ? /^[+-]\d{1,3}(\.\d{3})+(,\d*)?$/ : stryMutAct_9fa48("1858") ? /^[+-]?\d{1,3}(\.\d{3})+(,\d*)?/ : stryMutAct_9fa48("1857") ? /[+-]?\d{1,3}(\.\d{3})+(,\d*)?$/ : (stryCov_9fa48("1857", "1858", "1859", "1860", "1861", "1862", "1863", "1864", "1865", "1866", "1867", "1868"), /^[+-]?\d{1,3}(\.\d{3})+(,\d*)?$/)).test(s))) s = s.replace(/\./g, stryMutAct_9fa48("1869") ? "Stryker was here!" : (stryCov_9fa48("1869"), ""));
        s = s.replace(stryMutAct_9fa48("1870") ? "" : (stryCov_9fa48("1870"), ","), stryMutAct_9fa48("1871") ? "" : (stryCov_9fa48("1871"), "."));
      }
    }
    if (stryMutAct_9fa48("1874") ? false : stryMutAct_9fa48("1873") ? true : stryMutAct_9fa48("1872") ? /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(s) : (stryCov_9fa48("1872", "1873", "1874"), !(stryMutAct_9fa48("1891") ? /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\D+)?$/ : stryMutAct_9fa48("1890") ? /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d)?$/ : stryMutAct_9fa48("1889") ? /^[+-]?(\d+\.?\d*|\.\d+)([eE][^+-]?\d+)?$/ : stryMutAct_9fa48("1888") ? /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]\d+)?$/ : stryMutAct_9fa48("1887") ? /^[+-]?(\d+\.?\d*|\.\d+)([^eE][+-]?\d+)?$/ : stryMutAct_9fa48("1886") ? /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)$/ : stryMutAct_9fa48("1885") ? /^[+-]?(\d+\.?\d*|\.\D+)([eE][+-]?\d+)?$/ : stryMutAct_9fa48("1884") ? /^[+-]?(\d+\.?\d*|\.\d)([eE][+-]?\d+)?$/ : stryMutAct_9fa48("1883") ? /^[+-]?(\d+\.?\D*|\.\d+)([eE][+-]?\d+)?$/ : stryMutAct_9fa48("1882") ? /^[+-]?(\d+\.?\d|\.\d+)([eE][+-]?\d+)?$/ : stryMutAct_9fa48("1881") ? /^[+-]?(\d+\.\d*|\.\d+)([eE][+-]?\d+)?$/ : stryMutAct_9fa48("1880") ? /^[+-]?(\D+\.?\d*|\.\d+)([eE][+-]?\d+)?$/ : stryMutAct_9fa48("1879") ? /^[+-]?(\d\.?\d*|\.\d+)([eE][+-]?\d+)?$/ : stryMutAct_9fa48("1878") ? /^[^+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/ : stryMutAct_9fa48("1877") ? /^[+-](\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/ : stryMutAct_9fa48("1876") ? /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?/ : stryMutAct_9fa48("1875") ? /[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/ : (stryCov_9fa48("1875", "1876", "1877", "1878", "1879", "1880", "1881", "1882", "1883", "1884", "1885", "1886", "1887", "1888", "1889", "1890", "1891"), /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/)).test(s))) return null;
    const n = Number(s);
    return Number.isFinite(n) ? n : null;
  }
}

// ---------- guessing the layout ----------

export interface LogLayoutGuess {
  delimiter: Delimiter;
  decimalComma: boolean;
  hasHeader: boolean;
  columnCount: number;
  /** Column names from the header row, or "Column N". */
  columns: string[];
}

/**
 * Guesses the delimiter (the one that splits the first lines into the same number of fields,
 * more than one), whether commas are decimal marks, and whether the first line is a header
 * (it has a field that is not a number while the next line's fields are).
 */
export function guessLayout(text: string): LogLayoutGuess {
  if (stryMutAct_9fa48("1892")) {
    {}
  } else {
    stryCov_9fa48("1892");
    const lines = stryMutAct_9fa48("1893") ? logLines(text).map(l => l.text) : (stryCov_9fa48("1893"), logLines(text).slice(0, 30).map(stryMutAct_9fa48("1894") ? () => undefined : (stryCov_9fa48("1894"), l => l.text)));
    let best: {
      d: Delimiter;
      score: number;
      count: number;
    } = stryMutAct_9fa48("1895") ? {} : (stryCov_9fa48("1895"), {
      d: stryMutAct_9fa48("1896") ? "" : (stryCov_9fa48("1896"), ","),
      score: stryMutAct_9fa48("1897") ? +1 : (stryCov_9fa48("1897"), -1),
      count: 1
    });
    for (const d of DELIMITERS) {
      if (stryMutAct_9fa48("1898")) {
        {}
      } else {
        stryCov_9fa48("1898");
        const counts = lines.map(stryMutAct_9fa48("1899") ? () => undefined : (stryCov_9fa48("1899"), l => splitLine(l, d).length));
        const data = stryMutAct_9fa48("1900") ? counts : (stryCov_9fa48("1900"), counts.slice(1));
        const mode = modeOf(data.length ? data : counts);
        if (stryMutAct_9fa48("1904") ? mode >= 2 : stryMutAct_9fa48("1903") ? mode <= 2 : stryMutAct_9fa48("1902") ? false : stryMutAct_9fa48("1901") ? true : (stryCov_9fa48("1901", "1902", "1903", "1904"), mode < 2)) continue;
        const agree = stryMutAct_9fa48("1905") ? counts.filter(c => c === mode).length * counts.length : (stryCov_9fa48("1905"), (stryMutAct_9fa48("1906") ? counts.length : (stryCov_9fa48("1906"), counts.filter(stryMutAct_9fa48("1907") ? () => undefined : (stryCov_9fa48("1907"), c => stryMutAct_9fa48("1910") ? c !== mode : stryMutAct_9fa48("1909") ? false : stryMutAct_9fa48("1908") ? true : (stryCov_9fa48("1908", "1909", "1910"), c === mode))).length)) / counts.length);
        // Decimal commas split a file on commas as evenly as its real delimiter does: the delimiter
        // whose data fields read as numbers wins the tie.
        const fields = stryMutAct_9fa48("1911") ? lines.flatMap(l => splitLine(l, d)) : (stryCov_9fa48("1911"), lines.slice(1).flatMap(stryMutAct_9fa48("1912") ? () => undefined : (stryCov_9fa48("1912"), l => splitLine(l, d))));
        const numeric = fields.length ? stryMutAct_9fa48("1913") ? fields.filter(f => readNumber(f, false) !== null || readNumber(f, true) !== null).length * fields.length : (stryCov_9fa48("1913"), (stryMutAct_9fa48("1914") ? fields.length : (stryCov_9fa48("1914"), fields.filter(stryMutAct_9fa48("1915") ? () => undefined : (stryCov_9fa48("1915"), f => stryMutAct_9fa48("1918") ? readNumber(f, false) !== null && readNumber(f, true) !== null : stryMutAct_9fa48("1917") ? false : stryMutAct_9fa48("1916") ? true : (stryCov_9fa48("1916", "1917", "1918"), (stryMutAct_9fa48("1920") ? readNumber(f, false) === null : stryMutAct_9fa48("1919") ? false : (stryCov_9fa48("1919", "1920"), readNumber(f, stryMutAct_9fa48("1921") ? true : (stryCov_9fa48("1921"), false)) !== null)) || (stryMutAct_9fa48("1923") ? readNumber(f, true) === null : stryMutAct_9fa48("1922") ? false : (stryCov_9fa48("1922", "1923"), readNumber(f, stryMutAct_9fa48("1924") ? false : (stryCov_9fa48("1924"), true)) !== null))))).length)) / fields.length) : 0;
        const score = stryMutAct_9fa48("1925") ? agree * 100 + numeric * 50 - mode : (stryCov_9fa48("1925"), (stryMutAct_9fa48("1926") ? agree * 100 - numeric * 50 : (stryCov_9fa48("1926"), (stryMutAct_9fa48("1927") ? agree / 100 : (stryCov_9fa48("1927"), agree * 100)) + (stryMutAct_9fa48("1928") ? numeric / 50 : (stryCov_9fa48("1928"), numeric * 50)))) + mode);
        if (stryMutAct_9fa48("1932") ? score <= best.score : stryMutAct_9fa48("1931") ? score >= best.score : stryMutAct_9fa48("1930") ? false : stryMutAct_9fa48("1929") ? true : (stryCov_9fa48("1929", "1930", "1931", "1932"), score > best.score)) best = stryMutAct_9fa48("1933") ? {} : (stryCov_9fa48("1933"), {
          d,
          score,
          count: mode
        });
      }
    }
    const rows = lines.map(stryMutAct_9fa48("1934") ? () => undefined : (stryCov_9fa48("1934"), l => splitLine(l, best.d)));
    const body = stryMutAct_9fa48("1935") ? rows.flat() : (stryCov_9fa48("1935"), rows.slice(1, 30).flat());
    const decimalComma = stryMutAct_9fa48("1938") ? best.d !== "," && body.some(f => /^[+-]?\d+,\d+$/.test(f.trim())) || !body.some(f => /^[+-]?\d+\.\d+$/.test(f.trim())) : stryMutAct_9fa48("1937") ? false : stryMutAct_9fa48("1936") ? true : (stryCov_9fa48("1936", "1937", "1938"), (stryMutAct_9fa48("1940") ? best.d !== "," || body.some(f => /^[+-]?\d+,\d+$/.test(f.trim())) : stryMutAct_9fa48("1939") ? true : (stryCov_9fa48("1939", "1940"), (stryMutAct_9fa48("1942") ? best.d === "," : stryMutAct_9fa48("1941") ? true : (stryCov_9fa48("1941", "1942"), best.d !== (stryMutAct_9fa48("1943") ? "" : (stryCov_9fa48("1943"), ",")))) && (stryMutAct_9fa48("1944") ? body.every(f => /^[+-]?\d+,\d+$/.test(f.trim())) : (stryCov_9fa48("1944"), body.some(stryMutAct_9fa48("1945") ? () => undefined : (stryCov_9fa48("1945"), f => (stryMutAct_9fa48("1953") ? /^[+-]?\d+,\D+$/ : stryMutAct_9fa48("1952") ? /^[+-]?\d+,\d$/ : stryMutAct_9fa48("1951") ? /^[+-]?\D+,\d+$/ : stryMutAct_9fa48("1950") ? /^[+-]?\d,\d+$/ : stryMutAct_9fa48("1949") ? /^[^+-]?\d+,\d+$/ : stryMutAct_9fa48("1948") ? /^[+-]\d+,\d+$/ : stryMutAct_9fa48("1947") ? /^[+-]?\d+,\d+/ : stryMutAct_9fa48("1946") ? /[+-]?\d+,\d+$/ : (stryCov_9fa48("1946", "1947", "1948", "1949", "1950", "1951", "1952", "1953"), /^[+-]?\d+,\d+$/)).test(stryMutAct_9fa48("1954") ? f : (stryCov_9fa48("1954"), f.trim())))))))) && (stryMutAct_9fa48("1955") ? body.some(f => /^[+-]?\d+\.\d+$/.test(f.trim())) : (stryCov_9fa48("1955"), !(stryMutAct_9fa48("1956") ? body.every(f => /^[+-]?\d+\.\d+$/.test(f.trim())) : (stryCov_9fa48("1956"), body.some(stryMutAct_9fa48("1957") ? () => undefined : (stryCov_9fa48("1957"), f => (stryMutAct_9fa48("1965") ? /^[+-]?\d+\.\D+$/ : stryMutAct_9fa48("1964") ? /^[+-]?\d+\.\d$/ : stryMutAct_9fa48("1963") ? /^[+-]?\D+\.\d+$/ : stryMutAct_9fa48("1962") ? /^[+-]?\d\.\d+$/ : stryMutAct_9fa48("1961") ? /^[^+-]?\d+\.\d+$/ : stryMutAct_9fa48("1960") ? /^[+-]\d+\.\d+$/ : stryMutAct_9fa48("1959") ? /^[+-]?\d+\.\d+/ : stryMutAct_9fa48("1958") ? /[+-]?\d+\.\d+$/ : (stryCov_9fa48("1958", "1959", "1960", "1961", "1962", "1963", "1964", "1965"), /^[+-]?\d+\.\d+$/)).test(stryMutAct_9fa48("1966") ? f : (stryCov_9fa48("1966"), f.trim())))))))));
    const first = stryMutAct_9fa48("1967") ? rows[0] && [] : (stryCov_9fa48("1967"), rows[0] ?? (stryMutAct_9fa48("1968") ? ["Stryker was here"] : (stryCov_9fa48("1968"), [])));
    const hasHeader = stryMutAct_9fa48("1969") ? first.every(f => f !== "" && readNumber(f, decimalComma) === null) : (stryCov_9fa48("1969"), first.some(stryMutAct_9fa48("1970") ? () => undefined : (stryCov_9fa48("1970"), f => stryMutAct_9fa48("1973") ? f !== "" || readNumber(f, decimalComma) === null : stryMutAct_9fa48("1972") ? false : stryMutAct_9fa48("1971") ? true : (stryCov_9fa48("1971", "1972", "1973"), (stryMutAct_9fa48("1975") ? f === "" : stryMutAct_9fa48("1974") ? true : (stryCov_9fa48("1974", "1975"), f !== (stryMutAct_9fa48("1976") ? "Stryker was here!" : (stryCov_9fa48("1976"), "")))) && (stryMutAct_9fa48("1978") ? readNumber(f, decimalComma) !== null : stryMutAct_9fa48("1977") ? true : (stryCov_9fa48("1977", "1978"), readNumber(f, decimalComma) === null))))));
    const columns = Array.from(stryMutAct_9fa48("1979") ? {} : (stryCov_9fa48("1979"), {
      length: best.count
    }), stryMutAct_9fa48("1980") ? () => undefined : (stryCov_9fa48("1980"), (_, i) => (stryMutAct_9fa48("1983") ? hasHeader || first[i] : stryMutAct_9fa48("1982") ? false : stryMutAct_9fa48("1981") ? true : (stryCov_9fa48("1981", "1982", "1983"), hasHeader && first[i])) ? first[i] : stryMutAct_9fa48("1984") ? `` : (stryCov_9fa48("1984"), `Column ${stryMutAct_9fa48("1985") ? i - 1 : (stryCov_9fa48("1985"), i + 1)}`)));
    return stryMutAct_9fa48("1986") ? {} : (stryCov_9fa48("1986"), {
      delimiter: best.d,
      decimalComma,
      hasHeader,
      columnCount: best.count,
      columns
    });
  }
}
function modeOf(xs: number[]): number {
  if (stryMutAct_9fa48("1987")) {
    {}
  } else {
    stryCov_9fa48("1987");
    const n = new Map<number, number>();
    for (const x of xs) n.set(x, stryMutAct_9fa48("1988") ? (n.get(x) ?? 0) - 1 : (stryCov_9fa48("1988"), (stryMutAct_9fa48("1989") ? n.get(x) && 0 : (stryCov_9fa48("1989"), n.get(x) ?? 0)) + 1));
    let best = 0;
    let bestN = 0;
    for (const [x, c] of n) if (stryMutAct_9fa48("1992") ? c > bestN && c === bestN && x > best : stryMutAct_9fa48("1991") ? false : stryMutAct_9fa48("1990") ? true : (stryCov_9fa48("1990", "1991", "1992"), (stryMutAct_9fa48("1995") ? c <= bestN : stryMutAct_9fa48("1994") ? c >= bestN : stryMutAct_9fa48("1993") ? false : (stryCov_9fa48("1993", "1994", "1995"), c > bestN)) || (stryMutAct_9fa48("1997") ? c === bestN || x > best : stryMutAct_9fa48("1996") ? false : (stryCov_9fa48("1996", "1997"), (stryMutAct_9fa48("1999") ? c !== bestN : stryMutAct_9fa48("1998") ? true : (stryCov_9fa48("1998", "1999"), c === bestN)) && (stryMutAct_9fa48("2002") ? x <= best : stryMutAct_9fa48("2001") ? x >= best : stryMutAct_9fa48("2000") ? true : (stryCov_9fa48("2000", "2001", "2002"), x > best)))))) [best, bestN] = stryMutAct_9fa48("2003") ? [] : (stryCov_9fa48("2003"), [x, c]);
    return best;
  }
}

// ---------- parsing ----------

/** A data line an upload left out, and why ("engine speed 'n/a' is not a number"). */
export interface SkippedLine {
  line: number;
  reason: string;
}
export interface ParseResult {
  points: LogPoint[];
  errors: LineError[];
  /** Lines with errors beyond those listed. */
  moreErrors: number;
  /** Every line left out for an error, with the reason (not capped: an upload that skips lines lists them all). */
  skipped: SkippedLine[];
  /** Data lines read (header and blank lines excluded). */
  dataLines: number;
  /** A problem with the file as a whole (empty, too many rows), or null. */
  fatal: string | null;
}

/**
 * Reads every data line into SI points with the mapping. Bad lines are reported with their line
 * numbers ("line 14: engine speed 'abc' is not a number"); the caller stores nothing unless the
 * list is empty. `ambientPressure` (Pa) turns gauge readings into absolute ones.
 */
export function parseLog(text: string, mappingInput: DatalogMappingInput, ambientPressure: number): ParseResult {
  if (stryMutAct_9fa48("2004")) {
    {}
  } else {
    stryCov_9fa48("2004");
    const m = datalogMappingSchema.parse(mappingInput);
    const result: ParseResult = stryMutAct_9fa48("2005") ? {} : (stryCov_9fa48("2005"), {
      points: stryMutAct_9fa48("2006") ? ["Stryker was here"] : (stryCov_9fa48("2006"), []),
      errors: stryMutAct_9fa48("2007") ? ["Stryker was here"] : (stryCov_9fa48("2007"), []),
      moreErrors: 0,
      skipped: stryMutAct_9fa48("2008") ? ["Stryker was here"] : (stryCov_9fa48("2008"), []),
      dataLines: 0,
      fatal: null
    });
    const textProblem = checkLogText(text);
    if (stryMutAct_9fa48("2010") ? false : stryMutAct_9fa48("2009") ? true : (stryCov_9fa48("2009", "2010"), textProblem)) return stryMutAct_9fa48("2011") ? {} : (stryCov_9fa48("2011"), {
      ...result,
      fatal: textProblem
    });
    const lines = logLines(text);
    const data = m.hasHeader ? stryMutAct_9fa48("2012") ? lines : (stryCov_9fa48("2012"), lines.slice(1)) : lines;
    if (stryMutAct_9fa48("2015") ? data.length !== 0 : stryMutAct_9fa48("2014") ? false : stryMutAct_9fa48("2013") ? true : (stryCov_9fa48("2013", "2014", "2015"), data.length === 0)) return stryMutAct_9fa48("2016") ? {} : (stryCov_9fa48("2016"), {
      ...result,
      fatal: stryMutAct_9fa48("2017") ? "" : (stryCov_9fa48("2017"), "The file has no data rows under its header.")
    });
    if (stryMutAct_9fa48("2021") ? data.length <= DATALOG_LIMITS.maxRows : stryMutAct_9fa48("2020") ? data.length >= DATALOG_LIMITS.maxRows : stryMutAct_9fa48("2019") ? false : stryMutAct_9fa48("2018") ? true : (stryCov_9fa48("2018", "2019", "2020", "2021"), data.length > DATALOG_LIMITS.maxRows)) {
      if (stryMutAct_9fa48("2022")) {
        {}
      } else {
        stryCov_9fa48("2022");
        return stryMutAct_9fa48("2023") ? {} : (stryCov_9fa48("2023"), {
          ...result,
          dataLines: data.length,
          fatal: stryMutAct_9fa48("2024") ? `` : (stryCov_9fa48("2024"), `The file has ${data.length.toLocaleString(stryMutAct_9fa48("2025") ? "" : (stryCov_9fa48("2025"), "en-US"))} data rows; the limit is ${DATALOG_LIMITS.maxRows.toLocaleString(stryMutAct_9fa48("2026") ? "" : (stryCov_9fa48("2026"), "en-US"))}. Trim the log to the pulls you want to compare.`)
        });
      }
    }
    result.dataLines = data.length;
    const toPa = PRESSURE_TO_PA[m.pressureUnit];
    const fail = (line: number, message: string) => {
      if (stryMutAct_9fa48("2027")) {
        {}
      } else {
        stryCov_9fa48("2027");
        result.skipped.push(stryMutAct_9fa48("2028") ? {} : (stryCov_9fa48("2028"), {
          line,
          reason: message
        }));
        if (stryMutAct_9fa48("2032") ? result.errors.length >= DATALOG_LIMITS.maxErrorsListed : stryMutAct_9fa48("2031") ? result.errors.length <= DATALOG_LIMITS.maxErrorsListed : stryMutAct_9fa48("2030") ? false : stryMutAct_9fa48("2029") ? true : (stryCov_9fa48("2029", "2030", "2031", "2032"), result.errors.length < DATALOG_LIMITS.maxErrorsListed)) result.errors.push(stryMutAct_9fa48("2033") ? {} : (stryCov_9fa48("2033"), {
          line,
          message: stryMutAct_9fa48("2034") ? `` : (stryCov_9fa48("2034"), `line ${line}: ${message}`)
        }));else stryMutAct_9fa48("2035") ? result.moreErrors-- : (stryCov_9fa48("2035"), result.moreErrors++);
      }
    };
    for (const {
      line,
      text: raw
    } of data) {
      if (stryMutAct_9fa48("2036")) {
        {}
      } else {
        stryCov_9fa48("2036");
        const f = splitLine(raw, m.delimiter);
        const num = (col: number | null, label: string, required: boolean): number | null | undefined => {
          if (stryMutAct_9fa48("2037")) {
            {}
          } else {
            stryCov_9fa48("2037");
            if (stryMutAct_9fa48("2040") ? col !== null : stryMutAct_9fa48("2039") ? false : stryMutAct_9fa48("2038") ? true : (stryCov_9fa48("2038", "2039", "2040"), col === null)) return null;
            const field = f[col];
            if (stryMutAct_9fa48("2043") ? field === undefined && field === "" : stryMutAct_9fa48("2042") ? false : stryMutAct_9fa48("2041") ? true : (stryCov_9fa48("2041", "2042", "2043"), (stryMutAct_9fa48("2045") ? field !== undefined : stryMutAct_9fa48("2044") ? false : (stryCov_9fa48("2044", "2045"), field === undefined)) || (stryMutAct_9fa48("2047") ? field !== "" : stryMutAct_9fa48("2046") ? false : (stryCov_9fa48("2046", "2047"), field === (stryMutAct_9fa48("2048") ? "Stryker was here!" : (stryCov_9fa48("2048"), "")))))) {
              if (stryMutAct_9fa48("2049")) {
                {}
              } else {
                stryCov_9fa48("2049");
                if (stryMutAct_9fa48("2051") ? false : stryMutAct_9fa48("2050") ? true : (stryCov_9fa48("2050", "2051"), required)) {
                  if (stryMutAct_9fa48("2052")) {
                    {}
                  } else {
                    stryCov_9fa48("2052");
                    fail(line, stryMutAct_9fa48("2053") ? `` : (stryCov_9fa48("2053"), `${label} is missing (column ${stryMutAct_9fa48("2054") ? col - 1 : (stryCov_9fa48("2054"), col + 1)})`));
                    return undefined;
                  }
                }
                return null;
              }
            }
            const v = readNumber(field, m.decimalComma);
            if (stryMutAct_9fa48("2057") ? v !== null : stryMutAct_9fa48("2056") ? false : stryMutAct_9fa48("2055") ? true : (stryCov_9fa48("2055", "2056", "2057"), v === null)) {
              if (stryMutAct_9fa48("2058")) {
                {}
              } else {
                stryCov_9fa48("2058");
                fail(line, stryMutAct_9fa48("2059") ? `` : (stryCov_9fa48("2059"), `${label} '${(stryMutAct_9fa48("2063") ? field.length <= 30 : stryMutAct_9fa48("2062") ? field.length >= 30 : stryMutAct_9fa48("2061") ? false : stryMutAct_9fa48("2060") ? true : (stryCov_9fa48("2060", "2061", "2062", "2063"), field.length > 30)) ? (stryMutAct_9fa48("2064") ? field : (stryCov_9fa48("2064"), field.slice(0, 30))) + (stryMutAct_9fa48("2065") ? "" : (stryCov_9fa48("2065"), "…")) : field}' is not a number`));
                return undefined;
              }
            }
            return v;
          }
        };
        const rpm = num(m.rpm, stryMutAct_9fa48("2066") ? "" : (stryCov_9fa48("2066"), "engine speed"), stryMutAct_9fa48("2067") ? false : (stryCov_9fa48("2067"), true));
        if (stryMutAct_9fa48("2070") ? rpm !== undefined : stryMutAct_9fa48("2069") ? false : stryMutAct_9fa48("2068") ? true : (stryCov_9fa48("2068", "2069", "2070"), rpm === undefined)) continue;
        const p = num(m.pressure, stryMutAct_9fa48("2071") ? "" : (stryCov_9fa48("2071"), "manifold pressure"), stryMutAct_9fa48("2072") ? false : (stryCov_9fa48("2072"), true));
        if (stryMutAct_9fa48("2075") ? p !== undefined : stryMutAct_9fa48("2074") ? false : stryMutAct_9fa48("2073") ? true : (stryCov_9fa48("2073", "2074", "2075"), p === undefined)) continue;
        const t = num(m.intakeTemperature, stryMutAct_9fa48("2076") ? "" : (stryCov_9fa48("2076"), "intake air temperature"), stryMutAct_9fa48("2077") ? true : (stryCov_9fa48("2077"), false));
        if (stryMutAct_9fa48("2080") ? t !== undefined : stryMutAct_9fa48("2079") ? false : stryMutAct_9fa48("2078") ? true : (stryCov_9fa48("2078", "2079", "2080"), t === undefined)) continue;
        const time = num(m.time, stryMutAct_9fa48("2081") ? "" : (stryCov_9fa48("2081"), "time"), stryMutAct_9fa48("2082") ? true : (stryCov_9fa48("2082"), false));
        if (stryMutAct_9fa48("2085") ? time !== undefined : stryMutAct_9fa48("2084") ? false : stryMutAct_9fa48("2083") ? true : (stryCov_9fa48("2083", "2084", "2085"), time === undefined)) continue;
        const thr = num(m.throttle, stryMutAct_9fa48("2086") ? "" : (stryCov_9fa48("2086"), "throttle"), stryMutAct_9fa48("2087") ? true : (stryCov_9fa48("2087"), false));
        if (stryMutAct_9fa48("2090") ? thr !== undefined : stryMutAct_9fa48("2089") ? false : stryMutAct_9fa48("2088") ? true : (stryCov_9fa48("2088", "2089", "2090"), thr === undefined)) continue;
        if (stryMutAct_9fa48("2093") ? rpm === null && p === null : stryMutAct_9fa48("2092") ? false : stryMutAct_9fa48("2091") ? true : (stryCov_9fa48("2091", "2092", "2093"), (stryMutAct_9fa48("2095") ? rpm !== null : stryMutAct_9fa48("2094") ? false : (stryCov_9fa48("2094", "2095"), rpm === null)) || (stryMutAct_9fa48("2097") ? p !== null : stryMutAct_9fa48("2096") ? false : (stryCov_9fa48("2096", "2097"), p === null)))) continue; // unreachable: required columns
        if (stryMutAct_9fa48("2100") ? rpm < 0 && rpm > 20_000 : stryMutAct_9fa48("2099") ? false : stryMutAct_9fa48("2098") ? true : (stryCov_9fa48("2098", "2099", "2100"), (stryMutAct_9fa48("2103") ? rpm >= 0 : stryMutAct_9fa48("2102") ? rpm <= 0 : stryMutAct_9fa48("2101") ? false : (stryCov_9fa48("2101", "2102", "2103"), rpm < 0)) || (stryMutAct_9fa48("2106") ? rpm <= 20_000 : stryMutAct_9fa48("2105") ? rpm >= 20_000 : stryMutAct_9fa48("2104") ? false : (stryCov_9fa48("2104", "2105", "2106"), rpm > 20_000)))) {
          if (stryMutAct_9fa48("2107")) {
            {}
          } else {
            stryCov_9fa48("2107");
            fail(line, stryMutAct_9fa48("2108") ? `` : (stryCov_9fa48("2108"), `engine speed ${rpm} rpm is outside 0–20 000 rpm`));
            continue;
          }
        }
        const abs = (stryMutAct_9fa48("2111") ? m.pressureKind !== "gauge" : stryMutAct_9fa48("2110") ? false : stryMutAct_9fa48("2109") ? true : (stryCov_9fa48("2109", "2110", "2111"), m.pressureKind === (stryMutAct_9fa48("2112") ? "" : (stryCov_9fa48("2112"), "gauge")))) ? stryMutAct_9fa48("2113") ? p * toPa - ambientPressure : (stryCov_9fa48("2113"), (stryMutAct_9fa48("2114") ? p / toPa : (stryCov_9fa48("2114"), p * toPa)) + ambientPressure) : stryMutAct_9fa48("2115") ? p / toPa : (stryCov_9fa48("2115"), p * toPa);
        if (stryMutAct_9fa48("2118") ? !(abs > 0) && abs > 1_000_000 : stryMutAct_9fa48("2117") ? false : stryMutAct_9fa48("2116") ? true : (stryCov_9fa48("2116", "2117", "2118"), (stryMutAct_9fa48("2119") ? abs > 0 : (stryCov_9fa48("2119"), !(stryMutAct_9fa48("2123") ? abs <= 0 : stryMutAct_9fa48("2122") ? abs >= 0 : stryMutAct_9fa48("2121") ? false : stryMutAct_9fa48("2120") ? true : (stryCov_9fa48("2120", "2121", "2122", "2123"), abs > 0)))) || (stryMutAct_9fa48("2126") ? abs <= 1_000_000 : stryMutAct_9fa48("2125") ? abs >= 1_000_000 : stryMutAct_9fa48("2124") ? false : (stryCov_9fa48("2124", "2125", "2126"), abs > 1_000_000)))) {
          if (stryMutAct_9fa48("2127")) {
            {}
          } else {
            stryCov_9fa48("2127");
            fail(line, stryMutAct_9fa48("2128") ? `` : (stryCov_9fa48("2128"), `manifold pressure ${p} ${m.pressureUnit}${(stryMutAct_9fa48("2131") ? m.pressureKind !== "gauge" : stryMutAct_9fa48("2130") ? false : stryMutAct_9fa48("2129") ? true : (stryCov_9fa48("2129", "2130", "2131"), m.pressureKind === (stryMutAct_9fa48("2132") ? "" : (stryCov_9fa48("2132"), "gauge")))) ? stryMutAct_9fa48("2133") ? "" : (stryCov_9fa48("2133"), " gauge") : stryMutAct_9fa48("2134") ? "" : (stryCov_9fa48("2134"), " absolute")} gives ${(stryMutAct_9fa48("2135") ? abs * 1000 : (stryCov_9fa48("2135"), abs / 1000)).toFixed(1)} kPa absolute, outside 0–1000 kPa`));
            continue;
          }
        }
        let tempK: number | null = null;
        if (stryMutAct_9fa48("2138") ? t === null : stryMutAct_9fa48("2137") ? false : stryMutAct_9fa48("2136") ? true : (stryCov_9fa48("2136", "2137", "2138"), t !== null)) {
          if (stryMutAct_9fa48("2139")) {
            {}
          } else {
            stryCov_9fa48("2139");
            tempK = toKelvin(t, m.temperatureUnit);
            if (stryMutAct_9fa48("2142") ? tempK < 220 && tempK > 500 : stryMutAct_9fa48("2141") ? false : stryMutAct_9fa48("2140") ? true : (stryCov_9fa48("2140", "2141", "2142"), (stryMutAct_9fa48("2145") ? tempK >= 220 : stryMutAct_9fa48("2144") ? tempK <= 220 : stryMutAct_9fa48("2143") ? false : (stryCov_9fa48("2143", "2144", "2145"), tempK < 220)) || (stryMutAct_9fa48("2148") ? tempK <= 500 : stryMutAct_9fa48("2147") ? tempK >= 500 : stryMutAct_9fa48("2146") ? false : (stryCov_9fa48("2146", "2147", "2148"), tempK > 500)))) {
              if (stryMutAct_9fa48("2149")) {
                {}
              } else {
                stryCov_9fa48("2149");
                fail(line, stryMutAct_9fa48("2150") ? `` : (stryCov_9fa48("2150"), `intake air temperature ${t} ${temperatureUnitText(m.temperatureUnit)} is outside −53 to 227 °C`));
                continue;
              }
            }
          }
        }
        if (stryMutAct_9fa48("2153") ? thr !== null || thr < 0 || thr > 110 : stryMutAct_9fa48("2152") ? false : stryMutAct_9fa48("2151") ? true : (stryCov_9fa48("2151", "2152", "2153"), (stryMutAct_9fa48("2155") ? thr === null : stryMutAct_9fa48("2154") ? true : (stryCov_9fa48("2154", "2155"), thr !== null)) && (stryMutAct_9fa48("2157") ? thr < 0 && thr > 110 : stryMutAct_9fa48("2156") ? true : (stryCov_9fa48("2156", "2157"), (stryMutAct_9fa48("2160") ? thr >= 0 : stryMutAct_9fa48("2159") ? thr <= 0 : stryMutAct_9fa48("2158") ? false : (stryCov_9fa48("2158", "2159", "2160"), thr < 0)) || (stryMutAct_9fa48("2163") ? thr <= 110 : stryMutAct_9fa48("2162") ? thr >= 110 : stryMutAct_9fa48("2161") ? false : (stryCov_9fa48("2161", "2162", "2163"), thr > 110)))))) {
          if (stryMutAct_9fa48("2164")) {
            {}
          } else {
            stryCov_9fa48("2164");
            fail(line, stryMutAct_9fa48("2165") ? `` : (stryCov_9fa48("2165"), `throttle ${thr} % is outside 0–100 %`));
            continue;
          }
        }
        result.points.push(stryMutAct_9fa48("2166") ? {} : (stryCov_9fa48("2166"), {
          line,
          time,
          rpm,
          manifoldPressure: abs,
          intakeTemperature: tempK,
          throttle: thr
        }));
      }
    }
    return result;
  }
}

// ---------- cleaning and binning ----------

export const cleaningSchema = z.object(stryMutAct_9fa48("2167") ? {} : (stryCov_9fa48("2167"), {
  /** Keep samples at or above this throttle (%); used when the log has a throttle column. */
  minThrottle: stryMutAct_9fa48("2169") ? z.coerce.number({
    error: "Minimum throttle must be a number"
  }).max(0, "Minimum throttle must be 0–100 %").max(100, "Minimum throttle must be 0–100 %").default(90) : stryMutAct_9fa48("2168") ? z.coerce.number({
    error: "Minimum throttle must be a number"
  }).min(0, "Minimum throttle must be 0–100 %").min(100, "Minimum throttle must be 0–100 %").default(90) : (stryCov_9fa48("2168", "2169"), z.coerce.number(stryMutAct_9fa48("2170") ? {} : (stryCov_9fa48("2170"), {
    error: stryMutAct_9fa48("2171") ? "" : (stryCov_9fa48("2171"), "Minimum throttle must be a number")
  })).min(0, stryMutAct_9fa48("2172") ? "" : (stryCov_9fa48("2172"), "Minimum throttle must be 0–100 %")).max(100, stryMutAct_9fa48("2173") ? "" : (stryCov_9fa48("2173"), "Minimum throttle must be 0–100 %")).default(90)),
  /** Keep samples at or above this boost (Pa gauge); the rule when there is no throttle column. */
  minBoost: stryMutAct_9fa48("2175") ? z.coerce.number({
    error: "Minimum boost must be a number"
  }).max(-100_000, "Minimum boost must be above −100 kPa").max(400_000, "Minimum boost must be below 400 kPa").default(0) : stryMutAct_9fa48("2174") ? z.coerce.number({
    error: "Minimum boost must be a number"
  }).min(-100_000, "Minimum boost must be above −100 kPa").min(400_000, "Minimum boost must be below 400 kPa").default(0) : (stryCov_9fa48("2174", "2175"), z.coerce.number(stryMutAct_9fa48("2176") ? {} : (stryCov_9fa48("2176"), {
    error: stryMutAct_9fa48("2177") ? "" : (stryCov_9fa48("2177"), "Minimum boost must be a number")
  })).min(stryMutAct_9fa48("2178") ? +100_000 : (stryCov_9fa48("2178"), -100_000), stryMutAct_9fa48("2179") ? "" : (stryCov_9fa48("2179"), "Minimum boost must be above −100 kPa")).max(400_000, stryMutAct_9fa48("2180") ? "" : (stryCov_9fa48("2180"), "Minimum boost must be below 400 kPa")).default(0)),
  /** Width of an engine-speed bin (rpm). */
  binWidth: stryMutAct_9fa48("2182") ? z.coerce.number({
    error: "Bin width must be a number"
  }).int("Bin width must be a whole number of rpm").max(50, "Bin width must be 50–2000 rpm").max(2000, "Bin width must be 50–2000 rpm").default(250) : stryMutAct_9fa48("2181") ? z.coerce.number({
    error: "Bin width must be a number"
  }).int("Bin width must be a whole number of rpm").min(50, "Bin width must be 50–2000 rpm").min(2000, "Bin width must be 50–2000 rpm").default(250) : (stryCov_9fa48("2181", "2182"), z.coerce.number(stryMutAct_9fa48("2183") ? {} : (stryCov_9fa48("2183"), {
    error: stryMutAct_9fa48("2184") ? "" : (stryCov_9fa48("2184"), "Bin width must be a number")
  })).int(stryMutAct_9fa48("2185") ? "" : (stryCov_9fa48("2185"), "Bin width must be a whole number of rpm")).min(50, stryMutAct_9fa48("2186") ? "" : (stryCov_9fa48("2186"), "Bin width must be 50–2000 rpm")).max(2000, stryMutAct_9fa48("2187") ? "" : (stryCov_9fa48("2187"), "Bin width must be 50–2000 rpm")).default(250)),
  /** A bin needs this many kept samples to count. */
  minSamples: stryMutAct_9fa48("2189") ? z.coerce.number({
    error: "Samples per bin must be a number"
  }).int().max(1, "Samples per bin must be 1–100").max(100, "Samples per bin must be 1–100").default(3) : stryMutAct_9fa48("2188") ? z.coerce.number({
    error: "Samples per bin must be a number"
  }).int().min(1, "Samples per bin must be 1–100").min(100, "Samples per bin must be 1–100").default(3) : (stryCov_9fa48("2188", "2189"), z.coerce.number(stryMutAct_9fa48("2190") ? {} : (stryCov_9fa48("2190"), {
    error: stryMutAct_9fa48("2191") ? "" : (stryCov_9fa48("2191"), "Samples per bin must be a number")
  })).int().min(1, stryMutAct_9fa48("2192") ? "" : (stryCov_9fa48("2192"), "Samples per bin must be 1–100")).max(100, stryMutAct_9fa48("2193") ? "" : (stryCov_9fa48("2193"), "Samples per bin must be 1–100")).default(3)),
  /** Outlier limit in scaled median absolute deviations from the bin's median. */
  madLimit: stryMutAct_9fa48("2195") ? z.coerce.number({
    error: "Outlier limit must be a number"
  }).max(1, "Outlier limit must be 1–10 MAD").max(10, "Outlier limit must be 1–10 MAD").default(3) : stryMutAct_9fa48("2194") ? z.coerce.number({
    error: "Outlier limit must be a number"
  }).min(1, "Outlier limit must be 1–10 MAD").min(10, "Outlier limit must be 1–10 MAD").default(3) : (stryCov_9fa48("2194", "2195"), z.coerce.number(stryMutAct_9fa48("2196") ? {} : (stryCov_9fa48("2196"), {
    error: stryMutAct_9fa48("2197") ? "" : (stryCov_9fa48("2197"), "Outlier limit must be a number")
  })).min(1, stryMutAct_9fa48("2198") ? "" : (stryCov_9fa48("2198"), "Outlier limit must be 1–10 MAD")).max(10, stryMutAct_9fa48("2199") ? "" : (stryCov_9fa48("2199"), "Outlier limit must be 1–10 MAD")).default(3))
}));
export type CleaningOptions = z.output<typeof cleaningSchema>;
export type CleaningInput = z.input<typeof cleaningSchema>;
export const DEFAULT_CLEANING: CleaningOptions = cleaningSchema.parse({});

/** Smallest spread used for the outlier test (Pa): a noiseless log must not flag rounding. */
export const OUTLIER_FLOOR_PA = 500;
export type SampleStatus = "kept" | "part-throttle" | "outlier";
export interface LogBin {
  /** Bin range [from, to) (rpm). */
  from: number;
  to: number;
  /** Mean engine speed of the kept samples (rpm). */
  rpm: number;
  kept: number;
  outliers: number;
  /** Mean boost of the kept samples (Pa gauge). */
  boostGauge: number;
  /** Mean intake temperature of the kept samples that have one (K), or null. */
  intakeTemperature: number | null;
  /** Enough kept samples to use (minSamples). */
  usable: boolean;
}
export interface CleanedLog {
  status: SampleStatus[];
  bins: LogBin[];
  counts: {
    total: number;
    kept: number;
    partThrottle: number;
    outliers: number;
  };
  /** Which rule chose the wide-open-throttle samples. */
  rule: "throttle" | "boost";
}
const median = (xs: number[]) => {
  if (stryMutAct_9fa48("2200")) {
    {}
  } else {
    stryCov_9fa48("2200");
    const s = stryMutAct_9fa48("2201") ? [...xs] : (stryCov_9fa48("2201"), (stryMutAct_9fa48("2202") ? [] : (stryCov_9fa48("2202"), [...xs])).sort(stryMutAct_9fa48("2203") ? () => undefined : (stryCov_9fa48("2203"), (a, b) => stryMutAct_9fa48("2204") ? a + b : (stryCov_9fa48("2204"), a - b))));
    const n = s.length;
    return (stryMutAct_9fa48("2205") ? n * 2 : (stryCov_9fa48("2205"), n % 2)) ? s[stryMutAct_9fa48("2206") ? (n - 1) * 2 : (stryCov_9fa48("2206"), (stryMutAct_9fa48("2207") ? n + 1 : (stryCov_9fa48("2207"), n - 1)) / 2)] : stryMutAct_9fa48("2208") ? (s[n / 2 - 1] + s[n / 2]) * 2 : (stryCov_9fa48("2208"), (stryMutAct_9fa48("2209") ? s[n / 2 - 1] - s[n / 2] : (stryCov_9fa48("2209"), s[stryMutAct_9fa48("2210") ? n / 2 + 1 : (stryCov_9fa48("2210"), (stryMutAct_9fa48("2211") ? n * 2 : (stryCov_9fa48("2211"), n / 2)) - 1)] + s[stryMutAct_9fa48("2212") ? n * 2 : (stryCov_9fa48("2212"), n / 2)])) / 2);
  }
};

/**
 * Keeps the wide-open-throttle samples (throttle ≥ minThrottle, or boost ≥ minBoost when the log
 * has no throttle), bins them by engine speed, and marks as outliers the samples further than
 * madLimit scaled MADs (1.4826·MAD, the normal-consistent scale) from their bin's median boost.
 * Nothing is dropped silently: every sample gets a status.
 */
export function cleanLog(points: readonly LogPoint[], ambientPressure: number, optionsInput: CleaningInput = {}): CleanedLog {
  if (stryMutAct_9fa48("2213")) {
    {}
  } else {
    stryCov_9fa48("2213");
    const o = cleaningSchema.parse(optionsInput);
    const rule = (stryMutAct_9fa48("2216") ? points.length > 0 || points.every(p => p.throttle !== null) : stryMutAct_9fa48("2215") ? false : stryMutAct_9fa48("2214") ? true : (stryCov_9fa48("2214", "2215", "2216"), (stryMutAct_9fa48("2219") ? points.length <= 0 : stryMutAct_9fa48("2218") ? points.length >= 0 : stryMutAct_9fa48("2217") ? true : (stryCov_9fa48("2217", "2218", "2219"), points.length > 0)) && (stryMutAct_9fa48("2220") ? points.some(p => p.throttle !== null) : (stryCov_9fa48("2220"), points.every(stryMutAct_9fa48("2221") ? () => undefined : (stryCov_9fa48("2221"), p => stryMutAct_9fa48("2224") ? p.throttle === null : stryMutAct_9fa48("2223") ? false : stryMutAct_9fa48("2222") ? true : (stryCov_9fa48("2222", "2223", "2224"), p.throttle !== null))))))) ? stryMutAct_9fa48("2225") ? "" : (stryCov_9fa48("2225"), "throttle") : stryMutAct_9fa48("2226") ? "" : (stryCov_9fa48("2226"), "boost");
    const status: SampleStatus[] = points.map(p => {
      if (stryMutAct_9fa48("2227")) {
        {}
      } else {
        stryCov_9fa48("2227");
        const wot = (stryMutAct_9fa48("2230") ? rule !== "throttle" : stryMutAct_9fa48("2229") ? false : stryMutAct_9fa48("2228") ? true : (stryCov_9fa48("2228", "2229", "2230"), rule === (stryMutAct_9fa48("2231") ? "" : (stryCov_9fa48("2231"), "throttle")))) ? stryMutAct_9fa48("2235") ? (p.throttle as number) < o.minThrottle : stryMutAct_9fa48("2234") ? p.throttle as number > o.minThrottle : stryMutAct_9fa48("2233") ? false : stryMutAct_9fa48("2232") ? true : (stryCov_9fa48("2232", "2233", "2234", "2235"), p.throttle as number >= o.minThrottle) : stryMutAct_9fa48("2239") ? p.manifoldPressure - ambientPressure < o.minBoost : stryMutAct_9fa48("2238") ? p.manifoldPressure - ambientPressure > o.minBoost : stryMutAct_9fa48("2237") ? false : stryMutAct_9fa48("2236") ? true : (stryCov_9fa48("2236", "2237", "2238", "2239"), (stryMutAct_9fa48("2240") ? p.manifoldPressure + ambientPressure : (stryCov_9fa48("2240"), p.manifoldPressure - ambientPressure)) >= o.minBoost);
        return wot ? stryMutAct_9fa48("2241") ? "" : (stryCov_9fa48("2241"), "kept") : stryMutAct_9fa48("2242") ? "" : (stryCov_9fa48("2242"), "part-throttle");
      }
    });
    const byBin = new Map<number, number[]>();
    points.forEach((p, i) => {
      if (stryMutAct_9fa48("2243")) {
        {}
      } else {
        stryCov_9fa48("2243");
        if (stryMutAct_9fa48("2246") ? status[i] !== "kept" && p.rpm <= 0 : stryMutAct_9fa48("2245") ? false : stryMutAct_9fa48("2244") ? true : (stryCov_9fa48("2244", "2245", "2246"), (stryMutAct_9fa48("2248") ? status[i] === "kept" : stryMutAct_9fa48("2247") ? false : (stryCov_9fa48("2247", "2248"), status[i] !== (stryMutAct_9fa48("2249") ? "" : (stryCov_9fa48("2249"), "kept")))) || (stryMutAct_9fa48("2252") ? p.rpm > 0 : stryMutAct_9fa48("2251") ? p.rpm < 0 : stryMutAct_9fa48("2250") ? false : (stryCov_9fa48("2250", "2251", "2252"), p.rpm <= 0)))) return;
        const b = Math.floor(stryMutAct_9fa48("2253") ? p.rpm * o.binWidth : (stryCov_9fa48("2253"), p.rpm / o.binWidth));
        const list = byBin.get(b);
        if (stryMutAct_9fa48("2255") ? false : stryMutAct_9fa48("2254") ? true : (stryCov_9fa48("2254", "2255"), list)) list.push(i);else byBin.set(b, stryMutAct_9fa48("2256") ? [] : (stryCov_9fa48("2256"), [i]));
      }
    });
    const bins: LogBin[] = stryMutAct_9fa48("2257") ? ["Stryker was here"] : (stryCov_9fa48("2257"), []);
    for (const b of stryMutAct_9fa48("2258") ? [...byBin.keys()] : (stryCov_9fa48("2258"), (stryMutAct_9fa48("2259") ? [] : (stryCov_9fa48("2259"), [...byBin.keys()])).sort(stryMutAct_9fa48("2260") ? () => undefined : (stryCov_9fa48("2260"), (x, y) => stryMutAct_9fa48("2261") ? x + y : (stryCov_9fa48("2261"), x - y))))) {
      if (stryMutAct_9fa48("2262")) {
        {}
      } else {
        stryCov_9fa48("2262");
        const idx = byBin.get(b)!;
        const press = idx.map(stryMutAct_9fa48("2263") ? () => undefined : (stryCov_9fa48("2263"), i => points[i].manifoldPressure));
        const med = median(press);
        const spread = stryMutAct_9fa48("2264") ? Math.min(1.4826 * median(press.map(x => Math.abs(x - med))), OUTLIER_FLOOR_PA) : (stryCov_9fa48("2264"), Math.max(stryMutAct_9fa48("2265") ? 1.4826 / median(press.map(x => Math.abs(x - med))) : (stryCov_9fa48("2265"), 1.4826 * median(press.map(stryMutAct_9fa48("2266") ? () => undefined : (stryCov_9fa48("2266"), x => Math.abs(stryMutAct_9fa48("2267") ? x + med : (stryCov_9fa48("2267"), x - med)))))), OUTLIER_FLOOR_PA));
        const keep: number[] = stryMutAct_9fa48("2268") ? ["Stryker was here"] : (stryCov_9fa48("2268"), []);
        for (const i of idx) {
          if (stryMutAct_9fa48("2269")) {
            {}
          } else {
            stryCov_9fa48("2269");
            if (stryMutAct_9fa48("2273") ? Math.abs(points[i].manifoldPressure - med) <= o.madLimit * spread : stryMutAct_9fa48("2272") ? Math.abs(points[i].manifoldPressure - med) >= o.madLimit * spread : stryMutAct_9fa48("2271") ? false : stryMutAct_9fa48("2270") ? true : (stryCov_9fa48("2270", "2271", "2272", "2273"), Math.abs(stryMutAct_9fa48("2274") ? points[i].manifoldPressure + med : (stryCov_9fa48("2274"), points[i].manifoldPressure - med)) > (stryMutAct_9fa48("2275") ? o.madLimit / spread : (stryCov_9fa48("2275"), o.madLimit * spread)))) status[i] = stryMutAct_9fa48("2276") ? "" : (stryCov_9fa48("2276"), "outlier");else keep.push(i);
          }
        }
        const mean = stryMutAct_9fa48("2277") ? () => undefined : (stryCov_9fa48("2277"), (() => {
          const mean = (f: (i: number) => number, list = keep) => stryMutAct_9fa48("2278") ? list.reduce((s, i) => s + f(i), 0) * list.length : (stryCov_9fa48("2278"), list.reduce(stryMutAct_9fa48("2279") ? () => undefined : (stryCov_9fa48("2279"), (s, i) => stryMutAct_9fa48("2280") ? s - f(i) : (stryCov_9fa48("2280"), s + f(i))), 0) / list.length);
          return mean;
        })());
        const withTemp = stryMutAct_9fa48("2281") ? keep : (stryCov_9fa48("2281"), keep.filter(stryMutAct_9fa48("2282") ? () => undefined : (stryCov_9fa48("2282"), i => stryMutAct_9fa48("2285") ? points[i].intakeTemperature === null : stryMutAct_9fa48("2284") ? false : stryMutAct_9fa48("2283") ? true : (stryCov_9fa48("2283", "2284", "2285"), points[i].intakeTemperature !== null))));
        bins.push(stryMutAct_9fa48("2286") ? {} : (stryCov_9fa48("2286"), {
          from: stryMutAct_9fa48("2287") ? b / o.binWidth : (stryCov_9fa48("2287"), b * o.binWidth),
          to: stryMutAct_9fa48("2288") ? (b + 1) / o.binWidth : (stryCov_9fa48("2288"), (stryMutAct_9fa48("2289") ? b - 1 : (stryCov_9fa48("2289"), b + 1)) * o.binWidth),
          rpm: mean(stryMutAct_9fa48("2290") ? () => undefined : (stryCov_9fa48("2290"), i => points[i].rpm)),
          kept: keep.length,
          outliers: stryMutAct_9fa48("2291") ? idx.length + keep.length : (stryCov_9fa48("2291"), idx.length - keep.length),
          boostGauge: stryMutAct_9fa48("2292") ? mean(i => points[i].manifoldPressure) + ambientPressure : (stryCov_9fa48("2292"), mean(stryMutAct_9fa48("2293") ? () => undefined : (stryCov_9fa48("2293"), i => points[i].manifoldPressure)) - ambientPressure),
          intakeTemperature: withTemp.length ? mean(stryMutAct_9fa48("2294") ? () => undefined : (stryCov_9fa48("2294"), i => points[i].intakeTemperature as number), withTemp) : null,
          usable: stryMutAct_9fa48("2298") ? keep.length < o.minSamples : stryMutAct_9fa48("2297") ? keep.length > o.minSamples : stryMutAct_9fa48("2296") ? false : stryMutAct_9fa48("2295") ? true : (stryCov_9fa48("2295", "2296", "2297", "2298"), keep.length >= o.minSamples)
        }));
      }
    }
    const counts = stryMutAct_9fa48("2299") ? {} : (stryCov_9fa48("2299"), {
      total: points.length,
      kept: 0,
      partThrottle: 0,
      outliers: 0
    });
    for (const s of status) {
      if (stryMutAct_9fa48("2300")) {
        {}
      } else {
        stryCov_9fa48("2300");
        if (stryMutAct_9fa48("2303") ? s !== "kept" : stryMutAct_9fa48("2302") ? false : stryMutAct_9fa48("2301") ? true : (stryCov_9fa48("2301", "2302", "2303"), s === (stryMutAct_9fa48("2304") ? "" : (stryCov_9fa48("2304"), "kept")))) stryMutAct_9fa48("2305") ? counts.kept-- : (stryCov_9fa48("2305"), counts.kept++);else if (stryMutAct_9fa48("2308") ? s !== "outlier" : stryMutAct_9fa48("2307") ? false : stryMutAct_9fa48("2306") ? true : (stryCov_9fa48("2306", "2307", "2308"), s === (stryMutAct_9fa48("2309") ? "" : (stryCov_9fa48("2309"), "outlier")))) stryMutAct_9fa48("2310") ? counts.outliers-- : (stryCov_9fa48("2310"), counts.outliers++);else stryMutAct_9fa48("2311") ? counts.partThrottle-- : (stryCov_9fa48("2311"), counts.partThrottle++);
      }
    }
    return stryMutAct_9fa48("2312") ? {} : (stryCov_9fa48("2312"), {
      status,
      bins,
      counts,
      rule
    });
  }
}

/** Measured points for calc's calibrateVe: one per usable bin, whole rpm, measured temperature when logged. */
export function binsToMeasured(bins: readonly LogBin[]): {
  rpm: number;
  boostGauge: number;
  manifoldTemperature: number | null;
}[] {
  if (stryMutAct_9fa48("2313")) {
    {}
  } else {
    stryCov_9fa48("2313");
    return stryMutAct_9fa48("2315") ? bins.map(b => ({
      rpm: Math.round(b.rpm),
      boostGauge: b.boostGauge,
      manifoldTemperature: b.intakeTemperature
    })).filter((b, i, all) => i === 0 || b.rpm !== all[i - 1].rpm) : stryMutAct_9fa48("2314") ? bins.filter(b => b.usable && b.kept > 0).map(b => ({
      rpm: Math.round(b.rpm),
      boostGauge: b.boostGauge,
      manifoldTemperature: b.intakeTemperature
    })) : (stryCov_9fa48("2314", "2315"), bins.filter(stryMutAct_9fa48("2316") ? () => undefined : (stryCov_9fa48("2316"), b => stryMutAct_9fa48("2319") ? b.usable || b.kept > 0 : stryMutAct_9fa48("2318") ? false : stryMutAct_9fa48("2317") ? true : (stryCov_9fa48("2317", "2318", "2319"), b.usable && (stryMutAct_9fa48("2322") ? b.kept <= 0 : stryMutAct_9fa48("2321") ? b.kept >= 0 : stryMutAct_9fa48("2320") ? true : (stryCov_9fa48("2320", "2321", "2322"), b.kept > 0))))).map(stryMutAct_9fa48("2323") ? () => undefined : (stryCov_9fa48("2323"), b => stryMutAct_9fa48("2324") ? {} : (stryCov_9fa48("2324"), {
      rpm: Math.round(b.rpm),
      boostGauge: b.boostGauge,
      manifoldTemperature: b.intakeTemperature
    }))).filter(stryMutAct_9fa48("2325") ? () => undefined : (stryCov_9fa48("2325"), (b, i, all) => stryMutAct_9fa48("2328") ? i === 0 && b.rpm !== all[i - 1].rpm : stryMutAct_9fa48("2327") ? false : stryMutAct_9fa48("2326") ? true : (stryCov_9fa48("2326", "2327", "2328"), (stryMutAct_9fa48("2330") ? i !== 0 : stryMutAct_9fa48("2329") ? false : (stryCov_9fa48("2329", "2330"), i === 0)) || (stryMutAct_9fa48("2332") ? b.rpm === all[i - 1].rpm : stryMutAct_9fa48("2331") ? false : (stryCov_9fa48("2331", "2332"), b.rpm !== all[stryMutAct_9fa48("2333") ? i + 1 : (stryCov_9fa48("2333"), i - 1)].rpm))))));
  }
}