import { publicRoute } from "@/lib/server/request";
import { HttpError } from "@/lib/server/errors";
import { getDb } from "@/db";
import { acceptInvitation } from "@/db/queries/accounts";
import { acceptInvitationSchema } from "@/lib/forms/accounts";
import { hashPassword } from "@/lib/server/passwords";

export const POST = publicRoute({ body: acceptInvitationSchema, maxBytes: 4096 }, async ({ body }) => {
  const passwordHash = await hashPassword(body.password);
  const result = await getDb()
    .transaction()
    .execute((trx) => acceptInvitation(trx, { token: body.token, name: body.name, passwordHash }));
  if (result === "expired")
    throw new HttpError(410, "expired", "This invitation has expired. Ask an admin for a new one.");
  if (result === "used") throw new HttpError(409, "used", "This invitation was already used. Sign in instead.");
  if (result === "invalid") throw new HttpError(404, "not_found", "This invitation link is not valid.");
  return { ok: true };
});
