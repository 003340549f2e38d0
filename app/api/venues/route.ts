import { route } from "@/lib/server/request";
import { getDb } from "@/db";
import { listVenues } from "@/db/queries/venues";

// Any signed-in person may list venues (filters, metadata forms).
export const GET = route({ permission: "corpus:read" }, async () => ({ venues: await listVenues(getDb()) }));
