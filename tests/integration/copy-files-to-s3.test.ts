/**
 * `npm run files:to-s3`: a folder of files copied into the fake S3 server, each checked by size
 * and SHA-256; a second run changes nothing; an object that differs is written again; leftovers
 * of killed writes stay behind. The command itself runs once against the same folder.
 */
import { execFile } from "node:child_process";
import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { copyFolderToStore } from "~/storage/copy-to-store.server";
import { startFakeS3, type FakeS3 } from "~/storage/fake-s3.server";
import { s3Store } from "~/storage/s3-store.server";
import { useTestDatabase } from "./helpers/db";

const { dir } = useTestDatabase();
let s3: FakeS3;
const folder = path.join(dir, "files");
const FILES: Record<string, number> = {
  "club-a/1111.png": 1,
  "club-a/2222.jpg": 300_000,
  "club-b/3333.png": 2 * 1024 * 1024 + 5,
};

beforeAll(async () => {
  s3 = await startFakeS3({ port: 0, dir: path.join(dir, "s3") });
  for (const [key, size] of Object.entries(FILES)) {
    fs.mkdirSync(path.dirname(path.join(folder, key)), { recursive: true });
    fs.writeFileSync(path.join(folder, key), crypto.randomBytes(size));
  }
  fs.writeFileSync(path.join(folder, "club-a/4444.png.999.tmp"), "half a file");
});
afterAll(() => s3.close());

const sha = (b: Uint8Array) => crypto.createHash("sha256").update(b).digest("hex");
const store = () =>
  s3Store({
    bucket: s3.bucket,
    endpoint: s3.endpoint,
    region: "us-east-1",
    accessKeyId: s3.env.S3_ACCESS_KEY_ID,
    secretAccessKey: s3.env.S3_SECRET_ACCESS_KEY,
  });

describe("copying a folder into the bucket", () => {
  it("copies and checks every file, and a second run changes nothing", async () => {
    const first = await copyFolderToStore(folder, store());
    expect(first.map((r) => [r.key, r.outcome])).toEqual(Object.keys(FILES).map((k) => [k, "copied"]));
    for (const key of Object.keys(FILES)) {
      const local = new Uint8Array(fs.readFileSync(path.join(folder, key)));
      expect(sha((await store().get(key))!)).toBe(sha(local));
      expect(first.find((r) => r.key === key)!.sha256).toBe(sha(local));
    }
    const listed = await store().list();
    const second = await copyFolderToStore(folder, store());
    expect(second.map((r) => r.outcome)).toEqual(["unchanged", "unchanged", "unchanged"]);
    expect(await store().list()).toEqual(listed); // nothing rewritten
    expect(listed.map((f) => f.key)).not.toContain("club-a/4444.png.999.tmp");
  });

  it("writes again an object that differs from the file", async () => {
    await store().put("club-a/2222.jpg", new Uint8Array([1, 2, 3]));
    const again = await copyFolderToStore(folder, store());
    expect(again.find((r) => r.key === "club-a/2222.jpg")!.outcome).toBe("copied");
    expect((await store().get("club-a/2222.jpg"))!.byteLength).toBe(300_000);
  });

  it("runs as a command, printing the totals", async () => {
    // Not spawnSync: the fake S3 server answers from this process's event loop.
    const result = await promisify(execFile)("node_modules/.bin/tsx", ["scripts/files-to-s3.ts", folder], {
      env: { ...process.env, ...s3.env },
      encoding: "utf8",
    });
    expect(result.stdout).toMatch(/0 copied, 3 already there and equal, 0 failed\./);
  }, 30_000);
});
