import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { useTestDatabase } from "./helpers/db";
import { addMember, makeClub, makeClubWithRoles, makeUser } from "./helpers/factories";
import { args, formRequest, getRequest, run } from "./helpers/requests";
import { invitations, memberships } from "~/db/schema";
import { changeMemberRole } from "~/clubs/members.server";
import { RuleError } from "~/clubs/rule-error.server";
import { hashLinkToken } from "~/clubs/tokens.server";
import * as members from "~/routes/club-members";

const { db } = useTestDatabase();

type Errors = Record<string, string[]>;
const errorsOf = (r: { data: unknown }) => (r.data as { errors: Errors }).errors;

const post = (clubId: string, fields: Record<string, string>, cookie?: string) =>
  run(() => members.action(args(formRequest(`/clubs/${clubId}/members`, fields, cookie), { clubId })));
const view = (clubId: string, cookie: string, search = "") =>
  run(() => members.loader(args(getRequest(`/clubs/${clubId}/members${search}`, cookie), { clubId })));

type Loaded = {
  members: { id: string; name: string; email: string | null; role: string }[];
  invitations: unknown[];
  queryErrors: Errors;
};
const loaded = (r: { data: unknown }) => r.data as Loaded;

async function membershipsOf(clubId: string) {
  return (await db())
    .select({ id: memberships.id, userId: memberships.userId, role: memberships.role })
    .from(memberships)
    .where(eq(memberships.clubId, clubId))
    .orderBy(memberships.id);
}

async function membershipId(clubId: string, userId: string) {
  const [row] = await (
    await db()
  )
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.clubId, clubId), eq(memberships.userId, userId)));
  return row.id;
}

describe("members table", () => {
  it("sorts by each column both ways and filters by role and text through query parameters", async () => {
    const director = await makeUser({ name: "Carla Director", email: "carla@members.example" });
    const club = await makeClub(director.id);
    const amy = await makeUser({ name: "amy Marshal", email: "zed@members.example" });
    const bob = await makeUser({ name: "Bob Driver", email: "abe@members.example" });
    await addMember(club.id, amy.id, "marshal");
    await addMember(club.id, bob.id, "driver");

    const names = async (search: string) =>
      loaded(await view(club.id, director.cookie, search)).members.map((m) => m.name);
    expect(await names("")).toEqual(["amy Marshal", "Bob Driver", "Carla Director"]); // name, case-insensitive
    expect(await names("?dir=desc")).toEqual(["Carla Director", "Bob Driver", "amy Marshal"]);
    expect(await names("?sort=email")).toEqual(["Bob Driver", "Carla Director", "amy Marshal"]);
    expect(await names("?sort=role")).toEqual(["Carla Director", "amy Marshal", "Bob Driver"]);
    expect(await names("?sort=role&dir=desc")).toEqual(["Bob Driver", "amy Marshal", "Carla Director"]);
    expect(await names("?role=driver")).toEqual(["Bob Driver"]);
    expect(await names("?q=MARSH")).toEqual(["amy Marshal"]);
    expect(await names("?q=abe%40")).toEqual(["Bob Driver"]); // directors search e-mail addresses too
    expect(await names("?q=nobody")).toEqual([]);
  });

  it("orders by joined date, oldest first, newest first with dir=desc", async () => {
    const { club, director, marshal, driver } = await makeClubWithRoles();
    const d = await db();
    await d
      .update(memberships)
      .set({ createdAt: new Date("2026-01-01T00:00:00Z") })
      .where(eq(memberships.userId, driver.id));
    await d
      .update(memberships)
      .set({ createdAt: new Date("2026-02-01T00:00:00Z") })
      .where(eq(memberships.userId, director.id));
    await d
      .update(memberships)
      .set({ createdAt: new Date("2026-03-01T00:00:00Z") })
      .where(eq(memberships.userId, marshal.id));
    const ids = async (search: string) =>
      loaded(await view(club.id, director.cookie, search)).members.map((m) => m.name);
    expect(await ids("?sort=joined")).toEqual([driver.name, director.name, marshal.name]);
    expect(await ids("?sort=joined&dir=desc")).toEqual([marshal.name, director.name, driver.name]);
  });

  it("shows e-mail addresses and waiting invitations to directors only", async () => {
    const { club, director, marshal, driver } = await makeClubWithRoles();
    await (await db()).insert(invitations).values({
      clubId: club.id,
      email: "pending@members.example",
      role: "driver",
      tokenHash: hashLinkToken("x".repeat(43) + club.id),
      expiresAt: new Date(Date.now() + 60_000),
    });
    const asDirector = loaded(await view(club.id, director.cookie));
    expect(asDirector.members.find((m) => m.name === marshal.name)?.email).toBe(marshal.email);
    expect(asDirector.invitations).toHaveLength(1);
    for (const reader of [marshal, driver]) {
      const r = await view(club.id, reader.cookie, `?q=${encodeURIComponent(director.email)}`);
      expect(r.status).toBe(200);
      // The text filter matches names only for them, so an address finds nobody.
      expect(loaded(r).members).toEqual([]);
      const all = loaded(await view(club.id, reader.cookie));
      expect(all.members).toHaveLength(3);
      expect(all.members.every((m) => m.email === null)).toBe(true);
      expect(all.invitations).toEqual([]);
    }
  });

  it("names a bad query parameter with 400 and still lists the members with that part at its default", async () => {
    const { club, director } = await makeClubWithRoles();
    const r = await view(club.id, director.cookie, "?sort=shoe-size&role=driver");
    expect(r.status).toBe(400);
    expect(loaded(r).queryErrors.sort).toEqual(["Sort by name, email, role or joined."]);
    expect(loaded(r).members.map((m) => m.role)).toEqual(["driver"]);
    const badRole = await view(club.id, director.cookie, "?role=mechanic");
    expect(badRole.status).toBe(400);
    expect(loaded(badRole).queryErrors.role[0]).toMatch(/Filter by role/);
  });

  it("answers 404 for a club that does not exist and 403 for an outsider", async () => {
    const { club, outsider } = await makeClubWithRoles();
    expect((await view("no-such-club", outsider.cookie)).status).toBe(404);
    expect((await view(club.id, outsider.cookie)).status).toBe(403);
  });
});

