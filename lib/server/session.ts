import { cache } from "react";
import { redirect, forbidden as nextForbidden } from "next/navigation";
import { auth } from "./auth";
import { getDb } from "@/db";
import { can, type Actor, type Permission } from "@/lib/auth/permissions";

/**
 * The signed-in person as the database knows them now (role, venues, active), or null.
 * Cached per request so a page and its components share one lookup.
 */
export const getActor = cache(async (): Promise<Actor | null> => {
  const session = await auth();
  const id = session?.user?.id;
  if (!id) return null;
  const db = getDb();
  const user = await db
    .selectFrom("User")
    .select(["id", "email", "name", "role", "deactivated_at"])
    .where("id", "=", id)
    .executeTakeFirst();
  if (!user || user.deactivated_at) return null;
  const venues = await db.selectFrom("editor_venues").select("venue_id").where("user_id", "=", id).execute();
  return { id: user.id, email: user.email, name: user.name, role: user.role, venueIds: venues.map((v) => v.venue_id) };
});

/** For pages: anonymous → sign-in page; signed in without the permission → 403 page. */
export async function requirePage(permission: Permission): Promise<Actor> {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  if (!can(actor, permission)) nextForbidden();
  return actor;
}
