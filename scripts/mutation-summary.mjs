// Sums up a mutation run's results per folder and per file, from the progress file of a run
// still going (reports/mutation/progress.jsonl) or the JSON report of a finished one
// (reports/mutation/mutation.json). Score = (killed + timed out) / (all valid mutants), as
// Stryker counts it: survivors and mutants no test reached count against it; compile errors and
// ignored (static) mutants do not count.
//   node scripts/mutation-summary.mjs [file] [--survivors [path-prefix]]
import fs from "node:fs";

const args = process.argv.slice(2);
const showAt = args.indexOf("--survivors");
const prefix = showAt >= 0 ? (args[showAt + 1] ?? "") : null;
const file = args.find((a, i) => !a.startsWith("--") && (showAt < 0 || i !== showAt + 1)) ?? (fs.existsSync("reports/mutation/progress.jsonl") ? "reports/mutation/progress.jsonl" : "reports/mutation/mutation.json");

let rows;
if (file.endsWith(".jsonl")) {
  rows = fs.readFileSync(file, "utf8").split("\n").filter(Boolean).map((l) => JSON.parse(l));
} else {
  const report = JSON.parse(fs.readFileSync(file, "utf8"));
  rows = Object.entries(report.files).flatMap(([name, f]) =>
    f.mutants.map((m) => ({ file: name, line: m.location.start.line, column: m.location.start.column, mutator: m.mutatorName, replacement: m.replacement, status: m.status })),
  );
}

const DETECTED = new Set(["Killed", "Timeout"]);
const UNDETECTED = new Set(["Survived", "NoCoverage"]);
const tally = (list) => {
  const detected = list.filter((r) => DETECTED.has(r.status)).length;
  const undetected = list.filter((r) => UNDETECTED.has(r.status)).length;
  const valid = detected + undetected;
  return { valid, detected, survived: list.filter((r) => r.status === "Survived").length, noCoverage: list.filter((r) => r.status === "NoCoverage").length, score: valid ? (100 * detected) / valid : NaN };
};
const groupBy = (key) => {
  const m = new Map();
  for (const r of rows) (m.get(key(r)) ?? m.set(key(r), []).get(key(r))).push(r);
  return [...m.entries()].sort(([a], [b]) => a.localeCompare(b));
};
const line = (name, t) => `${name.padEnd(44)} ${String(t.valid).padStart(6)} ${String(t.survived).padStart(9)} ${String(t.noCoverage).padStart(11)} ${t.score.toFixed(1).padStart(7)} %`;
const head = `${"scope".padEnd(44)} ${"valid".padStart(6)} ${"survived".padStart(9)} ${"no coverage".padStart(11)} ${"score".padStart(9)}`;

console.log(`${file}: ${rows.length} mutants\n`);
console.log(head);
for (const [folder, list] of groupBy((r) => r.file.split("/")[0] + "/")) console.log(line(folder, tally(list)));
console.log(line("all", tally(rows)));
console.log(`\n${head}`);
for (const [name, list] of groupBy((r) => r.file)) {
  const t = tally(list);
  if (t.valid) console.log(line(name, t));
}
if (prefix !== null) {
  console.log("\nsurvivors and mutants no test reached:");
  for (const r of rows.filter((r) => UNDETECTED.has(r.status) && r.file.startsWith(prefix)).sort((a, b) => a.file.localeCompare(b.file) || a.line - b.line)) {
    console.log(`${r.file}:${r.line}:${r.column} ${r.status} ${r.mutator}: ${JSON.stringify(r.replacement).slice(0, 100)}`);
  }
}
