import type { Db } from "../connect";
import type { DemoCombinations } from "./combinations";
import type { DemoUsers } from "./index";

// PLACEHOLDER: the demo datalogs are added by the work on that capability.
export async function seedDatalogs(db: Db, people: DemoUsers, combos: DemoCombinations) {
  void [db, people, combos];
}