describe("changing roles and removing members", () => {
  it("lets a director change a member's role and remove a member", async () => {
    const { club, director, marshal, driver } = await makeClubWithRoles();
    const changed = await post(
      club.id,
      { intent: "change-role", memberId: await membershipId(club.id, marshal.id), role: "director" },
      director.cookie,
    );
    expect(changed.status).toBe(302);
    expect(changed.location).toBe(`/clubs/${club.id}/members`);
    const removed = await post(
      club.id,
      { intent: "remove", memberId: await membershipId(club.id, driver.id) },
      director.cookie,
    );
    expect(removed.status).toBe(302);
    const rows = await membershipsOf(club.id);
    expect(rows.map((r) => [r.userId, r.role]).sort()).toEqual(
      [
        [director.id, "director"],
        [marshal.id, "director"],
      ].sort(),
    );
  });

  it("keeps the query string when it sends the director back to the table", async () => {
    const { club, director, driver } = await makeClubWithRoles();
    const memberId = await membershipId(club.id, driver.id);
    const r = await run(() =>
      members.action(
        args(
          formRequest(
            `/clubs/${club.id}/members?sort=role&dir=desc`,
            { intent: "change-role", memberId, role: "marshal" },
            director.cookie,
          ),
          { clubId: club.id },
        ),
      ),
    );
    expect(r.location).toBe(`/clubs/${club.id}/members?sort=role&dir=desc`);
  });

  it("refuses with 409 to demote or remove the last director, and writes nothing", async () => {
    const { club, director } = await makeClubWithRoles();
    const before = await membershipsOf(club.id);
    const memberId = await membershipId(club.id, director.id);
    const demote = await post(club.id, { intent: "change-role", memberId, role: "marshal" }, director.cookie);
    expect(demote.status).toBe(409);
    expect(errorsOf(demote).role[0]).toMatch(/at least one race director/);
    const remove = await post(club.id, { intent: "remove", memberId }, director.cookie);
    expect(remove.status).toBe(409);
    expect(errorsOf(remove).memberId[0]).toMatch(/at least one race director/);
    expect(await membershipsOf(club.id)).toEqual(before);
  });

  it("lets one of two directors step down or leave, then protects the one left", async () => {
    const { club, director, marshal } = await makeClubWithRoles();
    const marshalId = await membershipId(club.id, marshal.id);
    await post(club.id, { intent: "change-role", memberId: marshalId, role: "director" }, director.cookie);
    const leave = await post(
      club.id,
      { intent: "remove", memberId: await membershipId(club.id, director.id) },
      director.cookie,
    );
    expect(leave.status).toBe(302);
    expect(leave.location).toBe("/clubs");
    const last = await post(
      club.id,
      { intent: "change-role", memberId: marshalId, role: "driver" },
      marshal.cookie,
    );
    expect(last.status).toBe(409);
  });

  it("never lets two directors demoting each other at once leave the club without one", async () => {
    const { club, director, marshal } = await makeClubWithRoles();
    const a = await membershipId(club.id, director.id);
    const b = await membershipId(club.id, marshal.id);
    await post(club.id, { intent: "change-role", memberId: b, role: "director" }, director.cookie);
    // Both changes start before either finishes; the rule is checked inside each transaction.
    const results = await Promise.allSettled([
      changeMemberRole(club.id, a, "driver"),
      changeMemberRole(club.id, b, "driver"),
    ]);
    expect(results.filter((r) => r.status === "fulfilled")).toHaveLength(1);
    const refused = results.find((r): r is PromiseRejectedResult => r.status === "rejected");
    expect(refused?.reason).toBeInstanceOf(RuleError);
    expect((refused?.reason as RuleError).status).toBe(409);
    const directors = (await membershipsOf(club.id)).filter((r) => r.role === "director");
    expect(directors).toHaveLength(1);
  });

  it("answers 404 for a member id of another club and changes nothing there", async () => {
    const one = await makeClubWithRoles();
    const two = await makeClubWithRoles();
    const foreign = await membershipId(two.club.id, two.driver.id);
    const before = await membershipsOf(two.club.id);
    const r = await post(one.club.id, { intent: "remove", memberId: foreign }, one.director.cookie);
    expect(r.status).toBe(404);
    expect(errorsOf(r).memberId).toEqual(["No such member in this club."]);
    const c = await post(
      one.club.id,
      { intent: "change-role", memberId: foreign, role: "director" },
      one.director.cookie,
    );
    expect(c.status).toBe(404);
    expect(await membershipsOf(two.club.id)).toEqual(before);
  });

  it("answers 400 naming the field for a bad role or a missing intent", async () => {
    const { club, director, driver } = await makeClubWithRoles();
    const before = await membershipsOf(club.id);
    const badRole = await post(
      club.id,
      { intent: "change-role", memberId: await membershipId(club.id, driver.id), role: "owner" },
      director.cookie,
    );
    expect(badRole.status).toBe(400);
    expect(errorsOf(badRole).role).toEqual(["Choose a role: director, marshal or driver."]);
    const noIntent = await post(club.id, { memberId: "x" }, director.cookie);
    expect(noIntent.status).toBe(400);
    expect(errorsOf(noIntent).intent[0]).toMatch(/does not say what to do/);
    expect(await membershipsOf(club.id)).toEqual(before);
  });
});

