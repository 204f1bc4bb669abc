// @ts-nocheck
// `npm start`: private PostgreSQL (unless DATABASE_URL) → migrate → demo seed → mail fake →
// payment fake → production build → serve. Ctrl-C stops the app, the fakes and the database cleanly.
import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { startCluster, type Cluster } from "./cluster";
import { connect } from "../db/connect";
import { runMigrations } from "../db/migrate";
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemo } from "../db/seed";
import { startMailFake, type MailFake } from "./mail-fake";
import { startPaymentFake, type PaymentFake } from "./payment-fake";
import { buildNext, ensureChromium, nextEnv, root, startNext, stopGroup } from "./proc";

const dataDir = path.resolve(process.env.PW_DATA_DIR ?? path.join(root, ".data"));
const port = Number(process.env.PORT ?? 3000);
const host = process.env.HOST ?? "127.0.0.1";
const publicUrl = process.env.NEXTAUTH_URL ?? `http://localhost:${port}`;

let cluster: Cluster | undefined;
let mail: MailFake | undefined;
let payments: PaymentFake | undefined;
let app: ReturnType<typeof startNext> | undefined;
let stopping = false;

async function shutdown(code = 0) {
  if (stopping) return;
  stopping = true;
  console.log("\nStopping Pulleywright …");
  stopGroup(app);
  await new Promise((r) => setTimeout(r, 500));
  await mail?.stop();
  await payments?.stop();
  cluster?.stop();
  console.log("Stopped. Your data is kept in", cluster ? cluster.dir : "your database");
  process.exit(code);
}
process.on("SIGINT", () => void shutdown(0));
process.on("SIGTERM", () => void shutdown(0));

/** A secret from the environment, else one made once and kept in the data folder. */
function keptSecret(envName: "AUTH_SECRET" | "SHARE_SECRET", fileName: string): string {
  if (process.env[envName]) return process.env[envName];
  const file = path.join(dataDir, fileName);
  if (!fs.existsSync(file)) {
    fs.mkdirSync(dataDir, { recursive: true });
    fs.writeFileSync(file, crypto.randomBytes(32).toString("base64url"), { mode: 0o600 });
  }
  return fs.readFileSync(file, "utf8").trim();
}

async function main() {
  fs.mkdirSync(dataDir, { recursive: true });
  let databaseUrl = process.env.DATABASE_URL;
  if (databaseUrl) {
    console.log("Using the database in DATABASE_URL.");
  } else {
    const pgPort = Number(process.env.PW_PG_PORT ?? 54329);
    cluster = await startCluster({ dir: path.join(dataDir, "pg"), port: pgPort });
    databaseUrl = cluster.url;
    console.log(`PostgreSQL is running on 127.0.0.1:${pgPort} (data in ${cluster.dir}).`);
  }

  await runMigrations(databaseUrl);
  console.log("Database migrated.");
  if (process.env.PW_DEMO !== "0") {
    const { pool, db } = connect(databaseUrl, 2);
    try {
      await seedDemo(db);
    } finally {
      await pool.end();
    }
    console.log("Demo scenario present (set PW_DEMO=0 to leave it out).");
  }

  let smtpUrl = process.env.SMTP_URL;
  let mailFakeUrl = process.env.MAIL_FAKE_URL;
  if (!smtpUrl) {
    mail = await startMailFake({
      smtpPort: Number(process.env.PW_SMTP_PORT ?? 2525),
      httpPort: Number(process.env.PW_MAIL_HTTP_PORT ?? 2526),
      file: path.join(dataDir, "mail.json"),
    });
    smtpUrl = mail.smtpUrl;
    mailFakeUrl = mail.inboxUrl;
    console.log(`Local mail fake: SMTP ${mail.smtpUrl}; admins read it under Mailbox.`);
  }

  let paymentEnv: Record<string, string> = {};
  if (!process.env.STRIPE_SECRET_KEY) {
    const appHost = host === "0.0.0.0" || host === "::" ? "127.0.0.1" : host;
    payments = await startPaymentFake({ port: Number(process.env.PW_PAYMENT_PORT ?? 2527), webhookUrl: `http://${appHost}:${port}/api/payments/webhook` });
    paymentEnv = { STRIPE_SECRET_KEY: payments.secretKey, STRIPE_WEBHOOK_SECRET: payments.webhookSecret, STRIPE_API_URL: payments.url };
    console.log(`Local payment fake: ${payments.url} (no real money moves; set STRIPE_SECRET_KEY to use the real service).`);
  }

  try {
    ensureChromium("PDF recommendation sheets");
  } catch (err) {
    console.warn(`${err instanceof Error ? err.message : err}. Everything else works; "Download PDF" will not.`);
  }

  const env = nextEnv({
    DATABASE_URL: databaseUrl,
    NEXTAUTH_URL: publicUrl,
    AUTH_SECRET: keptSecret("AUTH_SECRET", "auth-secret"),
    NEXTAUTH_SECRET: keptSecret("AUTH_SECRET", "auth-secret"),
    // Share links have their own secret: rotating the auth secret signs people out but keeps links.
    SHARE_SECRET: keptSecret("SHARE_SECRET", "share-secret"),
    SMTP_URL: smtpUrl,
    ...(mailFakeUrl ? { MAIL_FAKE_URL: mailFakeUrl } : {}),
    ...paymentEnv,
  });
  if (process.env.PW_SKIP_BUILD !== "1") {
    console.log("Building the app (next build) …");
    const code = await buildNext(env);
    if (code !== 0) {
      console.error("The build failed.");
      return shutdown(1);
    }
  }
  app = startNext({ port, host, env });
  app.on("exit", (code) => {
    if (!stopping) {
      console.error(`The app stopped (exit ${code}).`);
      void shutdown(code ?? 1);
    }
  });
  console.log(`\nPulleywright is serving on ${publicUrl}`);
  if (process.env.PW_DEMO !== "0") {
    console.log(`Demo sign-ins (password for each: ${DEMO_PASSWORD}):`);
    for (const a of DEMO_ACCOUNTS) console.log(`  ${a.role.padEnd(10)} ${a.email}`);
  }
  console.log("Press Ctrl-C to stop.\n");
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  void shutdown(1);
});
