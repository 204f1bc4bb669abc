// @ts-nocheck
// `npm test`: lint and type-check, then a throwaway PostgreSQL cluster, mail and payment fakes for this run,
// unit + property + database integration tests, a production build served on loopback, HTTP and
// browser (Chromium) tests against it; then it stops everything it started and prints one summary.
//
//   npm test                        everything
//   npm test -- --quick             skip lint and type-check
//   npm test -- --unit              no build, no browser
//   npm test -- --e2e [--skip-build] only the served-app phase
//   npm test -- some/file           only test files whose path contains the word
import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import pg from "pg";
import { destroyCluster, freePort, startCluster, type Cluster } from "./cluster";
import { connect } from "../db/connect";
import { runMigrations } from "../db/migrate";
import { seedDemo } from "../db/seed";
import { startMailFake, type MailFake } from "./mail-fake";
import { startPaymentFake, type PaymentFake } from "./payment-fake";
import { buildNext, ensureChromium, nextEnv, root, run, startNext, stopGroup, waitForHttp, type Env } from "./proc";

const argv = process.argv.slice(2);
const flags = new Set(argv.filter((a) => a.startsWith("--")));
const filters = argv.filter((a) => !a.startsWith("--"));
const doChecks = !flags.has("--quick") && !flags.has("--e2e") && filters.length === 0;
const doUnit = !flags.has("--e2e");
const doE2e = !flags.has("--unit");
const distDir = process.env.NEXT_DIST_DIR || ".next-test";

type Tally = { passed: number; failed: number; skipped: number };
const tally: Tally = { passed: 0, failed: 0, skipped: 0 };
const problems: string[] = [];

let cluster: Cluster | undefined;
let mail: MailFake | undefined;
let payments: PaymentFake | undefined;
let app: ReturnType<typeof startNext> | undefined;
const workDir = fs.mkdtempSync(path.join(os.tmpdir(), "pw-test-"));
// The database runs as the postgres user when we are root: it must be able to reach its folder.
fs.chmodSync(workDir, 0o711);

async function cleanup() {
  stopGroup(app);
  await mail?.stop().catch(() => {});
  await payments?.stop().catch(() => {});
  if (cluster) destroyCluster(cluster);
  fs.rmSync(workDir, { recursive: true, force: true });
}
process.on("SIGINT", () => void cleanup().then(() => process.exit(130)));

/** Runs vitest with a JSON report and adds its counts to the tally. */
async function vitest(config: string, env: Env, label: string) {
  const report = path.join(workDir, `${label}.json`);
  const code = await run(
    process.execPath,
    [path.join(root, "node_modules/vitest/vitest.mjs"), "run", "--config", config, "--reporter=default", "--reporter=json", `--outputFile.json=${report}`, ...filters],
    { env },
  );
  if (!fs.existsSync(report)) {
    if (code !== 0) {
      tally.failed++;
      problems.push(`${label}: vitest exited ${code} without a report`);
    }
    return;
  }
  const r = JSON.parse(fs.readFileSync(report, "utf8"));
  tally.passed += r.numPassedTests;
  tally.failed += r.numFailedTests;
  tally.skipped += r.numPendingTests + (r.numTodoTests ?? 0);
  // A file that failed to load counts as a failure even with no failed test in it.
  const broken = (r.testResults ?? []).filter((f: { status: string; assertionResults: unknown[] }) => f.status === "failed" && f.assertionResults.length === 0);
  if (broken.length) {
    tally.failed += broken.length;
    problems.push(...broken.map((f: { name: string }) => `${label}: ${path.relative(root, f.name)} failed to run`));
  }
  if (code !== 0 && r.numFailedTests === 0 && !broken.length) {
    // A failing hook or an empty run: no test failed, but the run did not pass either.
    tally.failed++;
    problems.push(`${label}: vitest exited ${code} (a failed hook or suite, or no test files)`);
  }
}

