import type { JobDefinition } from "./job-types";
import type { Transaction } from "kysely";
import type { Database } from "@/db";
import type { PgBoss } from "pg-boss";

// Jobs of the citation-graph feature (reference resolution, practice matching, trails, summaries).
export const graphJobs: JobDefinition[] = [];

/**
 * Called by the mining job inside the transaction that stores an article's rows, so follow-up graph
 * work is enqueued atomically with them (pg-boss `send(..., { db })` on the same transaction).
 */
export async function onArticleMined(_boss: PgBoss, _trx: Transaction<Database>, _articleId: string): Promise<void> {}
