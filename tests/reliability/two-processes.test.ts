/**
 * The app keeps no state of its own: two server processes on two ports share one SQLite file (its
 * own locking between processes: WAL and the busy timeout), one fake S3 server and one
 * SESSION_SECRET. A cookie from A works on B; a photo uploaded through A is read through B; 50
 * concurrent saves of one layout over both give one success per base version and 409 for the rest;
 * writers that retry lose no update; B killed with SIGKILL mid-burst leaves A answering and every
 * acknowledged save in place. With a libSQL server, run it with DATABASE_URL pointing there
 * (docs/decisions/0900-files-in-s3-and-several-processes.md).
 */
import crypto from "node:crypto";
import path from "node:path";
import { createClient, type Client } from "@libsql/client";
import { afterAll, describe, expect, it } from "vitest";
import { startFakeS3, type FakeS3 } from "~/storage/fake-s3.server";
import { freePort, type AppServer } from "../../scripts/lib/app-server";
import { prepareApp, signIn, type TestApp } from "../../scripts/lib/temp-app";

let app: TestApp | undefined;
let s3: FakeS3 | undefined;
let db: Client | undefined;
const servers: AppServer[] = [];

afterAll(async () => {
  db?.close();
  await Promise.all(servers.map((s) => s.stop()));
  await s3?.close();
  app?.remove();
});

type Save = { status: number; base: number; marker: string };

describe("two app processes on one database, one file store, one secret", () => {
  it("share sessions, files and saves, and survive one being killed", async () => {
    app = await prepareApp({ quiet: true });
    s3 = await startFakeS3({ port: 0, dir: path.join(app.dataDir, "s3") });
    const a = app.base;
    const portB = await freePort();
    const b = `http://127.0.0.1:${portB}`;
    // Both behind one public address (APP_URL = a), as behind a load balancer.
    servers.push(await app.start(s3.env), await app.start(s3.env, portB));
    const origin = a;
    db = createClient({ url: `file:${app.dbFile}` });
    const ids = (await db.execute("SELECT id FROM layouts ORDER BY name")).rows.map((r) => String(r.id));

    // A session made by A is good on B.
    const cookie = await signIn(a, "director");
    const current = async (base: string, id: string) => {
      const r = await fetch(`${base}/api/layouts/${id}`, { headers: { cookie } });
      expect(r.status).toBe(200);
      return (await r.json()) as { version: number; document: Record<string, unknown> };
    };
    expect((await current(b, ids[0])).version).toBeGreaterThan(0);

    // A photo uploaded through A is read, byte for byte, through B.
    const png = new Uint8Array([
      0x89,
      0x50,
      0x4e,
      0x47,
      0x0d,
      0x0a,
      0x1a,
      0x0a,
      ...crypto.randomBytes(200_000),
    ]);
    const form = new FormData();
    form.set("photo", new File([png], "site.png", { type: "image/png" }));
    const up = await fetch(`${a}/layouts/${ids[0]}/photo`, {
      method: "POST",
      headers: { cookie, Origin: origin },
      body: form,
    });
    expect(up.status).toBe(201);
    const { url } = (await up.json()) as { url: string };
    const read = await fetch(`${b}${url}`, { headers: { cookie } });
    expect(read.status).toBe(200);
    expect(Buffer.from(await read.arrayBuffer()).equals(Buffer.from(png))).toBe(true);

    const save = async (base: string, id: string, baseVersion: number, document: object, marker: string) => {
      const r = await fetch(`${base}/layouts/${id}/edit.data`, {
        method: "POST",
        headers: { cookie, "Content-Type": "application/json", Origin: origin },
        body: JSON.stringify({ intent: "save", baseVersion, document: { ...document, description: marker } }),
      });
      await r.arrayBuffer();
      return { status: r.status, base: baseVersion, marker } satisfies Save;
    };

    // 50 concurrent saves of one layout at one base version, over A and B: one wins, 49 get 409.
    const start = await current(a, ids[0]);
    const burst = await Promise.all(
      Array.from({ length: 50 }, (_, i) =>
        save(i % 2 ? b : a, ids[0], start.version, start.document, `two ${i}`),
      ),
    );
    expect(burst.filter((s) => s.status === 200)).toHaveLength(1);
    expect(burst.filter((s) => s.status === 409)).toHaveLength(49);
    const winner = burst.find((s) => s.status === 200)!;
    const afterBurst = await current(b, ids[0]);
    expect([afterBurst.version, afterBurst.document.description]).toEqual([start.version + 1, winner.marker]);

    // Ten writers that re-read and retry on 409, three saves each, over A and B: no lost update.
    const acks: Save[] = [];
    await Promise.all(
      Array.from({ length: 10 }, async (_, w) => {
        for (let k = 0, tries = 0; k < 3; tries++) {
          expect(tries).toBeLessThan(200);
          const base = (w + tries) % 2 ? b : a;
          const now = await current(base, ids[0]);
          const s = await save(base, ids[0], now.version, now.document, `writer ${w} ${k}`);
          if (s.status === 200) {
            acks.push(s);
            k++;
          } else expect(s.status).toBe(409);
        }
      }),
    );
    const bases = acks.map((s) => s.base).sort((x, y) => x - y);
    expect(bases).toEqual(bases.map((_, i) => afterBurst.version + i)); // one success per base version
    const stored = await db.execute({
      sql: "SELECT number, json_extract(document, '$.description') AS marker FROM layout_versions WHERE layout_id = ?",
      args: [ids[0]],
    });
    const atNumber = new Map(stored.rows.map((r) => [Number(r.number), String(r.marker)]));
    for (const s of acks) expect(atNumber.get(s.base + 1)).toBe(s.marker);
    expect((await current(a, ids[0])).version).toBe(afterBurst.version + 30);

    // B killed with SIGKILL in the middle of a burst: A keeps answering, acknowledged saves stay.
    const killed: Save[] = [];
    let bGone = false;
    const loop = async (base: string, id: string, more: () => boolean) => {
      const { version: from, document } = await current(base, id);
      let version = from;
      for (let k = 0; more(); k++) {
        let s: Save;
        try {
          s = await save(base, id, version, document, `kill ${base} ${k}`);
        } catch {
          return; // the process was killed: this save was never acknowledged
        }
        expect(s.status).toBe(200);
        killed.push(s);
        version += 1;
      }
    };
    let aAfterKill = 0;
    const loops = [loop(a, ids[1], () => !bGone || aAfterKill++ < 10), loop(b, ids[2] ?? ids[0], () => true)];
    while (killed.length < 20) await new Promise((r) => setTimeout(r, 5));
    const exited = new Promise((resolve) => servers[1].child.once("exit", resolve));
    servers[1].child.kill("SIGKILL");
    await exited;
    bGone = true;
    await Promise.all(loops);
    expect(aAfterKill).toBeGreaterThan(10);
    expect((await fetch(`${a}/api/health`)).status).toBe(200);
    const kept = await db.execute(
      "SELECT layout_id, number, json_extract(document, '$.description') AS marker FROM layout_versions",
    );
    const markers = new Set(kept.rows.map((r) => String(r.marker)));
    expect(killed.filter((s) => !markers.has(s.marker))).toEqual([]);
    expect((await db.execute("PRAGMA integrity_check")).rows.map((r) => r[0])).toEqual(["ok"]);
    console.log(`[two-processes] ${killed.length} saves acknowledged around the kill of B, all kept`);
  }, 90_000);
});
