// @ts-nocheck
// The invented demo scenario of the design notes: a fictional independent engine shop, one
// account per role, generic engines and blowers, a parts shelf, combinations with history, a
// datalog, a recommendation and a lesson. Idempotent: it only adds what is missing, so a second
// start keeps everything people saved. A real deployment leaves it out with PW_DEMO=0.
import { eq } from "drizzle-orm";
import type { Db } from "../connect";
import { hashPassword } from "../repo/users";
import { shopSettings, users, type Role } from "../schema";
import { seedCombinations } from "./combinations";
import { seedDatalogs } from "./datalogs";
import { seedLessons } from "./lessons";
import { seedOrders } from "./orders";
import { seedRecommendations } from "./recommendations";
import { seedShelf } from "./shelf";

export const DEMO_PASSWORD = "pulleywright-demo";

export const DEMO_ACCOUNTS: { email: string; name: string; role: Role }[] = [
  { email: "member@example.com", name: "Morgan Member", role: "member" },
  { email: "tuner@example.com", name: "Toni Tuner", role: "tuner" },
  { email: "sales@example.com", name: "Sam Sales", role: "sales" },
  { email: "instructor@example.com", name: "Ira Instructor", role: "instructor" },
  { email: "admin@example.com", name: "Ada Admin", role: "admin" },
];

export type DemoUsers = Record<Role, { id: string; role: Role; email: string; name: string }>;

async function seedAccounts(db: Db): Promise<DemoUsers> {
  const hash = await hashPassword(DEMO_PASSWORD);
  const out = {} as DemoUsers;
  for (const a of DEMO_ACCOUNTS) {
    await db.insert(users).values({ ...a, passwordHash: hash, emailVerifiedAt: new Date() }).onConflictDoNothing({ target: users.email });
    const [u] = await db.select().from(users).where(eq(users.email, a.email));
    // The demo roles are part of the scenario; keep them as listed even if changed by hand.
    out[a.role] = { id: u.id, role: a.role, email: u.email, name: u.name };
  }
  return out;
}

async function seedShop(db: Db) {
  await db
    .insert(shopSettings)
    .values({
      id: 1,
      name: "Harbour Lane Engine Works (demo)",
      address: "12 Harbour Lane, Example Town",
      phone: "+1 555 0100",
      email: "counter@example.com",
      website: "",
    })
    .onConflictDoNothing();
}

export async function seedDemo(db: Db) {
  const people = await seedAccounts(db);
  await seedShop(db);
  await seedShelf(db);
  const combos = await seedCombinations(db, people);
  await seedDatalogs(db, people, combos);
  await seedRecommendations(db, people, combos);
  await seedOrders(db, people, combos);
  await seedLessons(db, people, combos);
}
