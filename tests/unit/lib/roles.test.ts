import { describe, expect, it } from "vitest";
import { LAYOUT_STATUSES, ROLES, canSeeLayout, ROLE_LABELS, roleAllows } from "~/lib/roles";

describe("roleAllows", () => {
  it("lets only directors manage, and every role read", () => {
    expect(ROLES.filter((r) => roleAllows(r, "manage"))).toEqual(["director"]);
    expect(ROLES.every((r) => roleAllows(r, "read"))).toBe(true);
  });
});

describe("canSeeLayout", () => {
  it("shows directors every status and marshals and drivers only published layouts", () => {
    const seen = Object.fromEntries(
      ROLES.map((role) => [role, LAYOUT_STATUSES.filter((s) => canSeeLayout(role, s))]),
    );
    expect(seen).toEqual({
      director: ["draft", "published", "archived"],
      marshal: ["published"],
      driver: ["published"],
    });
  });
});

describe("ROLE_LABELS", () => {
  it("has a label for each role in the trade's words", () => {
    expect(ROLE_LABELS).toEqual({ director: "Race director", marshal: "Marshal", driver: "Driver" });
  });
});
