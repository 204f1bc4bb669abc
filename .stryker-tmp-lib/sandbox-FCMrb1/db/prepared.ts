// @ts-nocheck
// Named prepared statements, built once per database client and kept by name. PostgreSQL then
// parses and plans each one once per connection instead of on every request. For the hot
// queries only: each name must always stand for the same SQL text.
import type { DbOrTx } from "./connect";

const byClient = new WeakMap<DbOrTx, Map<string, unknown>>();

/** The statement `name` on `db`, made by `build` the first time it is asked for. */
export function preparedFor<T>(db: DbOrTx, name: string, build: () => T): T {
  let statements = byClient.get(db);
  if (!statements) byClient.set(db, (statements = new Map()));
  if (!statements.has(name)) statements.set(name, build());
  return statements.get(name) as T;
}
