// @ts-nocheck
// A database of its own for each integration test file: a copy of the migrated template that
// scripts/test.ts prepared, dropped at the end.
import crypto from "node:crypto";
import pg from "pg";
import { connect, type Db } from "@/db/connect";

export type TestDb = { db: Db; url: string; pool: pg.Pool; drop: () => Promise<void> };

const base = () => {
  const b = process.env.PW_TEST_PG_BASE;
  if (!b) throw new Error("PW_TEST_PG_BASE is not set: run the tests through `npm test`.");
  return b;
};

export async function freshDatabase(): Promise<TestDb> {
  const name = `t_${crypto.randomBytes(6).toString("hex")}`;
  const admin = new pg.Client({ connectionString: `${base()}/postgres` });
  await admin.connect();
  // CREATE DATABASE … TEMPLATE needs the template to be idle; retry briefly if another file is copying it.
  for (let i = 0; ; i++) {
    try {
      await admin.query(`CREATE DATABASE ${name} TEMPLATE ${process.env.PW_TEST_TEMPLATE_DB ?? "app"}`);
      break;
    } catch (e) {
      if (i > 40) throw e;
      await new Promise((r) => setTimeout(r, 100 + Math.random() * 200));
    }
  }
  await admin.end();
  const url = `${base()}/${name}`;
  const { pool, db } = connect(url, 10);
  return {
    db,
    url,
    pool,
    drop: async () => {
      await pool.end();
      const a = new pg.Client({ connectionString: `${base()}/postgres` });
      await a.connect();
      await a.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
      await a.end();
    },
  };
}

/** Makes a user of the given role directly in the database and returns it as an actor. */
export async function makeUser(db: Db, role: "member" | "tuner" | "sales" | "instructor" | "admin", email?: string) {
  const { users } = await import("@/db/schema");
  const [u] = await db
    .insert(users)
    .values({ email: email ?? `${role}-${crypto.randomBytes(4).toString("hex")}@example.com`, name: `Test ${role}`, role })
    .returning();
  return { id: u.id, role: u.role, email: u.email, name: u.name };
}

/** One user of each role, in the shape the demo seeds take (db/seed/index.ts DemoUsers). */
export async function makeRoleUsers(db: Db) {
  return {
    member: await makeUser(db, "member"),
    tuner: await makeUser(db, "tuner"),
    sales: await makeUser(db, "sales"),
    instructor: await makeUser(db, "instructor"),
    admin: await makeUser(db, "admin"),
  };
}
