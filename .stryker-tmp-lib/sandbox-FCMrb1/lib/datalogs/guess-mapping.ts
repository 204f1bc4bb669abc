// @ts-nocheck
// A first guess of which column of a log holds what, from its headings and its values; the
// person sees the guess (with why) and changes it. Pure, like parse.ts.
//
// Every range below is the author's choice (no published source): typical readings of a
// street or strip engine with a positive-displacement blower, wide enough for part throttle.
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
import { logLines, readNumber, splitLine, type DatalogMappingInput, type LogLayoutGuess, temperatureUnitText, type PressureUnit, type TemperatureUnit } from "./parse";

/** What a column's numbers look like (the first rows of the file). */
export interface ColumnProfile {
  /** How many fields were numbers. */
  count: number;
  min: number;
  max: number;
  median: number;
  /** Never falls, and rises from nine samples in ten to the next. */
  rising: boolean;
  /** Median step between consecutive samples. */
  medianStep: number;
  /** How uneven the steps are: median distance of a step from the median step, over the median step (0 for a steady clock). */
  stepUnevenness: number;
}

/** Rows looked at: enough to see a pull, few enough to guess while the file is previewed. */
const SAMPLE_ROWS = 400;
const medianOf = (xs: readonly number[]) => {
  if (stryMutAct_9fa48("1188")) {
    {}
  } else {
    stryCov_9fa48("1188");
    const s = stryMutAct_9fa48("1189") ? [...xs] : (stryCov_9fa48("1189"), (stryMutAct_9fa48("1190") ? [] : (stryCov_9fa48("1190"), [...xs])).sort(stryMutAct_9fa48("1191") ? () => undefined : (stryCov_9fa48("1191"), (a, b) => stryMutAct_9fa48("1192") ? a + b : (stryCov_9fa48("1192"), a - b))));
    const n = s.length;
    return (stryMutAct_9fa48("1195") ? n !== 0 : stryMutAct_9fa48("1194") ? false : stryMutAct_9fa48("1193") ? true : (stryCov_9fa48("1193", "1194", "1195"), n === 0)) ? NaN : (stryMutAct_9fa48("1196") ? n * 2 : (stryCov_9fa48("1196"), n % 2)) ? s[stryMutAct_9fa48("1197") ? (n - 1) * 2 : (stryCov_9fa48("1197"), (stryMutAct_9fa48("1198") ? n + 1 : (stryCov_9fa48("1198"), n - 1)) / 2)] : stryMutAct_9fa48("1199") ? (s[n / 2 - 1] + s[n / 2]) * 2 : (stryCov_9fa48("1199"), (stryMutAct_9fa48("1200") ? s[n / 2 - 1] - s[n / 2] : (stryCov_9fa48("1200"), s[stryMutAct_9fa48("1201") ? n / 2 + 1 : (stryCov_9fa48("1201"), (stryMutAct_9fa48("1202") ? n * 2 : (stryCov_9fa48("1202"), n / 2)) - 1)] + s[stryMutAct_9fa48("1203") ? n * 2 : (stryCov_9fa48("1203"), n / 2)])) / 2);
  }
};

/** The profile of one column's numbers in file order, or null with fewer than two numbers. */
export function profileColumn(values: readonly number[]): ColumnProfile | null {
  if (stryMutAct_9fa48("1204")) {
    {}
  } else {
    stryCov_9fa48("1204");
    if (stryMutAct_9fa48("1208") ? values.length >= 2 : stryMutAct_9fa48("1207") ? values.length <= 2 : stryMutAct_9fa48("1206") ? false : stryMutAct_9fa48("1205") ? true : (stryCov_9fa48("1205", "1206", "1207", "1208"), values.length < 2)) return null;
    const steps = stryMutAct_9fa48("1209") ? values.map((v, i) => v - values[i]) : (stryCov_9fa48("1209"), values.slice(1).map(stryMutAct_9fa48("1210") ? () => undefined : (stryCov_9fa48("1210"), (v, i) => stryMutAct_9fa48("1211") ? v + values[i] : (stryCov_9fa48("1211"), v - values[i]))));
    const rises = stryMutAct_9fa48("1212") ? steps.length : (stryCov_9fa48("1212"), steps.filter(stryMutAct_9fa48("1213") ? () => undefined : (stryCov_9fa48("1213"), d => stryMutAct_9fa48("1217") ? d <= 0 : stryMutAct_9fa48("1216") ? d >= 0 : stryMutAct_9fa48("1215") ? false : stryMutAct_9fa48("1214") ? true : (stryCov_9fa48("1214", "1215", "1216", "1217"), d > 0))).length);
    const medianStep = medianOf(steps);
    return stryMutAct_9fa48("1218") ? {} : (stryCov_9fa48("1218"), {
      count: values.length,
      min: stryMutAct_9fa48("1219") ? Math.max(...values) : (stryCov_9fa48("1219"), Math.min(...values)),
      max: stryMutAct_9fa48("1220") ? Math.min(...values) : (stryCov_9fa48("1220"), Math.max(...values)),
      median: medianOf(values),
      // A repeated time stamp happens now and then (two channels logged at once); a fall never does.
      rising: stryMutAct_9fa48("1223") ? steps.every(d => d >= 0) || rises >= 0.9 * steps.length : stryMutAct_9fa48("1222") ? false : stryMutAct_9fa48("1221") ? true : (stryCov_9fa48("1221", "1222", "1223"), (stryMutAct_9fa48("1224") ? steps.some(d => d >= 0) : (stryCov_9fa48("1224"), steps.every(stryMutAct_9fa48("1225") ? () => undefined : (stryCov_9fa48("1225"), d => stryMutAct_9fa48("1229") ? d < 0 : stryMutAct_9fa48("1228") ? d > 0 : stryMutAct_9fa48("1227") ? false : stryMutAct_9fa48("1226") ? true : (stryCov_9fa48("1226", "1227", "1228", "1229"), d >= 0))))) && (stryMutAct_9fa48("1232") ? rises < 0.9 * steps.length : stryMutAct_9fa48("1231") ? rises > 0.9 * steps.length : stryMutAct_9fa48("1230") ? true : (stryCov_9fa48("1230", "1231", "1232"), rises >= (stryMutAct_9fa48("1233") ? 0.9 / steps.length : (stryCov_9fa48("1233"), 0.9 * steps.length))))),
      medianStep,
      stepUnevenness: (stryMutAct_9fa48("1237") ? medianStep <= 0 : stryMutAct_9fa48("1236") ? medianStep >= 0 : stryMutAct_9fa48("1235") ? false : stryMutAct_9fa48("1234") ? true : (stryCov_9fa48("1234", "1235", "1236", "1237"), medianStep > 0)) ? stryMutAct_9fa48("1238") ? medianOf(steps.map(d => Math.abs(d - medianStep))) * medianStep : (stryCov_9fa48("1238"), medianOf(steps.map(stryMutAct_9fa48("1239") ? () => undefined : (stryCov_9fa48("1239"), d => Math.abs(stryMutAct_9fa48("1240") ? d + medianStep : (stryCov_9fa48("1240"), d - medianStep))))) / medianStep) : Infinity
    });
  }
}

