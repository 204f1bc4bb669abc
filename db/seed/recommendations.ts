import type { Db } from "../connect";
import type { DemoCombinations } from "./combinations";
import type { DemoUsers } from "./index";

// PLACEHOLDER: the demo recommendations are added by the work on that capability.
export async function seedRecommendations(db: Db, people: DemoUsers, combos: DemoCombinations) {
  void [db, people, combos];
}
