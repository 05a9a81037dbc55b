import fs from "node:fs";
import { describe, expect, it } from "vitest";

const dir = "docs/decisions";

describe("decision records index", () => {
  it("lists every record in docs/decisions/README.md, and only records that exist", () => {
    const records = fs.readdirSync(dir).filter((f) => /^\d{4}-.*\.md$/.test(f));
    const index = fs.readFileSync(`${dir}/README.md`, "utf8");
    const listed = [...index.matchAll(/\]\((\d{4}-[^)]+\.md)\)/g)].map((m) => m[1]);
    expect(records.length).toBeGreaterThan(40);
    expect(records.filter((r) => !listed.includes(r))).toEqual([]);
    expect(listed.filter((l) => !records.includes(l))).toEqual([]);
  });
});