/** The numbers of every column in the first data rows (unreadable fields left out). */
export function columnValues(text: string, layout: Pick<LogLayoutGuess, "delimiter" | "decimalComma" | "hasHeader" | "columnCount">): number[][] {
  if (stryMutAct_9fa48("1241")) {
    {}
  } else {
    stryCov_9fa48("1241");
    const lines = stryMutAct_9fa48("1242") ? logLines(text) : (stryCov_9fa48("1242"), logLines(text).slice(layout.hasHeader ? 1 : 0, stryMutAct_9fa48("1243") ? SAMPLE_ROWS - 1 : (stryCov_9fa48("1243"), SAMPLE_ROWS + 1)));
    const cols: number[][] = Array.from(stryMutAct_9fa48("1244") ? {} : (stryCov_9fa48("1244"), {
      length: layout.columnCount
    }), stryMutAct_9fa48("1245") ? () => undefined : (stryCov_9fa48("1245"), () => stryMutAct_9fa48("1246") ? ["Stryker was here"] : (stryCov_9fa48("1246"), [])));
    for (const {
      text: raw
    } of lines) {
      if (stryMutAct_9fa48("1247")) {
        {}
      } else {
        stryCov_9fa48("1247");
        const f = splitLine(raw, layout.delimiter);
        for (let c = 0; stryMutAct_9fa48("1250") ? c >= cols.length : stryMutAct_9fa48("1249") ? c <= cols.length : stryMutAct_9fa48("1248") ? false : (stryCov_9fa48("1248", "1249", "1250"), c < cols.length); stryMutAct_9fa48("1251") ? c-- : (stryCov_9fa48("1251"), c++)) {
          if (stryMutAct_9fa48("1252")) {
            {}
          } else {
            stryCov_9fa48("1252");
            const v = (stryMutAct_9fa48("1255") ? f[c] !== undefined : stryMutAct_9fa48("1254") ? false : stryMutAct_9fa48("1253") ? true : (stryCov_9fa48("1253", "1254", "1255"), f[c] === undefined)) ? null : readNumber(f[c], layout.decimalComma);
            if (stryMutAct_9fa48("1258") ? v === null : stryMutAct_9fa48("1257") ? false : stryMutAct_9fa48("1256") ? true : (stryCov_9fa48("1256", "1257", "1258"), v !== null)) cols[c].push(v);
          }
        }
      }
    }
    return cols;
  }
}

// ---------- what the values say ----------

/**
 * Time: a rising column of small numbers. "Small" is under 500 (seconds of a log up to about
 * eight minutes), or steps of a second or less (a longer log in seconds), or a start under 100
 * (milliseconds from the start of the log). A pull's engine speed also rises, but from hundreds
 * of rpm in steps of tens.
 */
export function looksLikeTime(p: ColumnProfile): boolean {
  if (stryMutAct_9fa48("1259")) {
    {}
  } else {
    stryCov_9fa48("1259");
    return stryMutAct_9fa48("1262") ? p.rising && p.min >= 0 || p.max < 500 || p.medianStep <= 1 || p.min < 100 : stryMutAct_9fa48("1261") ? false : stryMutAct_9fa48("1260") ? true : (stryCov_9fa48("1260", "1261", "1262"), (stryMutAct_9fa48("1264") ? p.rising || p.min >= 0 : stryMutAct_9fa48("1263") ? true : (stryCov_9fa48("1263", "1264"), p.rising && (stryMutAct_9fa48("1267") ? p.min < 0 : stryMutAct_9fa48("1266") ? p.min > 0 : stryMutAct_9fa48("1265") ? true : (stryCov_9fa48("1265", "1266", "1267"), p.min >= 0)))) && (stryMutAct_9fa48("1269") ? (p.max < 500 || p.medianStep <= 1) && p.min < 100 : stryMutAct_9fa48("1268") ? true : (stryCov_9fa48("1268", "1269"), (stryMutAct_9fa48("1271") ? p.max < 500 && p.medianStep <= 1 : stryMutAct_9fa48("1270") ? false : (stryCov_9fa48("1270", "1271"), (stryMutAct_9fa48("1274") ? p.max >= 500 : stryMutAct_9fa48("1273") ? p.max <= 500 : stryMutAct_9fa48("1272") ? false : (stryCov_9fa48("1272", "1273", "1274"), p.max < 500)) || (stryMutAct_9fa48("1277") ? p.medianStep > 1 : stryMutAct_9fa48("1276") ? p.medianStep < 1 : stryMutAct_9fa48("1275") ? false : (stryCov_9fa48("1275", "1276", "1277"), p.medianStep <= 1)))) || (stryMutAct_9fa48("1280") ? p.min >= 100 : stryMutAct_9fa48("1279") ? p.min <= 100 : stryMutAct_9fa48("1278") ? false : (stryCov_9fa48("1278", "1279", "1280"), p.min < 100)))));
  }
}

