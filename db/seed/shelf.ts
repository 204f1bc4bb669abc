import type { Db } from "../connect";

// PLACEHOLDER: the demo shelf is added by the work on the parts shelf.
export async function seedShelf(db: Db) {
  void db;
}
