import { route } from "@/lib/server/request";
import { HttpError, isUniqueViolation } from "@/lib/server/errors";
import { getDb } from "@/db";
import { createVenue, listVenues } from "@/db/queries/venues";
import { venueSchema } from "@/lib/forms/accounts";

export const POST = route({ permission: "admin:venues", body: venueSchema }, async ({ body }) => {
  try {
    return { ok: true, id: await createVenue(getDb(), body) };
  } catch (err) {
    if (isUniqueViolation(err)) throw new HttpError(409, "exists", "A venue with that name exists already.", "name");
    throw err;
  }
});

export const GET = route({ permission: "admin:venues" }, async () => ({ venues: await listVenues(getDb()) }));
