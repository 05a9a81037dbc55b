import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { createClient } from "@libsql/client";
import { afterAll, describe, expect, it } from "vitest";

/**
 * The race-day migration on a database from before it (a real SQLite file with the earlier
 * migrations applied and old rows in it): each "published" layout gets its newest saved drawing
 * published, a "published" layout never drawn goes back to draft, drafts stay drafts.
 */
const dir = fs.mkdtempSync(path.join(os.tmpdir(), "loftline-migration-"));
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

const journal = JSON.parse(fs.readFileSync("drizzle/meta/_journal.json", "utf8")) as {
  entries: { idx: number; tag: string }[];
};
const statements = (tag: string) =>
  fs
    .readFileSync(path.join("drizzle", `${tag}.sql`), "utf8")
    .split("--> statement-breakpoint")
    .map((s) => s.trim())
    .filter(Boolean);

describe("the race-day migration", () => {
  it("publishes the newest saved version of layouts that were published, and nothing else", async () => {
    const db = createClient({ url: `file:${path.join(dir, "old.db")}` });
    await db.execute("PRAGMA foreign_keys = ON");
    const raceDay = journal.entries.find((e) => e.tag.endsWith("race-day"))!;
    for (const e of journal.entries.filter((e) => e.idx < raceDay.idx))
      for (const sql of statements(e.tag)) await db.execute(sql);
    await db.batch([
      "insert into clubs (id, name) values ('c', 'Old club')",
      "insert into layouts (id, club_id, name, status, version) values ('drawn', 'c', 'Drawn', 'published', 4)",
      "insert into layouts (id, club_id, name, status, version) values ('blank', 'c', 'Blank', 'published', 1)",
      "insert into layouts (id, club_id, name, status, version) values ('draft', 'c', 'Draft', 'draft', 2)",
      "insert into layout_versions (id, layout_id, number, document) values ('v1', 'drawn', 2, '{}')",
      "insert into layout_versions (id, layout_id, number, document) values ('v2', 'drawn', 4, '{}')",
      "insert into layout_versions (id, layout_id, number, document) values ('v3', 'draft', 2, '{}')",
    ]);
    for (const sql of statements(raceDay.tag)) await db.execute(sql);
    const published = await db.execute(
      "select layout_id, version_number, race_date, withdrawn_at from published_versions",
    );
    expect(published.rows.map((r) => ({ ...r }))).toEqual([
      { layout_id: "drawn", version_number: 4, race_date: null, withdrawn_at: null },
    ]);
    const statuses = await db.execute("select id, status from layouts order by id");
    expect(statuses.rows.map((r) => [r.id, r.status])).toEqual([
      ["blank", "draft"],
      ["draft", "draft"],
      ["drawn", "published"],
    ]);
    db.close();
  });
});
