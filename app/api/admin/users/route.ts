import { route } from "@/lib/server/request";
import { getDb } from "@/db";
import { listUsers } from "@/db/queries/accounts";

export const GET = route({ permission: "admin:users" }, async () => ({ users: await listUsers(getDb()) }));
