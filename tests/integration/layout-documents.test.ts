import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { getDb } from "~/db/client.server";
import { layouts, layoutVersions } from "~/db/schema";
import {
  StaleVersionError,
  createLayoutFromDocument,
  loadLayoutDocument,
  saveLayoutDocument,
} from "~/layouts/documents.server";
import { starterDocument } from "~/analysis";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles, makeLayout } from "./helpers/factories";

useTestDatabase();

describe("layout documents stored per version", () => {
  it("gives a never-drawn layout the starter loop with the row's name and width", async () => {
    const { club } = await makeClubWithRoles();
    const layout = await makeLayout(club.id, { name: "Spring loop" });
    const { document, versionNumber } = await loadLayoutDocument({ ...layout, trackWidth: 3.5 });
    expect(versionNumber).toBeNull();
    expect(document.name).toBe("Spring loop");
    expect(document.trackWidth).toBe(3.5);
    expect(document.sections).toHaveLength(4);
  });

  it("saves a new version and refuses a stale one without writing anything", async () => {
    const { club, director } = await makeClubWithRoles();
    const layout = await makeLayout(club.id);
    const doc = { ...starterDocument("Renamed in the editor", 3), surface: "clay" as const };
    const saved = await saveLayoutDocument(layout.id, layout.version, doc, director.id);
    expect(saved.version).toBe(layout.version + 1);

    const db = await getDb();
    const [row] = await db.select().from(layouts).where(eq(layouts.id, layout.id));
    expect(row.name).toBe("Renamed in the editor");
    expect(row.surface).toBe("clay");

    const stale = saveLayoutDocument(layout.id, layout.version, { ...doc, name: "Lost edit" }, director.id);
    await expect(stale).rejects.toBeInstanceOf(StaleVersionError);
    const versions = await db.select().from(layoutVersions).where(eq(layoutVersions.layoutId, layout.id));
    expect(versions).toHaveLength(1);
    const [after] = await db.select().from(layouts).where(eq(layouts.id, layout.id));
    expect(after.name).toBe("Renamed in the editor");
    expect(after.version).toBe(saved.version);
  });

  it("imports a document as a new draft layout with its first version", async () => {
    const { club, director } = await makeClubWithRoles();
    const layout = await createLayoutFromDocument(
      club.id,
      starterDocument("Imported loop", 2.8),
      director.id,
    );
    expect(layout.status).toBe("draft");
    const loaded = await loadLayoutDocument(layout);
    expect(loaded.versionNumber).toBe(1);
    expect(loaded.document.name).toBe("Imported loop");
    expect(loaded.document.trackWidth).toBe(2.8);
  });
});
