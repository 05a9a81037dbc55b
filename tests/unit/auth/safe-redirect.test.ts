import { describe, expect, it } from "vitest";
import { safeRedirect } from "~/auth/session.server";

// Read as a browser reads a Location header (WHATWG URL parsing against APP_URL's origin).
describe("safeRedirect", () => {
  it.each([
    ["/clubs/42", "/clubs/42"],
    ["/layouts/abc?skill=expert#j2", "/layouts/abc?skill=expert#j2"],
    ["/clubs/../layouts/x", "/layouts/x"],
  ])("keeps the same-origin path %s", (to, expected) => {
    expect(safeRedirect(to)).toBe(expected);
  });

  it.each([
    "/\\evil.example",
    "/\t/evil.example",
    "/\r\n/evil.example",
    "//evil.example",
    "///evil.example",
    "/\\\\evil.example",
    "/..//evil.example",
    "/clubs/../..//evil.example",
    "https://evil.example/",
    "javascript:alert(1)",
    "http://localhost:3000/clubs",
    "evil.example",
    "",
  ])("refuses %j: the fallback instead", (to) => {
    expect(safeRedirect(to)).toBe("/clubs");
    expect(safeRedirect(to, "/")).toBe("/");
  });

  it("refuses what is not a string", () => {
    expect(safeRedirect(null)).toBe("/clubs");
    expect(safeRedirect(undefined)).toBe("/clubs");
  });
});