async function check(label: string, cmd: string, args: string[]) {
  console.log(`\n▶ ${label}`);
  const code = await run(cmd, args);
  if (code === 0) tally.passed++;
  else {
    tally.failed++;
    problems.push(`${label} failed`);
  }
}

async function main() {
  if (doChecks) {
    await check("ESLint", process.execPath, [path.join(root, "node_modules/eslint/bin/eslint.js"), "."]);
    await check("TypeScript (tsc --noEmit)", process.execPath, [path.join(root, "node_modules/typescript/bin/tsc"), "--noEmit"]);
  }

  const pgPort = await freePort();
  cluster = await startCluster({ dir: path.join(workDir, "pg"), port: pgPort, log: () => {} });
  await runMigrations(cluster.url);
  const baseUrl = cluster.url.replace(/\/app$/, "");
  const testEnv = {
    // Integration tests clone the migrated `app` database per file (tests/support/db.ts).
    PW_TEST_PG_BASE: baseUrl,
    PW_TEST_TEMPLATE_DB: "app",
    PW_PG_DIR: cluster.dir,
    PW_PG_PORT: String(pgPort),
  };

  if (doUnit) {
    console.log("\n▶ Unit, property and database integration tests");
    await vitest("vitest.config.ts", testEnv, "unit");
  }

  if (doE2e) {
    ensureChromium("the browser tests");
    const admin = new pg.Client({ connectionString: cluster.url });
    await admin.connect();
    await admin.query("CREATE DATABASE e2e TEMPLATE app");
    await admin.end();
    const e2eUrl = `${baseUrl}/e2e`;
    const { pool, db } = connect(e2eUrl, 2);
    await seedDemo(db);
    await pool.end();

    mail = await startMailFake({ smtpPort: await freePort(), httpPort: await freePort() });
    const port = await freePort();
    const appUrl = `http://127.0.0.1:${port}`;
    payments = await startPaymentFake({ port: await freePort(), webhookUrl: `${appUrl}/api/payments/webhook` });
    const secret = crypto.randomBytes(32).toString("base64url");
    const env = nextEnv({
      NEXT_DIST_DIR: distDir,
      DATABASE_URL: e2eUrl,
      NEXTAUTH_URL: appUrl,
      AUTH_SECRET: secret,
      NEXTAUTH_SECRET: secret,
      SMTP_URL: mail.smtpUrl,
      MAIL_FAKE_URL: mail.inboxUrl,
      STRIPE_SECRET_KEY: payments.secretKey,
      STRIPE_WEBHOOK_SECRET: payments.webhookSecret,
      STRIPE_API_URL: payments.url,
    });
    if (!flags.has("--skip-build") || !fs.existsSync(path.join(root, distDir, "BUILD_ID"))) {
      console.log(`\n▶ next build (into ${distDir})`);
      const code = await buildNext(env);
      if (code !== 0) {
        tally.failed++;
        problems.push("next build failed");
        return;
      }
    }
    app = startNext({ port, host: "127.0.0.1", env, quiet: true });
    await waitForHttp(`${appUrl}/api/health`);
    console.log(`\n▶ HTTP and browser tests against ${appUrl}`);
    await vitest("vitest.e2e.config.ts", { ...testEnv, PW_BASE_URL: appUrl, MAIL_FAKE_URL: mail.inboxUrl, PW_PAYMENT_FAKE_URL: payments.url, DATABASE_URL: e2eUrl, NEXT_DIST_DIR: distDir }, "e2e");
  }
}

let exitCode = 0;
try {
  await main();
} catch (err) {
  tally.failed++;
  problems.push(`test run aborted: ${err instanceof Error ? err.message : String(err)}`);
} finally {
  await cleanup();
  if (problems.length) console.log("\nProblems:\n" + problems.map((p) => `  - ${p}`).join("\n"));
  console.log(`\nTests: ${tally.passed} passed, ${tally.failed} failed, ${tally.skipped} skipped`);
  exitCode = tally.failed > 0 || tally.passed === 0 ? 1 : 0;
}
process.exit(exitCode);
