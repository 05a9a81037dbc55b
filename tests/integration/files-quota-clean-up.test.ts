/**
 * Uploads stay within each club's storage quota, also when they arrive together, and the clean-up
 * (`npm run files:clean`) removes the files no saved layout version uses, on disk and in the
 * database, while keeping used and recent ones.
 */
import fs from "node:fs";
import path from "node:path";
import { eq } from "drizzle-orm";
import { afterEach, describe, expect, it } from "vitest";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { files } from "~/db/schema";
import { createLayoutFromDocument, saveLayoutDocument } from "~/layouts/documents.server";
import { cleanUpFiles } from "~/storage/clean-up.server";
import { clubFileBytes, receiveUpload, SITE_PHOTO } from "~/storage/uploads.server";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles } from "./helpers/factories";
import { run } from "./helpers/requests";

const { dir, db } = useTestDatabase();

const PNG_HEADER = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
const KB = 1024;

function png(bytes: number): Uint8Array {
  const out = new Uint8Array(bytes);
  out.set(PNG_HEADER);
  return out;
}

function upload(clubId: string, userId: string, bytes: number) {
  const body = new FormData();
  body.set("photo", new File([png(bytes) as BlobPart], "site.png", { type: "image/png" }));
  const request = new Request("http://localhost/upload", { method: "POST", body });
  return run(() => receiveUpload(request, SITE_PHOTO, { clubId, userId }));
}

const onDisk = (clubId: string) => {
  const folder = path.join(dir, "files", clubId);
  return fs.existsSync(folder) ? fs.readdirSync(folder).sort() : [];
};

afterEach(() => {
  delete process.env.LOFTLINE_CLUB_FILE_QUOTA_MB;
});

describe("the club's storage quota", () => {
  it("refuses an upload past the quota with 413 naming the field, keeping nothing of it", async () => {
    process.env.LOFTLINE_CLUB_FILE_QUOTA_MB = String(100 / 1024); // 100 kB
    const { club, director } = await makeClubWithRoles();
    expect((await upload(club.id, director.id, 60 * KB)).status).toBe(200);
    const second = await upload(club.id, director.id, 60 * KB);
    expect(second.status).toBe(413);
    expect(second.data).toMatchObject({
      field: "photo",
      error: expect.stringMatching(/storage quota of 0\.1 MB \(0\.1 MB used\)/),
    });
    expect(await clubFileBytes(club.id)).toBe(60 * KB);
    expect(onDisk(club.id)).toHaveLength(1);
    // Another club has its own quota.
    const other = await makeClubWithRoles();
    expect((await upload(other.club.id, other.director.id, 60 * KB)).status).toBe(200);
  });

  it("lets only as many parallel uploads through as fit", async () => {
    process.env.LOFTLINE_CLUB_FILE_QUOTA_MB = String(100 / 1024);
    const { club, director } = await makeClubWithRoles();
    const results = await Promise.all(Array.from({ length: 6 }, () => upload(club.id, director.id, 30 * KB)));
    expect(results.filter((r) => r.status === 200)).toHaveLength(3);
    expect(results.filter((r) => r.status === 413)).toHaveLength(3);
    expect(await clubFileBytes(club.id)).toBe(90 * KB);
    expect(onDisk(club.id)).toHaveLength(3);
  });
});

describe("removing files no version uses", () => {
  it("removes unused old files and stray ones, keeps used and recent ones; a dry run removes nothing", async () => {
    const { club, director } = await makeClubWithRoles();
    const ids: string[] = [];
    for (let i = 0; i < 4; i++) {
      const r = await upload(club.id, director.id, 2 * KB);
      ids.push((r.data as { fileId: string }).fileId);
    }
    const [usedOld, usedEarlier, unused, recent] = ids;
    const photo = (fileId: string) => ({
      ...SUMMER_LAYOUT,
      background: { fileId, x: 0, y: 0, metresPerPixel: 0.05, rotationDeg: 0, opacity: 0.5, hidden: false },
    });
    // usedEarlier is only in the first version: an older version still counts.
    const layout = await createLayoutFromDocument(club.id, photo(usedEarlier), director.id);
    await saveLayoutDocument(layout.id, 1, photo(usedOld), director.id);
    const d = await db();
    const dayAgo = new Date(Date.now() - 25 * 60 * 60 * 1000);
    for (const id of [usedOld, usedEarlier, unused])
      await d.update(files).set({ createdAt: dayAgo }).where(eq(files.id, id));
    // A file left on disk with no row, e.g. by a server stopped between writing and recording it.
    const strayKey = path.join(dir, "files", club.id, "left-behind.png");
    fs.writeFileSync(strayKey, png(KB));
    fs.utimesSync(strayKey, dayAgo, dayAgo);
    const half = `${path.join(dir, "files", club.id, ids[0])}.png.4242.tmp`;
    fs.writeFileSync(half, png(KB));
    fs.utimesSync(half, dayAgo, dayAgo);

    const dry = await cleanUpFiles({ dryRun: true });
    expect(dry.unused.map((f) => f.id)).toEqual([unused]);
    expect(dry.stray).toEqual([`${club.id}/${ids[0]}.png.4242.tmp`, `${club.id}/left-behind.png`].sort());
    expect(onDisk(club.id)).toHaveLength(6);

    const done = await cleanUpFiles();
    expect(done.unused.map((f) => f.id)).toEqual([unused]);
    expect(done.bytes).toBe(2 * KB);
    const left = (await d.select({ id: files.id }).from(files).where(eq(files.clubId, club.id))).map(
      (r) => r.id,
    );
    expect(left.sort()).toEqual([usedOld, usedEarlier, recent].sort());
    expect(onDisk(club.id)).toEqual([usedOld, usedEarlier, recent].map((id) => `${id}.png`).sort());
    expect((await cleanUpFiles()).unused).toEqual([]);
  });
});
