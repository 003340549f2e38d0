import { route } from "@/lib/server/request";
import { HttpError, isUniqueViolation } from "@/lib/server/errors";
import { getDb } from "@/db";
import { listVenues } from "@/db/queries/accounts";
import { venueSchema } from "@/lib/forms/accounts";

export const POST = route({ permission: "admin:venues", body: venueSchema }, async ({ body }) => {
  try {
    const v = await getDb()
      .insertInto("venues")
      .values({
        name: body.name,
        abbreviation: body.abbreviation,
        issn: body.issn,
        is_methods_venue: body.isMethodsVenue,
      })
      .returning(["id"])
      .executeTakeFirstOrThrow();
    return { ok: true, id: v.id };
  } catch (err) {
    if (isUniqueViolation(err)) throw new HttpError(409, "exists", "A venue with that name exists already.", "name");
    throw err;
  }
});

export const GET = route({ permission: "admin:venues" }, async () => ({ venues: await listVenues(getDb()) }));
