import { idParams, route } from "@/lib/server/request";
import { HttpError, isUniqueViolation, notFound } from "@/lib/server/errors";
import { getDb } from "@/db";
import { updateVenue } from "@/db/queries/venues";
import { venuePatchSchema } from "@/lib/forms/accounts";

export const PATCH = route(
  { permission: "admin:venues", params: idParams, notFound: "That venue", body: venuePatchSchema },
  async ({ body, params }) => {
    if (!Object.values(body).some((v) => v !== undefined)) throw new HttpError(400, "invalid", "Nothing to change.");
    try {
      if (!(await updateVenue(getDb(), params.id, body))) throw notFound("That venue");
    } catch (err) {
      if (isUniqueViolation(err)) throw new HttpError(409, "exists", "A venue with that name exists already.", "name");
      throw err;
    }
    return { ok: true };
  },
);
