import { getDb } from "~/db/client.server";
import { type LayoutStatus, type Role } from "~/lib/roles";
import { clubs, layouts, layoutVersions, memberships, publishedVersions } from "~/db/schema";
import { starterDocument } from "~/analysis";
import { createUser } from "~/auth/users.server";
import { sessionCookie } from "./requests";

let counter = 0;

/** A user with a known password ("correct horse 1") and a ready session cookie. */
export async function makeUser(overrides: { email?: string; name?: string; password?: string } = {}) {
  counter += 1;
  const password = overrides.password ?? "correct horse 1";
  const user = await createUser({
    email: overrides.email ?? `user${counter}-${Date.now()}@example.test`,
    name: overrides.name ?? `Test User ${counter}`,
    password,
  });
  if (!user) throw new Error("factory: e-mail taken");
  return { ...user, password, cookie: await sessionCookie(user.id) };
}

export async function makeClub(directorId: string, name = "Test Valley RC") {
  const db = await getDb();
  const [club] = await db.insert(clubs).values({ name }).returning();
  await db.insert(memberships).values({ clubId: club.id, userId: directorId, role: "director" });
  return club;
}

export async function addMember(clubId: string, userId: string, role: Role) {
  const db = await getDb();
  await db.insert(memberships).values({ clubId, userId, role });
}

/**
 * A layout row. A "published" one also gets what publishing makes: a stored version 1 (the
 * starter loop) published for a race day, so marshals and drivers have a version to read.
 */
export async function makeLayout(clubId: string, fields: { name?: string; status?: LayoutStatus } = {}) {
  const db = await getDb();
  const name = fields.name ?? "Test layout";
  const [layout] = await db
    .insert(layouts)
    .values({ clubId, name, status: fields.status ?? "draft" })
    .returning();
  if (layout.status === "published") {
    await db.insert(layoutVersions).values({
      layoutId: layout.id,
      number: 1,
      document: JSON.stringify(starterDocument(name, layout.trackWidth)),
    });
    await db
      .insert(publishedVersions)
      .values({ layoutId: layout.id, versionNumber: 1, raceDate: "2030-06-01" });
  }
  return layout;
}

/** A club with one member of each role. */
export async function makeClubWithRoles() {
  const director = await makeUser({ name: "Dana Director" });
  const marshal = await makeUser({ name: "Mo Marshal" });
  const driver = await makeUser({ name: "Dee Driver" });
  const outsider = await makeUser({ name: "Otto Outsider" });
  const club = await makeClub(director.id);
  await addMember(club.id, marshal.id, "marshal");
  await addMember(club.id, driver.id, "driver");
  return { club, director, marshal, driver, outsider };
}
