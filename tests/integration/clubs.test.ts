import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { useTestDatabase } from "./helpers/db";
import { addMember, makeClub, makeClubWithRoles, makeUser } from "./helpers/factories";
import { args, formRequest, getRequest, run } from "./helpers/requests";
import { clubs, memberships } from "~/db/schema";
import * as clubLayout from "~/routes/club-frame";
import * as clubsPage from "~/routes/clubs";
import * as signedIn from "~/routes/signed-in-frame";

const { db } = useTestDatabase();

const createClub = (fields: Record<string, string>, cookie?: string) =>
  run(() => clubsPage.action(args(formRequest("/clubs", fields, cookie))));
const allClubs = async () => (await db()).select({ id: clubs.id, name: clubs.name }).from(clubs);

describe("your clubs", () => {
  it("lists each club you belong to with your role in it and its member count, by name", async () => {
    const me = await makeUser({ name: "Multi Club" });
    const other = await makeUser();
    const zebra = await makeClub(me.id, "Zebra Flats RC");
    const alder = await makeClub(other.id, "Alder Creek Off-Road");
    await addMember(alder.id, me.id, "marshal");
    await makeClub(other.id, "Not Mine RC");
    const r = await run(() => clubsPage.loader(args(getRequest("/clubs", me.cookie))));
    expect(r.status).toBe(200);
    expect((r.data as { clubs: unknown[] }).clubs).toEqual([
      { id: alder.id, name: "Alder Creek Off-Road", role: "marshal", memberCount: 2 },
      { id: zebra.id, name: "Zebra Flats RC", role: "director", memberCount: 1 },
    ]);
  });

  it("creates a club and makes its creator the race director", async () => {
    const me = await makeUser();
    const r = await createClub({ name: "  Heron Lake Racing  " }, me.cookie);
    expect(r.status).toBe(302);
    const [club] = (await allClubs()).filter((c) => c.name === "Heron Lake Racing");
    expect(r.location).toBe(`/clubs/${club.id}`);
    const rows = await (
      await db()
    )
      .select({ userId: memberships.userId, role: memberships.role })
      .from(memberships)
      .where(eq(memberships.clubId, club.id));
    expect(rows).toEqual([{ userId: me.id, role: "director" }]);
  });

  it("answers 400 naming the field for a name that is missing or too long, and writes nothing", async () => {
    const me = await makeUser();
    const before = await allClubs();
    const empty = await createClub({ name: " " }, me.cookie);
    expect(empty.status).toBe(400);
    expect((empty.data as { errors: Record<string, string[]> }).errors.name).toEqual([
      "Enter the club's name (at least 2 characters).",
    ]);
    const long = await createClub({ name: "x".repeat(81) }, me.cookie);
    expect((long.data as { errors: Record<string, string[]> }).errors.name).toEqual([
      "Keep the club's name to 80 characters or fewer.",
    ]);
    const missing = await createClub({}, me.cookie);
    expect((missing.data as { errors: Record<string, string[]> }).errors.name).toEqual([
      "Enter the club's name.",
    ]);
    expect(await allClubs()).toEqual(before);
  });

  it("sends a signed-out visitor to sign in and creates nothing", async () => {
    const before = await allClubs();
    const r = await createClub({ name: "Anonymous RC" });
    expect(r.status).toBe(302);
    expect(r.location).toBe("/sign-in?redirectTo=%2Fclubs");
    expect(await allClubs()).toEqual(before);
    const page = await run(() => signedIn.loader(args(getRequest("/clubs"))));
    expect(page.location).toBe("/sign-in?redirectTo=%2Fclubs");
  });
});

describe("the club frame", () => {
  it("loads the club and the reader's role for each member", async () => {
    const { club, director, marshal, driver } = await makeClubWithRoles();
    for (const [who, role] of [
      [director, "director"],
      [marshal, "marshal"],
      [driver, "driver"],
    ] as const) {
      const r = await run(() =>
        clubLayout.loader(args(getRequest(`/clubs/${club.id}`, who.cookie), { clubId: club.id })),
      );
      expect(r.status).toBe(200);
      expect(r.data).toEqual({ club: { id: club.id, name: club.name }, role });
    }
  });

  it("answers 403 to a non-member, 404 for a wrong club id, and sends signed-out visitors to sign in", async () => {
    const { club, outsider } = await makeClubWithRoles();
    const frame = (clubId: string, cookie?: string) =>
      run(() => clubLayout.loader(args(getRequest(`/clubs/${clubId}`, cookie), { clubId })));
    expect((await frame(club.id, outsider.cookie)).status).toBe(403);
    expect((await frame("no-such-club", outsider.cookie)).status).toBe(404);
    expect((await frame(club.id)).location).toBe(
      `/sign-in?redirectTo=${encodeURIComponent(`/clubs/${club.id}`)}`,
    );
  });
});
