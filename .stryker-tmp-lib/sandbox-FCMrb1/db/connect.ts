// @ts-nocheck
import { drizzle } from "drizzle-orm/node-postgres";
import pg from "pg";
import * as schema from "./schema";

/** Opens a pool and a Drizzle client on it. The app makes one (db/client.ts); scripts and tests make their own. */
export function connect(url: string, max = 10) {
  const pool = new pg.Pool({
    connectionString: url,
    max,
    // Fail fast when the server is down, so requests answer 503 instead of hanging.
    connectionTimeoutMillis: 3_000,
    idleTimeoutMillis: 30_000,
    query_timeout: 15_000,
  });
  // An idle client losing its server must not crash the process.
  pool.on("error", (err) => console.error("[db] idle client error:", err.message));
  // A checked-out client whose server goes away emits "error" too; unhandled, it would end the process.
  pool.on("connect", (client) => client.on("error", (err) => console.error("[db] client error:", err.message)));
  return { pool, db: drizzle(pool, { schema }) };
}

export type Db = ReturnType<typeof connect>["db"];
/** A Drizzle transaction or the client itself: repository functions accept either. */
export type DbOrTx = Db | Parameters<Parameters<Db["transaction"]>[0]>[0];
