/**
 * Graph jobs are fetched in batches, so each job of a batch must succeed or fail on its own, and the
 * re-checks an arriving article asks for must not pile up one per newer article.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { sql } from "kysely";
import type { Job } from "pg-boss";
import { createTestDatabase } from "@/tests/helpers/db";
import { createGraphJobs, GRAPH_QUEUES, recheckOnce, trailsOnce } from "@/workers/graph-jobs";
import { senderFor } from "@/lib/corpus/queue";

let t: Awaited<ReturnType<typeof createTestDatabase>>;
beforeAll(async () => {
  t = await createTestDatabase();
});
afterAll(async () => t?.drop());

const job = (id: string, data: object) => ({ id, name: GRAPH_QUEUES.resolve, data }) as unknown as Job<object>;

describe("graph jobs", () => {
  it("report each job of a batch on its own: bad data fails only its job", async () => {
    const resolve = createGraphJobs({ db: () => t.db, send: async () => {} }).find(
      (j) => j.name === GRAPH_QUEUES.resolve,
    )!;
    expect(resolve.batchSize).toBeGreaterThan(1);
    // An article that no longer exists is a no-op (deleted after its job was queued).
    const out = await resolve.handler([job("a", { articleId: "not-a-uuid" }), job("b", { articleId: randomUUID() })]);
    expect(out.map((r) => [r.id, r.status])).toEqual([
      ["a", "failed"],
      ["b", "completed"],
    ]);
  });

  it("queue one re-check per older article per slot, and one more for the next slot, however many ask", async () => {
    const boss = await senderFor(t.db);
    await boss.createQueue(GRAPH_QUEUES.resolve).catch(() => {});
    const older = randomUUID();
    for (let i = 0; i < 6; i++)
      await boss.send(GRAPH_QUEUES.resolve, { articleId: older, recheck: true }, recheckOnce(older));
    const n = await sql<{
      n: number;
    }>`select count(*)::int as n from pgboss.job where name = ${GRAPH_QUEUES.resolve} and data->>'articleId' = ${older}`.execute(
      t.db,
    );
    // This slot's re-check plus, for the requests that found it taken, one in the next slot (three
    // if the six sends happen to straddle a 10 s slot boundary); never one per request.
    expect(n.rows[0].n).toBeGreaterThanOrEqual(2);
    expect(n.rows[0].n).toBeLessThanOrEqual(3);
    await boss.stop({ graceful: false, close: false });
  });

  it("never drop a trail rebuild asked for while one is queued: the late request waits for the next window", async () => {
    // Without the next-slot rule, an article mined just after its practice's rebuild was queued
    // would keep statements with no trail until some later article asked again.
    const boss = await senderFor(t.db);
    await boss.createQueue(GRAPH_QUEUES.trails).catch(() => {});
    const practiceId = randomUUID();
    const first = await boss.send(GRAPH_QUEUES.trails, { practiceId }, trailsOnce(practiceId, 5));
    const late = await boss.send(GRAPH_QUEUES.trails, { practiceId }, trailsOnce(practiceId, 5));
    expect(first).toBeTruthy();
    expect(late).toBeTruthy();
    const rows = await sql<{
      start_after: Date;
      created_on: Date;
    }>`select start_after, created_on from pgboss.job where name = ${GRAPH_QUEUES.trails} and data->>'practiceId' = ${practiceId} order by start_after`.execute(
      t.db,
    );
    expect(rows.rows).toHaveLength(2);
    expect(rows.rows[1].start_after.getTime()).toBeGreaterThan(rows.rows[0].start_after.getTime());
    await boss.stop({ graceful: false, close: false });
  });
});
