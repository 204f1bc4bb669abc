// Writes the demo's synthetic log (db/seed/datalogs.ts) to public/samples/demo-datalog.csv, so a
// person can try the upload with a file that matches the demo small-block. Run: npx tsx scripts/write-demo-datalog.ts
import fs from "node:fs";
import path from "node:path";
import { demoDatalogCsv } from "../db/seed/datalogs";

const out = path.join(import.meta.dirname, "..", "public", "samples", "demo-datalog.csv");
fs.mkdirSync(path.dirname(out), { recursive: true });
fs.writeFileSync(out, demoDatalogCsv());
console.log(`wrote ${path.relative(process.cwd(), out)}`);
