import { z } from "zod";
import { route } from "@/lib/server/request";
import { HttpError, isUniqueViolation, notFound } from "@/lib/server/errors";
import { getDb } from "@/db";
import { venuePatchSchema } from "@/lib/forms/accounts";

export const PATCH = route({ permission: "admin:venues", body: venuePatchSchema }, async ({ body, params }) => {
  const id = z.string().uuid().safeParse(params.id);
  if (!id.success) throw notFound("That venue");
  const set = {
    ...(body.name !== undefined ? { name: body.name } : {}),
    ...(body.abbreviation !== undefined ? { abbreviation: body.abbreviation } : {}),
    ...(body.issn !== undefined ? { issn: body.issn } : {}),
    ...(body.isMethodsVenue !== undefined ? { is_methods_venue: body.isMethodsVenue } : {}),
  };
  if (!Object.keys(set).length) throw new HttpError(400, "invalid", "Nothing to change.");
  try {
    const r = await getDb().updateTable("venues").set(set).where("id", "=", id.data).executeTakeFirst();
    if (Number(r.numUpdatedRows) === 0) throw notFound("That venue");
  } catch (err) {
    if (isUniqueViolation(err)) throw new HttpError(409, "exists", "A venue with that name exists already.", "name");
    throw err;
  }
  return { ok: true };
});
