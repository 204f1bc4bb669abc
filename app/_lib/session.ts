import "server-only";
import { getServerSession } from "next-auth";
import { redirect } from "next/navigation";
import { cache } from "react";
import { getDb } from "@/db/client";
import { UnauthorizedError, ForbiddenError } from "@/db/errors";
import type { Actor } from "@/db/policy";
import { getUserById, toActor } from "@/db/repo/users";
import type { Role, User } from "@/db/schema";
import { authOptions } from "./auth-options";

/**
 * The signed-in user, read fresh from the database on every request so that a role change or a
 * disabled account takes effect at once. Null when signed out.
 */
export const getCurrentUser = cache(async (): Promise<User | null> => {
  const session = await getServerSession(authOptions());
  const id = (session?.user as { id?: string } | undefined)?.id;
  if (!id) return null;
  const u = await getUserById(getDb(), id);
  return u && !u.disabled ? u : null;
});

/** The one check every server action and route handler starts with: signed in, and one of `roles` if given. */
export async function requireActor(roles?: readonly Role[]): Promise<Actor> {
  const u = await getCurrentUser();
  if (!u) throw new UnauthorizedError();
  if (roles && !roles.includes(u.role)) throw new ForbiddenError();
  return toActor(u);
}

/** For pages: signed out goes to the sign-in page, a wrong role to the home of the app. */
export async function requirePageUser(roles?: readonly Role[]): Promise<User> {
  const u = await getCurrentUser();
  if (!u) redirect("/sign-in");
  if (roles && !roles.includes(u.role)) redirect("/combinations?denied=1");
  return u;
}
