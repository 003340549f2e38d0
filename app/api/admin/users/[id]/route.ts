import { idParams, route } from "@/lib/server/request";
import { HttpError, notFound } from "@/lib/server/errors";
import { getDb } from "@/db";
import { activeAdminCount, updateUser, userStanding } from "@/db/queries/accounts";
import { userPatchSchema } from "@/lib/forms/accounts";
import type { Role } from "@/lib/vocabulary";

export const PATCH = route(
  { permission: "admin:users", params: idParams, notFound: "That person", body: userPatchSchema },
  async ({ actor, body, params }) => {
    const db = getDb();
    const target = await userStanding(db, params.id);
    if (!target) throw notFound("That person");
    const losesAdmin =
      target.role === "admin" &&
      !target.deactivated_at &&
      ((body.role && body.role !== "admin") || body.active === false);
    if (losesAdmin && (await activeAdminCount(db)) <= 1) {
      throw new HttpError(
        409,
        "last_admin",
        "Echoline needs at least one active admin. Make someone else admin first.",
        body.role ? "role" : "active",
      );
    }
    await db.transaction().execute((trx) =>
      updateUser(trx, actor.id, params.id, {
        role: body.role as Role | undefined,
        active: body.active,
        venueIds: body.venueIds,
      }),
    );
    return { ok: true };
  },
);
