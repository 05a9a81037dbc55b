import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { SITE_PHOTO, readStoredFile, receiveUpload } from "~/storage/uploads.server";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles } from "./helpers/factories";
import { run } from "./helpers/requests";

const { dir } = useTestDatabase();

const PNG_HEADER = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

function uploadRequest(bytes: Uint8Array, type: string, name = "site.png", field = "photo") {
  const body = new FormData();
  body.set(field, new File([bytes as BlobPart], name, { type }));
  return new Request("http://localhost/upload", { method: "POST", body });
}

describe("uploads to local disk", () => {
  it("stores a PNG under the data folder and reads it back", async () => {
    const { club, director } = await makeClubWithRoles();
    const bytes = new Uint8Array([...PNG_HEADER, 1, 2, 3, 4]);
    const stored = await receiveUpload(uploadRequest(bytes, "image/png"), SITE_PHOTO, {
      clubId: club.id,
      userId: director.id,
    });
    expect(stored.contentType).toBe("image/png");
    const back = await readStoredFile(stored.fileId);
    expect(Array.from(back!.bytes)).toEqual(Array.from(bytes));
    expect(fs.existsSync(path.join(dir, "files", club.id))).toBe(true);
  });

  it("refuses a file larger than 10 MB with 413 naming the field", async () => {
    const { club, director } = await makeClubWithRoles();
    const big = new Uint8Array(10 * 1024 * 1024 + 10);
    big.set(PNG_HEADER);
    const r = await run(() =>
      receiveUpload(uploadRequest(big, "image/png"), SITE_PHOTO, { clubId: club.id, userId: director.id }),
    );
    expect(r.status).toBe(413);
    expect(r.data).toMatchObject({ field: "photo" });
  });

  it("refuses a GIF, or a text file claiming to be a PNG, with 415", async () => {
    const { club, director } = await makeClubWithRoles();
    const owner = { clubId: club.id, userId: director.id };
    const gif = await run(() =>
      receiveUpload(
        uploadRequest(new Uint8Array([0x47, 0x49, 0x46, 0x38]), "image/gif", "a.gif"),
        SITE_PHOTO,
        owner,
      ),
    );
    expect(gif.status).toBe(415);
    const fake = await run(() =>
      receiveUpload(uploadRequest(new TextEncoder().encode("hello"), "image/png"), SITE_PHOTO, owner),
    );
    expect(fake.status).toBe(415);
    expect((fake.data as { error: string }).error).toMatch(/PNG or JPEG/);
  });

  it("answers 400 when no file was sent", async () => {
    const { club, director } = await makeClubWithRoles();
    const body = new FormData();
    body.set("note", "no file");
    const r = await run(() =>
      receiveUpload(new Request("http://localhost/upload", { method: "POST", body }), SITE_PHOTO, {
        clubId: club.id,
        userId: director.id,
      }),
    );
    expect(r.status).toBe(400);
  });
});
