import { idParams, route } from "@/lib/server/request";
import { HttpError, notFound } from "@/lib/server/errors";
import { getDb } from "@/db";
import { resendInvitation } from "@/lib/accounts/invitations";

// Resend a person's invitation: a fresh 7-day link (the old one stops working), mailed by the mail job.
export const POST = route(
  { permission: "admin:users", params: idParams, notFound: "That person" },
  async ({ actor, params }) => {
    const r = await getDb()
      .transaction()
      .execute((trx) => resendInvitation(trx, params.id, actor));
    if (r === "not_found") throw notFound("An open invitation for that person");
    if (r === "accepted")
      throw new HttpError(409, "accepted", "This person has already accepted the invitation and can sign in.");
    if (r === "deactivated") throw new HttpError(409, "deactivated", "Reactivate this person before resending.");
    return { ok: true };
  },
);