/** Engine speed: never time-like; median 500–10,000 rpm, nothing below 0 or above 20,000. */
export function looksLikeEngineSpeed(p: ColumnProfile): boolean {
  if (stryMutAct_9fa48("1281")) {
    {}
  } else {
    stryCov_9fa48("1281");
    return stryMutAct_9fa48("1284") ? !looksLikeTime(p) && p.min >= 0 && p.max <= 20_000 && p.median >= 500 || p.median <= 10_000 : stryMutAct_9fa48("1283") ? false : stryMutAct_9fa48("1282") ? true : (stryCov_9fa48("1282", "1283", "1284"), (stryMutAct_9fa48("1286") ? !looksLikeTime(p) && p.min >= 0 && p.max <= 20_000 || p.median >= 500 : stryMutAct_9fa48("1285") ? true : (stryCov_9fa48("1285", "1286"), (stryMutAct_9fa48("1288") ? !looksLikeTime(p) && p.min >= 0 || p.max <= 20_000 : stryMutAct_9fa48("1287") ? true : (stryCov_9fa48("1287", "1288"), (stryMutAct_9fa48("1290") ? !looksLikeTime(p) || p.min >= 0 : stryMutAct_9fa48("1289") ? true : (stryCov_9fa48("1289", "1290"), (stryMutAct_9fa48("1291") ? looksLikeTime(p) : (stryCov_9fa48("1291"), !looksLikeTime(p))) && (stryMutAct_9fa48("1294") ? p.min < 0 : stryMutAct_9fa48("1293") ? p.min > 0 : stryMutAct_9fa48("1292") ? true : (stryCov_9fa48("1292", "1293", "1294"), p.min >= 0)))) && (stryMutAct_9fa48("1297") ? p.max > 20_000 : stryMutAct_9fa48("1296") ? p.max < 20_000 : stryMutAct_9fa48("1295") ? true : (stryCov_9fa48("1295", "1296", "1297"), p.max <= 20_000)))) && (stryMutAct_9fa48("1300") ? p.median < 500 : stryMutAct_9fa48("1299") ? p.median > 500 : stryMutAct_9fa48("1298") ? true : (stryCov_9fa48("1298", "1299", "1300"), p.median >= 500)))) && (stryMutAct_9fa48("1303") ? p.median > 10_000 : stryMutAct_9fa48("1302") ? p.median < 10_000 : stryMutAct_9fa48("1301") ? true : (stryCov_9fa48("1301", "1302", "1303"), p.median <= 10_000)));
  }
}

/** Throttle: 0–100 % and a run from part throttle (≤ 30 %) to wide open (≥ 95 %) in the same log. */
export function looksLikeThrottle(p: ColumnProfile): boolean {
  if (stryMutAct_9fa48("1304")) {
    {}
  } else {
    stryCov_9fa48("1304");
    return stryMutAct_9fa48("1307") ? !looksLikeTime(p) && p.min >= 0 && p.min <= 30 && p.max >= 95 || p.max <= 100.5 : stryMutAct_9fa48("1306") ? false : stryMutAct_9fa48("1305") ? true : (stryCov_9fa48("1305", "1306", "1307"), (stryMutAct_9fa48("1309") ? !looksLikeTime(p) && p.min >= 0 && p.min <= 30 || p.max >= 95 : stryMutAct_9fa48("1308") ? true : (stryCov_9fa48("1308", "1309"), (stryMutAct_9fa48("1311") ? !looksLikeTime(p) && p.min >= 0 || p.min <= 30 : stryMutAct_9fa48("1310") ? true : (stryCov_9fa48("1310", "1311"), (stryMutAct_9fa48("1313") ? !looksLikeTime(p) || p.min >= 0 : stryMutAct_9fa48("1312") ? true : (stryCov_9fa48("1312", "1313"), (stryMutAct_9fa48("1314") ? looksLikeTime(p) : (stryCov_9fa48("1314"), !looksLikeTime(p))) && (stryMutAct_9fa48("1317") ? p.min < 0 : stryMutAct_9fa48("1316") ? p.min > 0 : stryMutAct_9fa48("1315") ? true : (stryCov_9fa48("1315", "1316", "1317"), p.min >= 0)))) && (stryMutAct_9fa48("1320") ? p.min > 30 : stryMutAct_9fa48("1319") ? p.min < 30 : stryMutAct_9fa48("1318") ? true : (stryCov_9fa48("1318", "1319", "1320"), p.min <= 30)))) && (stryMutAct_9fa48("1323") ? p.max < 95 : stryMutAct_9fa48("1322") ? p.max > 95 : stryMutAct_9fa48("1321") ? true : (stryCov_9fa48("1321", "1322", "1323"), p.max >= 95)))) && (stryMutAct_9fa48("1326") ? p.max > 100.5 : stryMutAct_9fa48("1325") ? p.max < 100.5 : stryMutAct_9fa48("1324") ? true : (stryCov_9fa48("1324", "1325", "1326"), p.max <= 100.5)));
  }
}
export type PressureGuess = {
  unit: PressureUnit;
  kind: "gauge" | "absolute";
};

/**
 * Manifold pressure from its range: within −1…4 is bar (gauge, as boost logs usually are);
 * a median of 90–300 with nothing under 15 is kPa absolute; within −15…45 is psi gauge; other
 * readings within −100…300 are kPa gauge. Null when no pressure reads like this.
 */