describe("director-only member actions", () => {
  it("answers 403 to a marshal, a driver and a non-member, sends a signed-out visitor to sign in, and changes nothing", async () => {
    const { club, director, marshal, driver, outsider } = await makeClubWithRoles();
    const [invitation] = await (
      await db()
    )
      .insert(invitations)
      .values({
        clubId: club.id,
        email: "waiting@members.example",
        role: "driver",
        tokenHash: hashLinkToken("w".repeat(43)),
        expiresAt: new Date(Date.now() + 60_000),
      })
      .returning();
    const directorMember = await membershipId(club.id, director.id);
    const driverMember = await membershipId(club.id, driver.id);
    const actions: Record<string, string>[] = [
      { intent: "invite", email: "new@members.example", role: "driver" },
      { intent: "change-role", memberId: driverMember, role: "director" },
      { intent: "change-role", memberId: directorMember, role: "driver" },
      { intent: "remove", memberId: directorMember },
      { intent: "resend", invitationId: invitation.id },
      { intent: "revoke", invitationId: invitation.id },
    ];
    const snapshot = async () => ({
      members: await membershipsOf(club.id),
      invitations: await (await db()).select().from(invitations).where(eq(invitations.clubId, club.id)),
    });
    const before = await snapshot();
    for (const fields of actions) {
      for (const who of [marshal, driver, outsider]) {
        const r = await post(club.id, fields, who.cookie);
        expect(r.status, `${fields.intent} by ${who.name}`).toBe(403);
      }
      const anonymous = await post(club.id, fields);
      expect(anonymous.status).toBe(302);
      expect(anonymous.location).toMatch(/^\/sign-in\?redirectTo=/);
    }
    expect(await snapshot()).toEqual(before);
  });

  it("answers 404 for a club id that does not exist", async () => {
    const { director } = await makeClubWithRoles();
    const r = await post(
      "no-such-club",
      { intent: "invite", email: "x@members.example", role: "driver" },
      director.cookie,
    );
    expect(r.status).toBe(404);
  });
});
