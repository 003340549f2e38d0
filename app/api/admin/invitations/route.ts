import { route } from "@/lib/server/request";
import { HttpError, isUniqueViolation } from "@/lib/server/errors";
import { getDb } from "@/db";
import { createInvitation } from "@/db/queries/accounts";
import { inviteSchema } from "@/lib/forms/accounts";
import { mailTransport, MAIL_FROM, appUrl } from "@/lib/server/mail";
import { invitationEmail } from "@/lib/server/mail-templates";
import type { Role } from "@/lib/vocabulary";

export const POST = route({ permission: "admin:users", body: inviteSchema }, async ({ actor, body }) => {
  let created;
  try {
    created = await getDb()
      .transaction()
      .execute((trx) =>
        createInvitation(trx, {
          email: body.email,
          role: body.role as Role,
          venueIds: body.venueIds,
          invitedBy: actor.id,
        }),
      );
  } catch (err) {
    if (isUniqueViolation(err))
      throw new HttpError(409, "exists", "Someone with that e-mail already has an account.", "email");
    throw err;
  }
  await mailTransport().sendMail({
    from: MAIL_FROM,
    to: body.email,
    ...invitationEmail(`${appUrl()}/invite/${created.token}`, body.role, actor.name ?? actor.email),
  });
  return { ok: true, userId: created.userId };
});
