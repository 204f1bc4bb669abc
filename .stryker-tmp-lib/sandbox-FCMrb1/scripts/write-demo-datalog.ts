// @ts-nocheck
// Writes the demo's synthetic logs (db/seed/datalogs.ts) to public/samples/, so a person can try
// the upload and the calibration with the files the demo work truck's logs were seeded from.
// Run after a change to the model: npx tsx scripts/write-demo-datalog.ts
import fs from "node:fs";
import path from "node:path";
import { DEMO_DATALOGS, demoLogCsv } from "../db/seed/datalogs";

const dir = path.join(import.meta.dirname, "..", "public", "samples");
fs.mkdirSync(dir, { recursive: true });
for (const log of DEMO_DATALOGS) {
  const out = path.join(dir, log.fileName);
  fs.writeFileSync(out, demoLogCsv(log));
  console.log(`wrote ${path.relative(process.cwd(), out)}`);
}
