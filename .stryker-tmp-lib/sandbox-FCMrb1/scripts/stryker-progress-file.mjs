// @ts-nocheck
// A Stryker reporter that appends each mutant's result to a JSON-lines file as soon as it is
// known (reports/mutation/progress.jsonl), so a long run's survivors can be read, and scores per
// folder counted, before it ends. `node scripts/mutation-summary.mjs` sums the file up.
import fs from "node:fs";
import path from "node:path";
import { PluginKind, declareClassPlugin } from "@stryker-mutator/api/plugin";

const FILE = process.env.STRYKER_PROGRESS_FILE ?? "reports/mutation/progress.jsonl";

class ProgressFileReporter {
  onMutationTestingPlanReady() {
    fs.mkdirSync(path.dirname(FILE), { recursive: true });
    fs.writeFileSync(FILE, "");
  }

  onMutantTested(m) {
    const line = { file: path.relative(process.cwd(), m.fileName), line: m.location.start.line, column: m.location.start.column, mutator: m.mutatorName, replacement: m.replacement, status: m.status };
    fs.appendFileSync(FILE, JSON.stringify(line) + "\n");
  }
}

export const strykerPlugins = [declareClassPlugin(PluginKind.Reporter, "progress-file", ProgressFileReporter)];
