import { sql } from "kysely";
import { createHash, randomBytes } from "node:crypto";
import { inTransaction, type DB, type Executor } from "@/db";
import type { Role } from "@/db/schema/accounts";

// Query modules take the handle as an argument so they run inside a caller's transaction too.

export const sha256 = (s: string) => createHash("sha256").update(s).digest("hex");

export async function listUsers(db: DB) {
  const users = await db
    .selectFrom("User")
    .select(["id", "email", "name", "role", "deactivated_at", "created_at", "password_hash"])
    .orderBy("created_at")
    .execute();
  const links = await db.selectFrom("editor_venues").select(["user_id", "venue_id"]).execute();
  const pending = await db.selectFrom("invitations").select(["user_id"]).where("accepted_at", "is", null).execute();
  return users.map(({ password_hash, ...u }) => ({
    ...u,
    active: !u.deactivated_at,
    hasPassword: !!password_hash,
    invitationPending: pending.some((p) => p.user_id === u.id),
    venueIds: links.filter((l) => l.user_id === u.id).map((l) => l.venue_id),
  }));
}

/** Creates the person (unique by e-mail: 23505 when they exist) and a 7-day invitation token. */
export async function createInvitation(
  db: Executor,
  input: { email: string; role: Role; venueIds: string[]; invitedBy: string | null },
) {
  const token = randomBytes(24).toString("base64url");
  return inTransaction(db, async (trx) => {
    const user = await trx
      .insertInto("User")
      .values({
        email: input.email,
        role: input.role,
        name: null,
        emailVerified: null,
        image: null,
        password_hash: null,
        deactivated_at: null,
      })
      .returning(["id"])
      .executeTakeFirstOrThrow();
    if (input.venueIds.length) {
      await trx
        .insertInto("editor_venues")
        .values(input.venueIds.map((v) => ({ user_id: user.id, venue_id: v })))
        .execute();
    }
    await trx
      .insertInto("invitations")
      .values({
        email: input.email,
        role: input.role,
        token_hash: sha256(token),
        invited_by: input.invitedBy,
        user_id: user.id,
        expires_at: sql<Date>`now() + interval '7 days'` as never,
        accepted_at: null,
      })
      .execute();
    await trx
      .insertInto("audit_log")
      .values({
        actor_id: input.invitedBy,
        action: "invite",
        target: user.id,
        detail: JSON.stringify({ email: input.email, role: input.role }),
      })
      .execute();
    return { userId: user.id, token };
  });
}

/**
 * A new token and seven more days for a person's unaccepted invitation (the old link stops working).
 * Null when the person has no invitation waiting; `accepted` when they already chose a password.
 */
export async function renewInvitation(
  trx: Executor,
  input: { userId: string; renewedBy: string | null },
): Promise<{ token: string; email: string; role: Role } | "accepted" | "deactivated" | null> {
  const user = await trx
    .selectFrom("User")
    .select(["email", "role", "deactivated_at"])
    .where("id", "=", input.userId)
    .executeTakeFirst();
  if (!user) return null;
  if (user.deactivated_at) return "deactivated";
  const inv = await trx
    .selectFrom("invitations")
    .select(["id", "accepted_at"])
    .where("user_id", "=", input.userId)
    .orderBy("created_at", "desc")
    .forUpdate()
    .executeTakeFirst();
  if (!inv) return null;
  if (inv.accepted_at) return "accepted";
  const token = randomBytes(24).toString("base64url");
  await trx
    .updateTable("invitations")
    .set({ token_hash: sha256(token), expires_at: sql<Date>`now() + interval '7 days'` as never })
    .where("id", "=", inv.id)
    .execute();
  await trx
    .insertInto("audit_log")
    .values({
      actor_id: input.renewedBy,
      action: "resend_invitation",
      target: input.userId,
      detail: JSON.stringify({ email: user.email }),
    })
    .execute();
  return { token, email: user.email, role: user.role };
}

export async function findInvitation(db: DB, token: string) {
  return db
    .selectFrom("invitations")
    .select(["id", "email", "role", "user_id", "expires_at", "accepted_at"])
    .where("token_hash", "=", sha256(token))
    .executeTakeFirst();
}

export async function acceptInvitation(
  db: DB,
  input: { token: string; name: string; passwordHash: string },
): Promise<"ok" | "expired" | "used" | "invalid"> {
  return db.transaction().execute(async (trx) => {
    const inv = await trx
      .selectFrom("invitations")
      .select(["id", "user_id", "expires_at", "accepted_at"])
      .where("token_hash", "=", sha256(input.token))
      .forUpdate()
      .executeTakeFirst();
    if (!inv) return "invalid";
    if (inv.accepted_at) return "used";
    if (new Date(inv.expires_at) < new Date()) return "expired";
    await trx.updateTable("invitations").set({ accepted_at: new Date() }).where("id", "=", inv.id).execute();
    await trx
      .updateTable("User")
      .set({ name: input.name, password_hash: input.passwordHash, emailVerified: new Date() })
      .where("id", "=", inv.user_id)
      .execute();
    return "ok";
  });
}

export async function updateUser(
  db: DB,
  actorId: string,
  id: string,
  patch: { role?: Role; active?: boolean; venueIds?: string[] },
) {
  return db.transaction().execute(async (trx) => {
    const set: { role?: Role; deactivated_at?: Date | null } = {};
    if (patch.role) set.role = patch.role;
    if (patch.active !== undefined) set.deactivated_at = patch.active ? null : new Date();
    if (Object.keys(set).length) {
      const r = await trx.updateTable("User").set(set).where("id", "=", id).executeTakeFirst();
      if (Number(r.numUpdatedRows) === 0) return false;
    } else if (!(await trx.selectFrom("User").select("id").where("id", "=", id).executeTakeFirst())) return false;
    if (patch.venueIds) {
      await trx.deleteFrom("editor_venues").where("user_id", "=", id).execute();
      if (patch.venueIds.length)
        await trx
          .insertInto("editor_venues")
          .values(patch.venueIds.map((v) => ({ user_id: id, venue_id: v })))
          .execute();
    }
    await trx
      .insertInto("audit_log")
      .values({ actor_id: actorId, action: "update_user", target: id, detail: JSON.stringify(patch) })
      .execute();
    return true;
  });
}

/** How many active admins there would be; an admin may not remove the last one. */
export async function activeAdminCount(db: DB) {
  const r = await db
    .selectFrom("User")
    .select((eb) => eb.fn.countAll<number>().as("n"))
    .where("role", "=", "admin")
    .where("deactivated_at", "is", null)
    .executeTakeFirstOrThrow();
  return Number(r.n);
}

export async function listVenues(db: DB) {
  return db
    .selectFrom("venues")
    .select(["id", "name", "abbreviation", "issn", "is_methods_venue", "is_demo"])
    .orderBy("name")
    .execute();
}
