// @ts-nocheck
import "server-only";
import { cookies } from "next/headers";
import { redirect } from "next/navigation";
import { cache } from "react";
import { getDb } from "@/db/client";
import { UnauthorizedError, ForbiddenError } from "@/lib/errors";
import type { Actor } from "@/db/policy";
import { getUserById, sessionIsAlive, toActor } from "@/db/repo/users";
import type { Role, User } from "@/db/schema";
import { authSecret } from "./env";
import { tokenClaims, type SessionClaims } from "./session-token";
import { personUnits } from "@/lib/units/person";
import type { UnitSystem } from "@/calc";

// next-auth's own names for the session cookie, over https and over plain http.
const SESSION_COOKIES = ["__Secure-next-auth.session-token", "next-auth.session-token"];

/**
 * The user id in the session cookie. It decrypts the cookie next-auth wrote (checking its expiry)
 * and nothing more: getServerSession would also re-encrypt and re-send the cookie on every call,
 * which costs more than the rest of a typical API request.
 */
async function sessionClaims(): Promise<SessionClaims | null> {
  const jar = await cookies();
  for (const name of SESSION_COOKIES) {
    const token = jar.get(name)?.value;
    if (!token) continue;
    const claims = await tokenClaims(token, authSecret());
    if (claims) return claims;
  }
  return null;
}


/**
 * The signed-in user, read fresh from the database on every request so that a role change, a
 * disabled account or a "sign out everywhere" takes effect at once. Null when signed out.
 */
export const getCurrentUser = cache(async (): Promise<User | null> => {
  const claims = await sessionClaims();
  if (!claims) return null;
  const u = await getUserById(getDb(), claims.sub);
  return sessionIsAlive(u, claims.sv) ? u : null;
});

/** The signed-in person's units (imperial for nobody signed in). */
export async function currentUnits(): Promise<UnitSystem> {
  const u = await getCurrentUser();
  return u ? personUnits(u) : "imperial";
}

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