export function pressureFromValues(p: ColumnProfile): PressureGuess | null {
  if (stryMutAct_9fa48("1327")) {
    {}
  } else {
    stryCov_9fa48("1327");
    if (stryMutAct_9fa48("1330") ? p.min >= -1 || p.max <= 4 : stryMutAct_9fa48("1329") ? false : stryMutAct_9fa48("1328") ? true : (stryCov_9fa48("1328", "1329", "1330"), (stryMutAct_9fa48("1333") ? p.min < -1 : stryMutAct_9fa48("1332") ? p.min > -1 : stryMutAct_9fa48("1331") ? true : (stryCov_9fa48("1331", "1332", "1333"), p.min >= (stryMutAct_9fa48("1334") ? +1 : (stryCov_9fa48("1334"), -1)))) && (stryMutAct_9fa48("1337") ? p.max > 4 : stryMutAct_9fa48("1336") ? p.max < 4 : stryMutAct_9fa48("1335") ? true : (stryCov_9fa48("1335", "1336", "1337"), p.max <= 4)))) return stryMutAct_9fa48("1338") ? {} : (stryCov_9fa48("1338"), {
      unit: stryMutAct_9fa48("1339") ? "" : (stryCov_9fa48("1339"), "bar"),
      kind: stryMutAct_9fa48("1340") ? "" : (stryCov_9fa48("1340"), "gauge")
    });
    if (stryMutAct_9fa48("1343") ? p.median >= 90 && p.median <= 300 && p.min >= 15 || p.max <= 400 : stryMutAct_9fa48("1342") ? false : stryMutAct_9fa48("1341") ? true : (stryCov_9fa48("1341", "1342", "1343"), (stryMutAct_9fa48("1345") ? p.median >= 90 && p.median <= 300 || p.min >= 15 : stryMutAct_9fa48("1344") ? true : (stryCov_9fa48("1344", "1345"), (stryMutAct_9fa48("1347") ? p.median >= 90 || p.median <= 300 : stryMutAct_9fa48("1346") ? true : (stryCov_9fa48("1346", "1347"), (stryMutAct_9fa48("1350") ? p.median < 90 : stryMutAct_9fa48("1349") ? p.median > 90 : stryMutAct_9fa48("1348") ? true : (stryCov_9fa48("1348", "1349", "1350"), p.median >= 90)) && (stryMutAct_9fa48("1353") ? p.median > 300 : stryMutAct_9fa48("1352") ? p.median < 300 : stryMutAct_9fa48("1351") ? true : (stryCov_9fa48("1351", "1352", "1353"), p.median <= 300)))) && (stryMutAct_9fa48("1356") ? p.min < 15 : stryMutAct_9fa48("1355") ? p.min > 15 : stryMutAct_9fa48("1354") ? true : (stryCov_9fa48("1354", "1355", "1356"), p.min >= 15)))) && (stryMutAct_9fa48("1359") ? p.max > 400 : stryMutAct_9fa48("1358") ? p.max < 400 : stryMutAct_9fa48("1357") ? true : (stryCov_9fa48("1357", "1358", "1359"), p.max <= 400)))) return stryMutAct_9fa48("1360") ? {} : (stryCov_9fa48("1360"), {
      unit: stryMutAct_9fa48("1361") ? "" : (stryCov_9fa48("1361"), "kPa"),
      kind: stryMutAct_9fa48("1362") ? "" : (stryCov_9fa48("1362"), "absolute")
    });
    if (stryMutAct_9fa48("1365") ? p.min >= -15 || p.max <= 45 : stryMutAct_9fa48("1364") ? false : stryMutAct_9fa48("1363") ? true : (stryCov_9fa48("1363", "1364", "1365"), (stryMutAct_9fa48("1368") ? p.min < -15 : stryMutAct_9fa48("1367") ? p.min > -15 : stryMutAct_9fa48("1366") ? true : (stryCov_9fa48("1366", "1367", "1368"), p.min >= (stryMutAct_9fa48("1369") ? +15 : (stryCov_9fa48("1369"), -15)))) && (stryMutAct_9fa48("1372") ? p.max > 45 : stryMutAct_9fa48("1371") ? p.max < 45 : stryMutAct_9fa48("1370") ? true : (stryCov_9fa48("1370", "1371", "1372"), p.max <= 45)))) return stryMutAct_9fa48("1373") ? {} : (stryCov_9fa48("1373"), {
      unit: stryMutAct_9fa48("1374") ? "" : (stryCov_9fa48("1374"), "psi"),
      kind: stryMutAct_9fa48("1375") ? "" : (stryCov_9fa48("1375"), "gauge")
    });
    if (stryMutAct_9fa48("1378") ? p.min >= -100 || p.max <= 300 : stryMutAct_9fa48("1377") ? false : stryMutAct_9fa48("1376") ? true : (stryCov_9fa48("1376", "1377", "1378"), (stryMutAct_9fa48("1381") ? p.min < -100 : stryMutAct_9fa48("1380") ? p.min > -100 : stryMutAct_9fa48("1379") ? true : (stryCov_9fa48("1379", "1380", "1381"), p.min >= (stryMutAct_9fa48("1382") ? +100 : (stryCov_9fa48("1382"), -100)))) && (stryMutAct_9fa48("1385") ? p.max > 300 : stryMutAct_9fa48("1384") ? p.max < 300 : stryMutAct_9fa48("1383") ? true : (stryCov_9fa48("1383", "1384", "1385"), p.max <= 300)))) return stryMutAct_9fa48("1386") ? {} : (stryCov_9fa48("1386"), {
      unit: stryMutAct_9fa48("1387") ? "" : (stryCov_9fa48("1387"), "kPa"),
      kind: stryMutAct_9fa48("1388") ? "" : (stryCov_9fa48("1388"), "gauge")
    });
    return null;
  }
}

/**
 * Intake air temperature unit from the median: 200 or more is kelvin, 60–200 is °F (60 °F is
 * 16 °C; an intake with a median of 60 °C or more is rare), under 60 is °C. Null outside −40…400.
 */
export function temperatureUnitFromValues(p: ColumnProfile): TemperatureUnit | null {
  if (stryMutAct_9fa48("1389")) {
    {}
  } else {
    stryCov_9fa48("1389");
    if (stryMutAct_9fa48("1392") ? p.median < -40 && p.median > 400 : stryMutAct_9fa48("1391") ? false : stryMutAct_9fa48("1390") ? true : (stryCov_9fa48("1390", "1391", "1392"), (stryMutAct_9fa48("1395") ? p.median >= -40 : stryMutAct_9fa48("1394") ? p.median <= -40 : stryMutAct_9fa48("1393") ? false : (stryCov_9fa48("1393", "1394", "1395"), p.median < (stryMutAct_9fa48("1396") ? +40 : (stryCov_9fa48("1396"), -40)))) || (stryMutAct_9fa48("1399") ? p.median <= 400 : stryMutAct_9fa48("1398") ? p.median >= 400 : stryMutAct_9fa48("1397") ? false : (stryCov_9fa48("1397", "1398", "1399"), p.median > 400)))) return null;
    return (stryMutAct_9fa48("1403") ? p.median < 200 : stryMutAct_9fa48("1402") ? p.median > 200 : stryMutAct_9fa48("1401") ? false : stryMutAct_9fa48("1400") ? true : (stryCov_9fa48("1400", "1401", "1402", "1403"), p.median >= 200)) ? stryMutAct_9fa48("1404") ? "" : (stryCov_9fa48("1404"), "K") : (stryMutAct_9fa48("1408") ? p.median < 60 : stryMutAct_9fa48("1407") ? p.median > 60 : stryMutAct_9fa48("1406") ? false : stryMutAct_9fa48("1405") ? true : (stryCov_9fa48("1405", "1406", "1407", "1408"), p.median >= 60)) ? stryMutAct_9fa48("1409") ? "" : (stryCov_9fa48("1409"), "F") : stryMutAct_9fa48("1410") ? "" : (stryCov_9fa48("1410"), "C");
  }
}

