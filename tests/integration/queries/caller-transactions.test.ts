// The functions whose writes must commit together run inside the caller's transaction: a caller
// that rolls back leaves none of their rows, one that commits leaves all of them, and called on the
// pool handle they refuse to run (half-done writes would otherwise be possible).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestDatabase } from "../../helpers/db";
import { acceptInvitation, createInvitation, updateUser } from "@/db/queries/accounts";
import { listVenues, createVenue } from "@/db/queries/venues";

let t: Awaited<ReturnType<typeof createTestDatabase>>;
beforeAll(async () => {
  t = await createTestDatabase();
});
afterAll(async () => t?.drop());

const rowsFor = async (email: string) => ({
  users: (await t.db.selectFrom("User").select("id").where("email", "=", email).execute()).length,
  invitations: (await t.db.selectFrom("invitations").select("id").where("email", "=", email).execute()).length,
});

describe("createInvitation, acceptInvitation and updateUser run in the caller's transaction", () => {
  it("a rolled-back caller leaves no person, invitation or audit row", async () => {
    const email = "rolled.back@example.invalid";
    const audits = async () => (await t.db.selectFrom("audit_log").select("id").execute()).length;
    const before = await audits();
    await expect(
      t.db.transaction().execute(async (trx) => {
        await createInvitation(trx, { email, role: "reader", venueIds: [], invitedBy: null });
        throw new Error("the caller's next step failed");
      }),
    ).rejects.toThrow(/next step failed/);
    expect(await rowsFor(email)).toEqual({ users: 0, invitations: 0 });
    expect(await audits()).toBe(before);
  });

  it("a committing caller gets every row, and its own write in the same transaction", async () => {
    const email = "committed@example.invalid";
    const venueName = "Invented Journal of Caller Transactions";
    const { token, userId } = await t.db.transaction().execute(async (trx) => {
      const venueId = await createVenue(trx, {
        name: venueName,
        abbreviation: null,
        issn: null,
        isMethodsVenue: false,
      });
      return createInvitation(trx, { email, role: "editor", venueIds: [venueId], invitedBy: null });
    });
    expect(await rowsFor(email)).toEqual({ users: 1, invitations: 1 });
    expect((await listVenues(t.db)).map((v) => v.name)).toContain(venueName);

    const accepted = await t.db
      .transaction()
      .execute((trx) => acceptInvitation(trx, { token, name: "Invented Person", passwordHash: "x" }));
    expect(accepted).toBe("ok");
    await t.db.transaction().execute((trx) => updateUser(trx, userId, userId, { role: "curator", venueIds: [] }));
    const u = await t.db.selectFrom("User").select(["role", "name"]).where("id", "=", userId).executeTakeFirstOrThrow();
    expect(u).toEqual({ role: "curator", name: "Invented Person" });
    expect(await listVenues(t.db, { ids: [] })).toEqual([]);
  });

  it("refuses to run outside a transaction", async () => {
    await expect(
      createInvitation(t.db, { email: "no.trx@example.invalid", role: "reader", venueIds: [], invitedBy: null }),
    ).rejects.toThrow(/must run inside a transaction/);
    expect(await rowsFor("no.trx@example.invalid")).toEqual({ users: 0, invitations: 0 });
  });
});
