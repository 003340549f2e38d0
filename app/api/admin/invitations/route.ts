import { route } from "@/lib/server/request";
import { HttpError, isUniqueViolation } from "@/lib/server/errors";
import { getDb } from "@/db";
import { inviteSchema } from "@/lib/forms/accounts";
import { invitePerson } from "@/lib/accounts/invitations";
import type { Role } from "@/lib/vocabulary";

// The invitation and its e-mail job commit together; the mail job sends (and retries) on its own.
export const POST = route({ permission: "admin:users", body: inviteSchema }, async ({ actor, body }) => {
  try {
    const created = await getDb()
      .transaction()
      .execute((trx) =>
        invitePerson(trx, { email: body.email, role: body.role as Role, venueIds: body.venueIds }, actor),
      );
    return { ok: true, userId: created.userId };
  } catch (err) {
    if (isUniqueViolation(err))
      throw new HttpError(409, "exists", "Someone with that e-mail already has an account.", "email");
    throw err;
  }
});