/** How much a column moves against its size: boost swings through a pull, air temperature drifts. */
const relativeSpread = stryMutAct_9fa48("1411") ? () => undefined : (stryCov_9fa48("1411"), (() => {
  const relativeSpread = (p: ColumnProfile) => stryMutAct_9fa48("1412") ? (p.max - p.min) * Math.max(Math.abs(p.median), 1) : (stryCov_9fa48("1412"), (stryMutAct_9fa48("1413") ? p.max + p.min : (stryCov_9fa48("1413"), p.max - p.min)) / (stryMutAct_9fa48("1414") ? Math.min(Math.abs(p.median), 1) : (stryCov_9fa48("1414"), Math.max(Math.abs(p.median), 1))));
  return relativeSpread;
})());

// ---------- what the headings say ----------

// English and German trade words; a heading match still needs values that fit (or no values).
const HEADINGS = {
  time: /^time|\btime\b|\(s\)|seconds|^t$|^zeit|\bzeit\b/,
  rpm: /rpm|engine speed|\bspeed\b|\brev|drehzahl|u\/min|1\/min/,
  pressure: /boost|map\b|manifold|pressure|druck/,
  notPressure: /baro|ambient|umgebung|atmos|temp/,
  temperature: /iat|intake.*(air|temp)|air temp|charge temp|temp|ansaugluft/,
  throttle: /throttle|tps|pedal|drossel|gaspedal/
} as const;

/** Column notes for the person: why a column or unit was picked ("from the values: median 38"). */
export type GuessNotes = Partial<Record<"time" | "rpm" | "pressure" | "pressureUnit" | "intakeTemperature" | "temperatureUnit" | "throttle", string>>;
const round = stryMutAct_9fa48("1415") ? () => undefined : (stryCov_9fa48("1415"), (() => {
  const round = (v: number) => Number(v.toPrecision(3)).toLocaleString(stryMutAct_9fa48("1416") ? "" : (stryCov_9fa48("1416"), "en-US"));
  return round;
})());
const range = stryMutAct_9fa48("1417") ? () => undefined : (stryCov_9fa48("1417"), (() => {
  const range = (p: ColumnProfile) => stryMutAct_9fa48("1418") ? `` : (stryCov_9fa48("1418"), `${round(p.min)}–${round(p.max)}`);
  return range;
})());

/**
 * A first guess of the mapping. With the file's text it reads the values too: headings win when
 * their column's values fit, and values alone place the columns the headings do not name. The
 * result does not depend on the order of the columns (ties apart).
 */
