/**
 * The S3 file store against the real fake S3 server (s3rver on a free port): bytes written come
 * back exactly, large files stream, deletes and listings work, uploads keep the club quota and the
 * clean-up empties the bucket of unused files, reads keep the permission checks, and a store that
 * is missing, refuses the credentials or is down gives a clear error and a 503, never a crash.
 */
import crypto from "node:crypto";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { loader as fileLoader } from "~/routes/file";
import { action as photoAction } from "~/routes/layout-photo";
import { cleanUpFiles } from "~/storage/clean-up.server";
import { startFakeS3, type FakeS3 } from "~/storage/fake-s3.server";
import { s3Store } from "~/storage/s3-store.server";
import { fileStore, resetFileStore, StoreUnavailableError } from "~/storage/storage.server";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles, makeLayout } from "./helpers/factories";
import { args, getRequest, run } from "./helpers/requests";

const { dir } = useTestDatabase();
let s3: FakeS3;
const PNG_HEADER = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

beforeAll(async () => {
  s3 = await startFakeS3({ port: 0, dir: path.join(dir, "s3") });
  Object.assign(process.env, s3.env);
  resetFileStore();
});
afterAll(async () => {
  await s3.close().catch(() => {});
  for (const name of Object.keys(s3.env)) delete process.env[name];
  resetFileStore();
});

const sha = (b: Uint8Array) => crypto.createHash("sha256").update(b).digest("hex");

function photoRequest(layoutId: string, bytes: Uint8Array, cookie: string) {
  const body = new FormData();
  body.set("photo", new File([bytes as BlobPart], "site.png", { type: "image/png" }));
  return new Request(`http://localhost/layouts/${layoutId}/photo`, {
    method: "POST",
    body,
    headers: { Cookie: cookie },
  });
}

describe("the S3 store", () => {
  it("puts, gets, streams, lists and deletes, byte for byte", async () => {
    const store = fileStore();
    await store.check();
    const bytes = new Uint8Array(crypto.randomBytes(3 * 1024 * 1024 + 17));
    await store.put("club-a/big.png", bytes);
    expect(sha((await store.get("club-a/big.png"))!)).toBe(sha(bytes));
    const opened = (await store.open("club-a/big.png"))!;
    expect(opened.size).toBe(bytes.length);
    const hash = crypto.createHash("sha256");
    let chunks = 0;
    for await (const chunk of opened.body) {
      hash.update(chunk);
      chunks += 1;
    }
    expect(hash.digest("hex")).toBe(sha(bytes));
    expect(chunks).toBeGreaterThan(1); // arrived in pieces, not as one buffer
    expect((await store.list()).map((f) => [f.key, f.size])).toContainEqual(["club-a/big.png", bytes.length]);
    await store.delete("club-a/big.png");
    expect(await store.get("club-a/big.png")).toBeNull();
    expect(await store.open("club-a/big.png")).toBeNull();
    await expect(store.put("../escape.png", bytes)).rejects.toThrow(/Unsafe storage key/);
  });

  it("serves an uploaded photo to the club's members only, and cleans it up once unused", async () => {
    const { club, director, driver, outsider } = await makeClubWithRoles();
    const layout = await makeLayout(club.id);
    const bytes = new Uint8Array([...PNG_HEADER, ...crypto.randomBytes(5000)]);
    const up = await run(() =>
      photoAction(args(photoRequest(layout.id, bytes, director.cookie), { layoutId: layout.id })),
    );
    expect(up.status).toBe(201);
    const { fileId, url } = up.data as { fileId: string; url: string };
    const get = (cookie?: string) => fileLoader(args(getRequest(url, cookie), { fileId }));
    const served = (await get(driver.cookie)) as Response;
    expect(served.status).toBe(200);
    expect(served.headers.get("Content-Length")).toBe(String(bytes.length));
    expect(sha(new Uint8Array(await served.arrayBuffer()))).toBe(sha(bytes));
    expect((await run(() => get(outsider.cookie))).status).toBe(404);
    expect((await run(() => get())).status).toBe(401);

    const inBucket = async () => (await fileStore().list()).filter((f) => f.key.startsWith(club.id));
    expect(await inBucket()).toHaveLength(1);
    const report = await cleanUpFiles({ graceMs: 0, now: Date.now() + 1000 });
    expect(report.unused.map((f) => f.id)).toContain(fileId);
    expect(await inBucket()).toHaveLength(0);
    expect((await run(() => get(driver.cookie))).status).toBe(404);
  });

  it("says clearly when the bucket is missing or the credentials are wrong", async () => {
    const base = { ...s3Settings(), bucket: "no-such-bucket" };
    await expect(s3Store(base).check()).rejects.toThrow(/bucket "no-such-bucket" does not exist/);
    // s3rver knows the key id but does not check V4 signatures: a wrong key id is what it refuses.
    const wrong = { ...s3Settings(), accessKeyId: "NOT-A-KEY" };
    await expect(s3Store(wrong).check()).rejects.toThrow(/refused the credentials/);
    await expect(s3Store(wrong).put("x/y.png", new Uint8Array([1]))).rejects.toBeInstanceOf(
      StoreUnavailableError,
    );
  });

  it("answers 503 with a message when the store is down, for reads and uploads", async () => {
    const { club, director, driver } = await makeClubWithRoles();
    const layout = await makeLayout(club.id);
    const bytes = new Uint8Array([...PNG_HEADER, 1, 2, 3]);
    const up = await run(() =>
      photoAction(args(photoRequest(layout.id, bytes, director.cookie), { layoutId: layout.id })),
    );
    const { fileId, url } = up.data as { fileId: string; url: string };
    await s3.close();
    await expect(fileStore().check()).rejects.toThrow(/could not be reached/);
    const read = await run(() => fileLoader(args(getRequest(url, driver.cookie), { fileId })));
    expect(read.status).toBe(503);
    expect(read.data).toMatchObject({ error: expect.stringMatching(/file store does not answer/) });
    const upload = await run(() =>
      photoAction(args(photoRequest(layout.id, bytes, director.cookie), { layoutId: layout.id })),
    );
    expect(upload.status).toBe(503);
    expect(upload.data).toMatchObject({ field: "photo" });
  }, 30_000);
});

function s3Settings() {
  return {
    bucket: s3.bucket,
    endpoint: s3.endpoint,
    region: "us-east-1",
    accessKeyId: s3.env.S3_ACCESS_KEY_ID,
    secretAccessKey: s3.env.S3_SECRET_ACCESS_KEY,
  };
}
