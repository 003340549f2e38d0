import { cache } from "react";
import { redirect, forbidden as nextForbidden } from "next/navigation";
import { headers } from "next/headers";
import { sessionUserId } from "./session-token";
import { getDb } from "@/db";
import { actorRow } from "@/db/queries/accounts";
import { can, type Actor, type Permission } from "@/lib/auth/permissions";

/**
 * The signed-in person as the database knows them now (role, venues, active), or null.
 * Cached per request so a page and its components share one lookup.
 */
export const getActor = cache(async (): Promise<Actor | null> => {
  const h = await headers();
  const id = await sessionUserId(h.get("cookie"), h.get("x-forwarded-proto"));
  if (!id) return null;
  // One round trip: the person and their venues together (this runs on every request).
  const user = await actorRow(getDb(), id);
  if (!user || user.deactivated_at) return null;
  return { id: user.id, email: user.email, name: user.name, role: user.role, venueIds: user.venue_ids ?? [] };
});

/** For pages: anonymous → sign-in page; signed in without the permission → 403 page. */
export async function requirePage(permission: Permission): Promise<Actor> {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  if (!can(actor, permission)) nextForbidden();
  return actor;
}
