import type { DB } from "@/db";

export const venueOptions = (db: DB) => db.selectFrom("venues").select(["id", "name"]).orderBy("name").execute();
