import { sql } from "kysely";
import { createHash, randomBytes } from "node:crypto";
import { requireTransaction, type DB } from "@/db";
import type { Role } from "@/lib/vocabulary";

// Query modules take the handle as an argument so they run inside a caller's transaction too; the
// functions whose writes must commit together require one (the caller opens it).

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
  trx: DB,
  input: { email: string; role: Role; venueIds: string[]; invitedBy: string | null },
) {
  requireTransaction(trx, "createInvitation");
  const token = randomBytes(24).toString("base64url");
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
}

/**
 * A new token and seven more days for a person's unaccepted invitation (the old link stops working).
 * Null when the person has no invitation waiting; `accepted` when they already chose a password.
 */
export async function renewInvitation(
  trx: DB,
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
  trx: DB,
  input: { token: string; name: string; passwordHash: string },
): Promise<"ok" | "expired" | "used" | "invalid"> {
  requireTransaction(trx, "acceptInvitation");
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
}

export async function updateUser(
  trx: DB,
  actorId: string,
  id: string,
  patch: { role?: Role; active?: boolean; venueIds?: string[] },
) {
  requireTransaction(trx, "updateUser");
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
}

/** The person's role and whether they are deactivated, read for the last-admin rule. */
export async function userStanding(db: DB, id: string) {
  return db.selectFrom("User").select(["role", "deactivated_at"]).where("id", "=", id).executeTakeFirst();
}

/** What a sign-in link's token is now: still usable, expired, already used, or unknown. */
export async function signInLinkState(db: DB, tokenHash: string, email: string) {
  const row = await db
    .selectFrom("VerificationToken")
    .select(["expires"])
    .where("token", "=", tokenHash)
    .where("identifier", "=", email)
    .executeTakeFirst();
  if (row) return new Date(row.expires) > new Date() ? "ok" : "expired";
  const used = await db
    .selectFrom("used_sign_in_links")
    .select("token_hash")
    .where("token_hash", "=", tokenHash)
    .executeTakeFirst();
  return used ? "used" : "invalid";
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

/** The signed-in person as the database knows them now, with their venues, in one round trip. */
export async function actorRow(db: DB, id: string) {
  return db
    .selectFrom("User")
    .select((eb) => [
      "User.id",
      "User.email",
      "User.name",
      "User.role",
      "User.deactivated_at",
      eb
        .selectFrom("editor_venues")
        .select(sql<string[]>`coalesce(array_agg(venue_id::text), '{}')`.as("ids"))
        .whereRef("editor_venues.user_id", "=", "User.id")
        .as("venue_ids"),
    ])
    .where("User.id", "=", id)
    .executeTakeFirst();
}

/** A person by e-mail, compared case-insensitively (sign-in). */
export async function userByEmail(db: DB, email: string) {
  return db
    .selectFrom("User")
    .select(["id", "email", "name", "password_hash", "deactivated_at"])
    .where(sql`lower(email)`, "=", email.toLowerCase())
    .executeTakeFirst();
}

/** Remembers a consumed sign-in link so its page can say "already used" rather than "not valid". */
export async function recordUsedSignInLink(db: DB, tokenHash: string, identifier: string) {
  await db
    .insertInto("used_sign_in_links")
    .values({ token_hash: tokenHash, identifier })
    .onConflict((oc) => oc.doNothing())
    .execute();
}

/** Failed password attempts in the last `windowMinutes`, by e-mail and by client address. */
export async function failedSignIns(db: DB, email: string, ip: string, windowMinutes: number) {
  const r = await db
    .selectFrom("sign_in_attempts")
    .select([
      sql<number>`count(*) filter (where key = ${email})`.as("by_email"),
      sql<number>`count(*) filter (where ip = ${ip})`.as("by_ip"),
    ])
    .where("succeeded", "=", false)
    .where(sql<boolean>`at > now() - make_interval(mins => ${windowMinutes})`)
    .where((eb) => eb.or([eb("key", "=", email), eb("ip", "=", ip)]))
    .executeTakeFirstOrThrow();
  return { byEmail: Number(r.by_email), byIp: Number(r.by_ip) };
}

export async function recordSignInAttempt(db: DB, email: string, ip: string, succeeded: boolean) {
  await db.insertInto("sign_in_attempts").values({ key: email, ip, succeeded }).execute();
}
