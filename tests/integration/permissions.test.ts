import { describe, expect, it } from "vitest";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles, makeLayout } from "./helpers/factories";
import { getRequest, run } from "./helpers/requests";
import { requireClubRole, requireLayoutAccess } from "~/auth/permissions.server";

useTestDatabase();

describe("permission helpers against a real database", () => {
  it("lets a director manage, refuses marshals and drivers with 403, outsiders with 403", async () => {
    const { club, director, marshal, driver, outsider } = await makeClubWithRoles();
    const asRole = (cookie: string) =>
      run(() => requireClubRole(getRequest("/x", cookie), club.id, "director"));
    expect((await asRole(director.cookie)).status).toBe(200);
    expect((await asRole(marshal.cookie)).status).toBe(403);
    expect((await asRole(driver.cookie)).status).toBe(403);
    expect((await asRole(outsider.cookie)).status).toBe(403);
  });

  it("redirects signed-out visitors to sign-in, and answers 401 for the API", async () => {
    const { club } = await makeClubWithRoles();
    const page = await run(() => requireClubRole(getRequest("/clubs/x"), club.id));
    expect(page.status).toBe(302);
    expect(page.location).toMatch(/^\/sign-in\?redirectTo=/);
    const api = await run(() => requireClubRole(getRequest("/api/x"), club.id, "member", { api: true }));
    expect(api.status).toBe(401);
  });

  it("answers 404 for a club id that does not exist", async () => {
    const { director } = await makeClubWithRoles();
    const r = await run(() => requireClubRole(getRequest("/x", director.cookie), "no-such-club"));
    expect(r.status).toBe(404);
  });

  it("hides draft layouts from marshals and drivers, shows published ones", async () => {
    const { club, director, marshal, driver } = await makeClubWithRoles();
    const draft = await makeLayout(club.id, { status: "draft" });
    const published = await makeLayout(club.id, { status: "published" });
    expect((await run(() => requireLayoutAccess(getRequest("/", director.cookie), draft.id))).status).toBe(
      200,
    );
    expect((await run(() => requireLayoutAccess(getRequest("/", marshal.cookie), draft.id))).status).toBe(
      404,
    );
    expect((await run(() => requireLayoutAccess(getRequest("/", driver.cookie), draft.id))).status).toBe(404);
    expect((await run(() => requireLayoutAccess(getRequest("/", driver.cookie), published.id))).status).toBe(
      200,
    );
  });
});