export function guessMapping(layout: LogLayoutGuess, text?: string): DatalogMappingInput & {
  notes: GuessNotes;
} {
  if (stryMutAct_9fa48("1419")) {
    {}
  } else {
    stryCov_9fa48("1419");
    const names = layout.columns.map(stryMutAct_9fa48("1420") ? () => undefined : (stryCov_9fa48("1420"), c => stryMutAct_9fa48("1421") ? c.toUpperCase() : (stryCov_9fa48("1421"), c.toLowerCase())));
    const profiles = (text ? columnValues(text, layout) : names.map(stryMutAct_9fa48("1422") ? () => undefined : (stryCov_9fa48("1422"), () => stryMutAct_9fa48("1423") ? ["Stryker was here"] : (stryCov_9fa48("1423"), [])))).map(profileColumn);
    const used = new Set<number>();
    const notes: GuessNotes = {};
    type Field = "time" | "rpm" | "throttle" | "pressure" | "intakeTemperature";
    // Per quantity: the heading, what a named column's values must allow (loose), what values
    // alone must show (strict), and which of several fitting columns to prefer.
    const rules: {
      field: Field;
      heading: RegExp;
      not?: RegExp;
      named: (p: ColumnProfile) => boolean;
      values: (p: ColumnProfile) => boolean;
      rank?: (p: ColumnProfile) => number;
    }[] = stryMutAct_9fa48("1424") ? [] : (stryCov_9fa48("1424"), [// Of several rising columns, time is the one logged by the steadiest clock.
    // A column headed "time" may count in milliseconds from anywhere; it must still rise.
    stryMutAct_9fa48("1425") ? {} : (stryCov_9fa48("1425"), {
      field: stryMutAct_9fa48("1426") ? "" : (stryCov_9fa48("1426"), "time"),
      heading: HEADINGS.time,
      named: stryMutAct_9fa48("1427") ? () => undefined : (stryCov_9fa48("1427"), p => stryMutAct_9fa48("1430") ? p.rising || p.min >= 0 : stryMutAct_9fa48("1429") ? false : stryMutAct_9fa48("1428") ? true : (stryCov_9fa48("1428", "1429", "1430"), p.rising && (stryMutAct_9fa48("1433") ? p.min < 0 : stryMutAct_9fa48("1432") ? p.min > 0 : stryMutAct_9fa48("1431") ? true : (stryCov_9fa48("1431", "1432", "1433"), p.min >= 0)))),
      values: looksLikeTime,
      rank: stryMutAct_9fa48("1434") ? () => undefined : (stryCov_9fa48("1434"), p => stryMutAct_9fa48("1435") ? +p.stepUnevenness : (stryCov_9fa48("1435"), -p.stepUnevenness))
    }), stryMutAct_9fa48("1436") ? {} : (stryCov_9fa48("1436"), {
      field: stryMutAct_9fa48("1437") ? "" : (stryCov_9fa48("1437"), "rpm"),
      heading: HEADINGS.rpm,
      named: stryMutAct_9fa48("1438") ? () => undefined : (stryCov_9fa48("1438"), p => stryMutAct_9fa48("1441") ? !looksLikeTime(p) && p.min >= 0 || p.max <= 20_000 : stryMutAct_9fa48("1440") ? false : stryMutAct_9fa48("1439") ? true : (stryCov_9fa48("1439", "1440", "1441"), (stryMutAct_9fa48("1443") ? !looksLikeTime(p) || p.min >= 0 : stryMutAct_9fa48("1442") ? true : (stryCov_9fa48("1442", "1443"), (stryMutAct_9fa48("1444") ? looksLikeTime(p) : (stryCov_9fa48("1444"), !looksLikeTime(p))) && (stryMutAct_9fa48("1447") ? p.min < 0 : stryMutAct_9fa48("1446") ? p.min > 0 : stryMutAct_9fa48("1445") ? true : (stryCov_9fa48("1445", "1446", "1447"), p.min >= 0)))) && (stryMutAct_9fa48("1450") ? p.max > 20_000 : stryMutAct_9fa48("1449") ? p.max < 20_000 : stryMutAct_9fa48("1448") ? true : (stryCov_9fa48("1448", "1449", "1450"), p.max <= 20_000)))),
      values: looksLikeEngineSpeed
    }), stryMutAct_9fa48("1451") ? {} : (stryCov_9fa48("1451"), {
      field: stryMutAct_9fa48("1452") ? "" : (stryCov_9fa48("1452"), "throttle"),
      heading: HEADINGS.throttle,
      named: stryMutAct_9fa48("1453") ? () => undefined : (stryCov_9fa48("1453"), p => stryMutAct_9fa48("1456") ? p.min >= -1 || p.max <= 110 : stryMutAct_9fa48("1455") ? false : stryMutAct_9fa48("1454") ? true : (stryCov_9fa48("1454", "1455", "1456"), (stryMutAct_9fa48("1459") ? p.min < -1 : stryMutAct_9fa48("1458") ? p.min > -1 : stryMutAct_9fa48("1457") ? true : (stryCov_9fa48("1457", "1458", "1459"), p.min >= (stryMutAct_9fa48("1460") ? +1 : (stryCov_9fa48("1460"), -1)))) && (stryMutAct_9fa48("1463") ? p.max > 110 : stryMutAct_9fa48("1462") ? p.max < 110 : stryMutAct_9fa48("1461") ? true : (stryCov_9fa48("1461", "1462", "1463"), p.max <= 110)))),
      values: looksLikeThrottle
    }), stryMutAct_9fa48("1464") ? {} : (stryCov_9fa48("1464"), {
      field: stryMutAct_9fa48("1465") ? "" : (stryCov_9fa48("1465"), "pressure"),
      heading: HEADINGS.pressure,
      not: HEADINGS.notPressure,
      named: stryMutAct_9fa48("1466") ? () => undefined : (stryCov_9fa48("1466"), p => stryMutAct_9fa48("1469") ? pressureFromValues(p) === null : stryMutAct_9fa48("1468") ? false : stryMutAct_9fa48("1467") ? true : (stryCov_9fa48("1467", "1468", "1469"), pressureFromValues(p) !== null)),
      values: stryMutAct_9fa48("1470") ? () => undefined : (stryCov_9fa48("1470"), p => stryMutAct_9fa48("1473") ? pressureFromValues(p) === null : stryMutAct_9fa48("1472") ? false : stryMutAct_9fa48("1471") ? true : (stryCov_9fa48("1471", "1472", "1473"), pressureFromValues(p) !== null)),
      rank: relativeSpread
    }), stryMutAct_9fa48("1474") ? {} : (stryCov_9fa48("1474"), {
      field: stryMutAct_9fa48("1475") ? "" : (stryCov_9fa48("1475"), "intakeTemperature"),
      heading: HEADINGS.temperature,
      named: stryMutAct_9fa48("1476") ? () => undefined : (stryCov_9fa48("1476"), p => stryMutAct_9fa48("1479") ? temperatureUnitFromValues(p) === null : stryMutAct_9fa48("1478") ? false : stryMutAct_9fa48("1477") ? true : (stryCov_9fa48("1477", "1478", "1479"), temperatureUnitFromValues(p) !== null)),
      values: stryMutAct_9fa48("1480") ? () => undefined : (stryCov_9fa48("1480"), p => stryMutAct_9fa48("1483") ? temperatureUnitFromValues(p) === null : stryMutAct_9fa48("1482") ? false : stryMutAct_9fa48("1481") ? true : (stryCov_9fa48("1481", "1482", "1483"), temperatureUnitFromValues(p) !== null)),
      rank: stryMutAct_9fa48("1484") ? () => undefined : (stryCov_9fa48("1484"), p => stryMutAct_9fa48("1485") ? +relativeSpread(p) : (stryCov_9fa48("1485"), -relativeSpread(p)))
    })]);
    const found: Partial<Record<Field, number>> = {};
    const free = stryMutAct_9fa48("1486") ? () => undefined : (stryCov_9fa48("1486"), (() => {
      const free = () => stryMutAct_9fa48("1487") ? names.map((_, i) => i) : (stryCov_9fa48("1487"), names.map(stryMutAct_9fa48("1488") ? () => undefined : (stryCov_9fa48("1488"), (_, i) => i)).filter(stryMutAct_9fa48("1489") ? () => undefined : (stryCov_9fa48("1489"), i => stryMutAct_9fa48("1490") ? used.has(i) : (stryCov_9fa48("1490"), !used.has(i)))));
      return free;
    })());
    // Headings first, for every quantity, so values never take a column a heading names.
    for (const r of rules) {
      if (stryMutAct_9fa48("1491")) {
        {}
      } else {
        stryCov_9fa48("1491");
        const col = free().find(stryMutAct_9fa48("1492") ? () => undefined : (stryCov_9fa48("1492"), i => stryMutAct_9fa48("1495") ? r.heading.test(names[i]) && !(r.not && r.not.test(names[i])) || profiles[i] === null || r.named(profiles[i]) : stryMutAct_9fa48("1494") ? false : stryMutAct_9fa48("1493") ? true : (stryCov_9fa48("1493", "1494", "1495"), (stryMutAct_9fa48("1497") ? r.heading.test(names[i]) || !(r.not && r.not.test(names[i])) : stryMutAct_9fa48("1496") ? true : (stryCov_9fa48("1496", "1497"), r.heading.test(names[i]) && (stryMutAct_9fa48("1498") ? r.not && r.not.test(names[i]) : (stryCov_9fa48("1498"), !(stryMutAct_9fa48("1501") ? r.not || r.not.test(names[i]) : stryMutAct_9fa48("1500") ? false : stryMutAct_9fa48("1499") ? true : (stryCov_9fa48("1499", "1500", "1501"), r.not && r.not.test(names[i]))))))) && (stryMutAct_9fa48("1503") ? profiles[i] === null && r.named(profiles[i]) : stryMutAct_9fa48("1502") ? true : (stryCov_9fa48("1502", "1503"), (stryMutAct_9fa48("1505") ? profiles[i] !== null : stryMutAct_9fa48("1504") ? false : (stryCov_9fa48("1504", "1505"), profiles[i] === null)) || r.named(profiles[i]))))));
        if (stryMutAct_9fa48("1508") ? col !== undefined : stryMutAct_9fa48("1507") ? false : stryMutAct_9fa48("1506") ? true : (stryCov_9fa48("1506", "1507", "1508"), col === undefined)) continue;
        found[r.field] = col;
        used.add(col);
      }
    }
    for (const r of rules) {
      if (stryMutAct_9fa48("1509")) {
        {}
      } else {
        stryCov_9fa48("1509");
        if (stryMutAct_9fa48("1512") ? found[r.field] === undefined : stryMutAct_9fa48("1511") ? false : stryMutAct_9fa48("1510") ? true : (stryCov_9fa48("1510", "1511", "1512"), found[r.field] !== undefined)) continue;
        const fitting = stryMutAct_9fa48("1513") ? free() : (stryCov_9fa48("1513"), free().filter(stryMutAct_9fa48("1514") ? () => undefined : (stryCov_9fa48("1514"), i => stryMutAct_9fa48("1517") ? profiles[i] !== null && r.values(profiles[i]) || !(r.not && r.not.test(names[i])) : stryMutAct_9fa48("1516") ? false : stryMutAct_9fa48("1515") ? true : (stryCov_9fa48("1515", "1516", "1517"), (stryMutAct_9fa48("1519") ? profiles[i] !== null || r.values(profiles[i]) : stryMutAct_9fa48("1518") ? true : (stryCov_9fa48("1518", "1519"), (stryMutAct_9fa48("1521") ? profiles[i] === null : stryMutAct_9fa48("1520") ? true : (stryCov_9fa48("1520", "1521"), profiles[i] !== null)) && r.values(profiles[i]))) && (stryMutAct_9fa48("1522") ? r.not && r.not.test(names[i]) : (stryCov_9fa48("1522"), !(stryMutAct_9fa48("1525") ? r.not || r.not.test(names[i]) : stryMutAct_9fa48("1524") ? false : stryMutAct_9fa48("1523") ? true : (stryCov_9fa48("1523", "1524", "1525"), r.not && r.not.test(names[i])))))))));
        if (stryMutAct_9fa48("1528") ? false : stryMutAct_9fa48("1527") ? true : stryMutAct_9fa48("1526") ? fitting.length : (stryCov_9fa48("1526", "1527", "1528"), !fitting.length)) continue;
        // Highest rank wins; equal ranks keep the earlier column.
        const col = r.rank ? fitting.reduce(stryMutAct_9fa48("1529") ? () => undefined : (stryCov_9fa48("1529"), (a, b) => (stryMutAct_9fa48("1533") ? r.rank!(profiles[b]!) <= r.rank!(profiles[a]!) : stryMutAct_9fa48("1532") ? r.rank!(profiles[b]!) >= r.rank!(profiles[a]!) : stryMutAct_9fa48("1531") ? false : stryMutAct_9fa48("1530") ? true : (stryCov_9fa48("1530", "1531", "1532", "1533"), r.rank!(profiles[b]!) > r.rank!(profiles[a]!))) ? b : a)) : fitting[0];
        found[r.field] = col;
        used.add(col);
        notes[r.field] = stryMutAct_9fa48("1534") ? `` : (stryCov_9fa48("1534"), `Guessed from the values: ${range(profiles[col]!)}`);
      }
    }
    const at = stryMutAct_9fa48("1535") ? () => undefined : (stryCov_9fa48("1535"), (() => {
      const at = (f: Field) => stryMutAct_9fa48("1536") ? found[f] && null : (stryCov_9fa48("1536"), found[f] ?? null);
      return at;
    })());
    const time = at(stryMutAct_9fa48("1537") ? "" : (stryCov_9fa48("1537"), "time"));
    const rpm = at(stryMutAct_9fa48("1538") ? "" : (stryCov_9fa48("1538"), "rpm"));
    const throttle = at(stryMutAct_9fa48("1539") ? "" : (stryCov_9fa48("1539"), "throttle"));
    const pressure = at(stryMutAct_9fa48("1540") ? "" : (stryCov_9fa48("1540"), "pressure"));
    const temp = at(stryMutAct_9fa48("1541") ? "" : (stryCov_9fa48("1541"), "intakeTemperature"));

    // Units: a unit in the heading wins; otherwise the values' range decides.
    const pHeader = (stryMutAct_9fa48("1544") ? pressure !== null : stryMutAct_9fa48("1543") ? false : stryMutAct_9fa48("1542") ? true : (stryCov_9fa48("1542", "1543", "1544"), pressure === null)) ? stryMutAct_9fa48("1545") ? "Stryker was here!" : (stryCov_9fa48("1545"), "") : names[pressure];
    const pProfile = (stryMutAct_9fa48("1548") ? pressure !== null : stryMutAct_9fa48("1547") ? false : stryMutAct_9fa48("1546") ? true : (stryCov_9fa48("1546", "1547", "1548"), pressure === null)) ? null : profiles[pressure];
    const fromValues = pProfile ? pressureFromValues(pProfile) : null;
    const headingUnit: PressureUnit | null = /kpa/.test(pHeader) ? stryMutAct_9fa48("1549") ? "" : (stryCov_9fa48("1549"), "kPa") : /\bbar\b/.test(pHeader) ? stryMutAct_9fa48("1550") ? "" : (stryCov_9fa48("1550"), "bar") : /psi/.test(pHeader) ? stryMutAct_9fa48("1551") ? "" : (stryCov_9fa48("1551"), "psi") : null;
    const headingKind = /boost|gauge|lade|rel/.test(pHeader) ? stryMutAct_9fa48("1552") ? "" : (stryCov_9fa48("1552"), "gauge") : /map\b|abs/.test(pHeader) ? stryMutAct_9fa48("1553") ? "" : (stryCov_9fa48("1553"), "absolute") : null;
    const pressureUnit = stryMutAct_9fa48("1554") ? (headingUnit ?? fromValues?.unit) && "psi" : (stryCov_9fa48("1554"), (stryMutAct_9fa48("1555") ? headingUnit && fromValues?.unit : (stryCov_9fa48("1555"), headingUnit ?? (stryMutAct_9fa48("1556") ? fromValues.unit : (stryCov_9fa48("1556"), fromValues?.unit)))) ?? (stryMutAct_9fa48("1557") ? "" : (stryCov_9fa48("1557"), "psi")));
    const pressureKind = stryMutAct_9fa48("1558") ? headingKind && (fromValues && fromValues.unit === pressureUnit ? fromValues.kind : "gauge") : (stryCov_9fa48("1558"), headingKind ?? ((stryMutAct_9fa48("1561") ? fromValues || fromValues.unit === pressureUnit : stryMutAct_9fa48("1560") ? false : stryMutAct_9fa48("1559") ? true : (stryCov_9fa48("1559", "1560", "1561"), fromValues && (stryMutAct_9fa48("1563") ? fromValues.unit !== pressureUnit : stryMutAct_9fa48("1562") ? true : (stryCov_9fa48("1562", "1563"), fromValues.unit === pressureUnit)))) ? fromValues.kind : stryMutAct_9fa48("1564") ? "" : (stryCov_9fa48("1564"), "gauge")));
    if (stryMutAct_9fa48("1567") ? !headingUnit && fromValues || pProfile : stryMutAct_9fa48("1566") ? false : stryMutAct_9fa48("1565") ? true : (stryCov_9fa48("1565", "1566", "1567"), (stryMutAct_9fa48("1569") ? !headingUnit || fromValues : stryMutAct_9fa48("1568") ? true : (stryCov_9fa48("1568", "1569"), (stryMutAct_9fa48("1570") ? headingUnit : (stryCov_9fa48("1570"), !headingUnit)) && fromValues)) && pProfile)) notes.pressureUnit = stryMutAct_9fa48("1571") ? `` : (stryCov_9fa48("1571"), `Guessed from the values (${range(pProfile)}): ${pressureUnit} ${pressureKind}`);
    const tHeader = (stryMutAct_9fa48("1574") ? temp !== null : stryMutAct_9fa48("1573") ? false : stryMutAct_9fa48("1572") ? true : (stryCov_9fa48("1572", "1573", "1574"), temp === null)) ? stryMutAct_9fa48("1575") ? "Stryker was here!" : (stryCov_9fa48("1575"), "") : names[temp];
    const tProfile = (stryMutAct_9fa48("1578") ? temp !== null : stryMutAct_9fa48("1577") ? false : stryMutAct_9fa48("1576") ? true : (stryCov_9fa48("1576", "1577", "1578"), temp === null)) ? null : profiles[temp];
    const tHeading: TemperatureUnit | null = /°c|\bc\)|celsius|\(c/.test(tHeader) ? stryMutAct_9fa48("1579") ? "" : (stryCov_9fa48("1579"), "C") : /°f|\bf\)|fahrenheit|\(f/.test(tHeader) ? stryMutAct_9fa48("1580") ? "" : (stryCov_9fa48("1580"), "F") : /\(k\)|kelvin|\bk\)/.test(tHeader) ? stryMutAct_9fa48("1581") ? "" : (stryCov_9fa48("1581"), "K") : null;
    const tValues = tProfile ? temperatureUnitFromValues(tProfile) : null;
    const temperatureUnit = stryMutAct_9fa48("1582") ? (tHeading ?? tValues) && "F" : (stryCov_9fa48("1582"), (stryMutAct_9fa48("1583") ? tHeading && tValues : (stryCov_9fa48("1583"), tHeading ?? tValues)) ?? (stryMutAct_9fa48("1584") ? "" : (stryCov_9fa48("1584"), "F")));
    if (stryMutAct_9fa48("1587") ? !tHeading && tValues || tProfile : stryMutAct_9fa48("1586") ? false : stryMutAct_9fa48("1585") ? true : (stryCov_9fa48("1585", "1586", "1587"), (stryMutAct_9fa48("1589") ? !tHeading || tValues : stryMutAct_9fa48("1588") ? true : (stryCov_9fa48("1588", "1589"), (stryMutAct_9fa48("1590") ? tHeading : (stryCov_9fa48("1590"), !tHeading)) && tValues)) && tProfile)) notes.temperatureUnit = stryMutAct_9fa48("1591") ? `` : (stryCov_9fa48("1591"), `Guessed from the values (median ${round(tProfile.median)}): ${temperatureUnitText(temperatureUnit)}`);

    // Placeholders the person must change (the form marks the clash); never the time column.
    const rpmCol = stryMutAct_9fa48("1592") ? rpm && firstFree(names.length, used, time === 0 ? 1 : 0) : (stryCov_9fa48("1592"), rpm ?? firstFree(names.length, used, (stryMutAct_9fa48("1595") ? time !== 0 : stryMutAct_9fa48("1594") ? false : stryMutAct_9fa48("1593") ? true : (stryCov_9fa48("1593", "1594", "1595"), time === 0)) ? 1 : 0));
    return stryMutAct_9fa48("1596") ? {} : (stryCov_9fa48("1596"), {
      delimiter: layout.delimiter,
      decimalComma: layout.decimalComma,
      hasHeader: layout.hasHeader,
      rpm: rpmCol,
      pressure: stryMutAct_9fa48("1597") ? pressure && firstFree(names.length, new Set([...used, rpmCol]), rpmCol === 1 ? 2 : 1) : (stryCov_9fa48("1597"), pressure ?? firstFree(names.length, new Set(stryMutAct_9fa48("1598") ? [] : (stryCov_9fa48("1598"), [...used, rpmCol])), (stryMutAct_9fa48("1601") ? rpmCol !== 1 : stryMutAct_9fa48("1600") ? false : stryMutAct_9fa48("1599") ? true : (stryCov_9fa48("1599", "1600", "1601"), rpmCol === 1)) ? 2 : 1)),
      pressureKind,
      pressureUnit,
      intakeTemperature: temp,
      temperatureUnit,
      time,
      throttle,
      notes
    });
  }
}

/** The first column not taken (a placeholder the person must change), or `fallback`. */
function firstFree(count: number, used: ReadonlySet<number>, fallback: number): number {
  if (stryMutAct_9fa48("1602")) {
    {}
  } else {
    stryCov_9fa48("1602");
    for (let i = 0; stryMutAct_9fa48("1605") ? i >= count : stryMutAct_9fa48("1604") ? i <= count : stryMutAct_9fa48("1603") ? false : (stryCov_9fa48("1603", "1604", "1605"), i < count); stryMutAct_9fa48("1606") ? i-- : (stryCov_9fa48("1606"), i++)) if (stryMutAct_9fa48("1609") ? false : stryMutAct_9fa48("1608") ? true : stryMutAct_9fa48("1607") ? used.has(i) : (stryCov_9fa48("1607", "1608", "1609"), !used.has(i))) return i;
    return fallback;
  }
}