/**
 * Very large bodies on a few routes, whole and in chunks, one after another and four at once:
 * each is answered 413 (never 500) after at most the route's limit is read, and the server's
 * memory (its resident set, read from /proc) grows by a bounded amount, not by the bodies' size.
 */
import fs from "node:fs";
import { beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_ACCOUNTS } from "~/db/demo-accounts";
import { demoIds, send, signIn, storedPhotos } from "./client";

const MB = 1024 * 1024;
/** Allowed growth of the server's resident memory over the whole file, bytes. */
const MAX_GROWTH = 64 * MB;

/** The server's resident set size, bytes (Linux /proc). */
function serverRss(): number {
  const status = fs.readFileSync(`/proc/${inject("serverPid")}/status`, "utf8");
  const kb = Number(/VmRSS:\s+(\d+)\s+kB/.exec(status)?.[1]);
  if (!kb) throw new Error("no VmRSS for the server");
  return kb * 1024;
}

const director = DEMO_ACCOUNTS.find((a) => a.role === "director")!;
let cookie = "";
let layoutId = "";
let before = 0;
let photosBefore = 0;

beforeAll(async () => {
  cookie = await signIn(director.email, director.password);
  ({ layoutId } = await demoIds());
  // Warm the server up (pages rendered once, modules loaded) before the baseline.
  for (const path of ["/", "/sign-in", `/layouts/${layoutId}`, `/layouts/${layoutId}/edit`])
    await send(path, { method: "GET", headers: { Cookie: cookie } });
  before = serverRss();
  photosBefore = storedPhotos();
});

const FORM = { "Content-Type": "application/x-www-form-urlencoded" };
const PHOTO_PART =
  '------loftline\r\nContent-Disposition: form-data; name="photo"; filename="big.png"\r\n' +
  "Content-Type: image/png\r\n\r\n";

describe("very large bodies", () => {
  it("200 MB in chunks to the sign-in form: 413 after 64 KB", async () => {
    const answer = await send("/sign-in", { headers: FORM, chunkedBytes: 200 * MB });
    expect(answer.status).toBe(413);
    expect(answer.text).toContain("at most 64 KB");
  });

  it("a declared 600 MB to the sign-in form: 413 without reading it", async () => {
    const answer = await send("/sign-in", {
      headers: { ...FORM, "Content-Length": String(600 * MB) },
      chunkedBytes: 20 * MB,
    });
    expect(answer.status).toBe(413);
  });

  it("four parallel 250 MB posts: four 413s", async () => {
    const answers = await Promise.all(
      Array.from({ length: 4 }, () => send("/sign-in.data", { headers: FORM, chunkedBytes: 250 * MB })),
    );
    expect(answers.map((a) => a.status)).toEqual([413, 413, 413, 413]);
  });

  it("200 MB of JSON in chunks to the analysis API (signed in): 413 as JSON", async () => {
    const answer = await send("/api/analysis", {
      headers: { "Content-Type": "application/json", Cookie: cookie },
      prefix: '{"document":"',
      chunkedBytes: 200 * MB,
    });
    expect(answer.status).toBe(413);
    expect(JSON.parse(answer.text).error).toMatch(/too large/);
  });

  it("200 MB photo in chunks (signed in as director): 413, nothing stored", async () => {
    const answer = await send(`/layouts/${layoutId}/photo`, {
      headers: { "Content-Type": "multipart/form-data; boundary=----loftline", Cookie: cookie },
      prefix: PHOTO_PART,
      chunkedBytes: 200 * MB,
    });
    expect(answer.status).toBe(413);
    expect(storedPhotos()).toBe(photosBefore);
  });

  it("200 MB photo in chunks, signed out: 401 from the route, which never reads the body", async () => {
    const answer = await send(`/layouts/${layoutId}/photo`, {
      headers: { "Content-Type": "multipart/form-data; boundary=----loftline" },
      prefix: PHOTO_PART,
      chunkedBytes: 200 * MB,
    });
    expect(answer.status).toBe(401);
    expect(JSON.parse(answer.text).error).toBe("Sign in first.");
  });

  it("200 MB to the editor's save in chunks: 413", async () => {
    const answer = await send(`/layouts/${layoutId}/edit.data`, {
      headers: { "Content-Type": "application/json", Cookie: cookie },
      chunkedBytes: 200 * MB,
    });
    expect(answer.status).toBe(413);
  });

  it("the server's memory grew by less than 64 MB over all of these", async () => {
    const after = serverRss();
    console.log(
      `[reliability] server memory: ${(before / MB).toFixed(0)} MB before, ${(after / MB).toFixed(0)} MB after ` +
        `about 1.8 GB of refused bodies`,
    );
    expect(after - before).toBeLessThan(MAX_GROWTH);
    // The server still answers normally.
    expect((await send("/api/health", { method: "GET" })).status).toBe(200);
  });
});
