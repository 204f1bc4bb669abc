// @ts-nocheck
import "server-only";
import { connect, type Db } from "./connect";

// One pool per server process (kept on globalThis so dev hot reloads do not leak pools).
const g = globalThis as unknown as { __pwDb?: Db };

export function getDb(): Db {
  if (!g.__pwDb) {
    const url = process.env.DATABASE_URL;
    if (!url) throw new Error("DATABASE_URL is not set");
    g.__pwDb = connect(url).db;
  }
  return g.__pwDb;
}
