/**
 * Graph jobs are fetched in batches, so each job of a batch must succeed or fail on its own, and the
 * re-checks an arriving article asks for must not pile up one per newer article. Every write that
 * causes graph work sends its job in the same transaction. Jobs are read back through pg-boss's API.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import type { Job } from "pg-boss";
import { createTestDatabase } from "@/tests/helpers/db";
import { jobReader } from "@/tests/helpers/jobs";
import { createGraphHandlers } from "@/workers/graph-jobs";
import { buildTrails, matchPractice, resolveArticle, trailsOnce } from "@/lib/jobs/graph";
import { createPractice } from "@/lib/graph/create-practice";
import { recordSourceCheck } from "@/lib/graph/source-checks";
import { rebuildAllSoon } from "@/lib/graph/rebuild";
import { seedPractices } from "@/lib/graph/seed";

let t: Awaited<ReturnType<typeof createTestDatabase>>;
beforeAll(async () => {
  t = await createTestDatabase();
});
afterAll(async () => t?.drop());

const job = (id: string, data: object) => ({ id, name: resolveArticle.name, data }) as unknown as Job<object>;
class Rollback extends Error {}

describe("graph jobs", () => {
  it("report each job of a batch on its own: bad data fails only its job", async () => {
    const resolve = createGraphHandlers({ db: t.db, send: async () => {}, log: { error: () => {} } }).find(
      (r) => r.job.name === resolveArticle.name,
    )!;
    expect(resolve.job.batchSize).toBeGreaterThan(1);
    // An article that no longer exists is a no-op (deleted after its job was queued).
    const out = await resolve.handler([job("a", { articleId: "not-a-uuid" }), job("b", { articleId: randomUUID() })]);
    expect(out.map((r) => [r.id, r.status])).toEqual([
      ["a", "failed"],
      ["b", "completed"],
    ]);
  });

  it("queue one re-check per older article per slot, and one more for the next slot, however many ask", async () => {
    const older = randomUUID();
    for (let i = 0; i < 6; i++) await resolveArticle.send(t.db, { articleId: older, recheck: true });
    const jobs = await jobReader(t.db).findJobs(resolveArticle.name, { data: { articleId: older } });
    // This slot's re-check plus, for the requests that found it taken, one in the next slot (three
    // if the six sends happen to straddle a 10 s slot boundary); never one per request.
    expect(jobs.length).toBeGreaterThanOrEqual(2);
    expect(jobs.length).toBeLessThanOrEqual(3);
  });

  it("never drop a trail rebuild asked for while one is queued: the late request waits for the next window", async () => {
    // Without the next-slot rule, an article mined just after its practice's rebuild was queued
    // would keep statements with no trail until some later article asked again.
    const practiceId = randomUUID();
    const first = await buildTrails.send(t.db, { practiceId }, trailsOnce(practiceId, 5));
    const late = await buildTrails.send(t.db, { practiceId }, trailsOnce(practiceId, 5));
    expect(first).toBeTruthy();
    expect(late).toBeTruthy();
    const reader = jobReader(t.db);
    const [a, b] = await Promise.all([
      reader.getJobById(buildTrails.name, first!),
      reader.getJobById(buildTrails.name, late!),
    ]);
    expect(b!.startAfter.getTime()).toBeGreaterThan(a!.startAfter.getTime());
  });

  it("refuse job data that does not match the job's schema, before anything is queued", async () => {
    await expect(buildTrails.send(t.db, { practiceId: "seven" })).rejects.toThrow(/practiceId/);
  });
});

describe("writes that cause graph work send it in their own transaction", () => {
  const form = { statistic: "cronbach_alpha", comparator: ">=", value: 0.83, framing: "fixed" } as const;
  const matchJobsFor = (practiceId: string) => jobReader(t.db).findJobs(matchPractice.name, { data: { practiceId } });

  it("a practice created in a transaction that rolls back leaves no practice and no job", async () => {
    let id = "";
    await expect(
      t.db.transaction().execute(async (trx) => {
        id = (await createPractice(trx, { ...form, value: 0.84 }, null)).id;
        // Inside the transaction the job is there; outside it is not (yet): it is part of the transaction.
        expect(await jobReader(trx).findJobs(matchPractice.name, { data: { practiceId: id } })).toHaveLength(1);
        expect(await matchJobsFor(id)).toEqual([]);
        throw new Rollback();
      }),
    ).rejects.toBeInstanceOf(Rollback);
    expect(id).not.toBe("");
    expect(await t.db.selectFrom("practices").select("id").where("id", "=", id).executeTakeFirst()).toBeUndefined();
    expect(await matchJobsFor(id)).toEqual([]);
  });

  it("a practice created in a transaction that commits leaves exactly one match job for it", async () => {
    const row = await t.db.transaction().execute((trx) => createPractice(trx, form, null));
    const jobs = await matchJobsFor(row.id);
    expect(jobs).toHaveLength(1);
    expect(jobs[0].data).toEqual({ practiceId: row.id });
    expect(jobs[0].state).toBe("created");
  });

  it("a source check and its trail rebuild commit or roll back together", async () => {
    await seedPractices(t.db);
    const practice = await t.db.selectFrom("practices").select("id").executeTakeFirstOrThrow();
    const work = await t.db
      .insertInto("works")
      .values({
        doi: null,
        title: "An invented methods handbook",
        normalised_title: "an invented methods handbook",
        first_author: "Ostrander",
        year: "1991",
        article_id: null,
        merged_into: null,
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    const check = { workId: work.id, practiceId: practice.id, verdict: "silent" as const, checkedBy: null };
    const send = (trx: Parameters<typeof recordSourceCheck>[0]) =>
      buildTrails.send(trx, { practiceId: practice.id }, trailsOnce(practice.id, 5));
    await expect(
      t.db.transaction().execute(async (trx) => {
        await recordSourceCheck(trx, check);
        await send(trx);
        throw new Rollback();
      }),
    ).rejects.toBeInstanceOf(Rollback);
    const trailJobs = () => jobReader(t.db).findJobs(buildTrails.name, { data: { practiceId: practice.id } });
    expect(await trailJobs()).toEqual([]);
    await t.db.transaction().execute(async (trx) => {
      await recordSourceCheck(trx, check);
      await rebuildAllSoon(trx);
    });
    expect(await trailJobs()).toHaveLength(1);
  });
});
