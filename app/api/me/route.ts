// Who the caller is right now (read fresh from the database: a role change shows at once).
import { route } from "@/app/_lib/http";
import { getCurrentUser, requireActor } from "@/app/_lib/session";

export const dynamic = "force-dynamic";

export const GET = route(async () => {
  const actor = await requireActor();
  const u = await getCurrentUser();
  return { id: actor.id, email: actor.email, name: actor.name, role: actor.role, unitSystem: u?.unitSystem ?? "imperial" };
});
