/**
 * kill -9 of the server in the middle of a burst of saves from the editor's own endpoint: the
 * database file passes SQLite's integrity and foreign-key checks afterwards, every save the server
 * acknowledged is there at the version it answered, each layout's version counter rose by exactly
 * the drawings stored (row and drawing change in one transaction), and the restarted server
 * serves the newest drawing and takes the next save.
 */
import { createClient, type Client } from "@libsql/client";
import { afterAll, describe, expect, it } from "vitest";
import type { AppServer } from "../../scripts/lib/app-server";
import { prepareApp, signIn, type TestApp } from "../../scripts/lib/temp-app";

type Ack = { layoutId: string | null; version: number | null; marker: string };

let app: TestApp | undefined;
let server: AppServer | undefined;
let db: Client | undefined;

afterAll(async () => {
  db?.close();
  await server?.stop();
  app?.remove();
});

/** The layout's document and version as the API gives them. */
async function current(base: string, cookie: string, layoutId: string) {
  const response = await fetch(`${base}/api/layouts/${layoutId}`, { headers: { cookie } });
  if (!response.ok) throw new Error(`GET /api/layouts/${layoutId}: ${response.status}`);
  return (await response.json()) as { version: number; document: Record<string, unknown> };
}

/** Saves through the editor's fetcher endpoint until a request fails (the server is gone). */
async function saveLoop(
  base: string,
  cookie: string,
  layoutId: string,
  name: string,
  acks: Ack[],
  intent: "save" | "save-copy",
) {
  const { document, version: start } = await current(base, cookie, layoutId);
  let version = start;
  for (let k = 0; ; k++) {
    const marker = `burst ${name} ${k}`;
    const body = { intent, baseVersion: version, document: { ...document, description: marker } };
    let response: Response;
    try {
      response = await fetch(`${base}/layouts/${layoutId}/edit.data`, {
        method: "POST",
        headers: { cookie, "Content-Type": "application/json", Origin: base },
        body: JSON.stringify(body),
      });
      await response.arrayBuffer();
    } catch {
      return; // the server was killed: this save was never acknowledged
    }
    if (intent === "save" && response.status === 200) {
      version += 1;
      acks.push({ layoutId, version, marker });
    } else if (intent === "save-copy" && response.status === 201) {
      acks.push({ layoutId: null, version: null, marker });
    } else throw new Error(`${intent} ${marker}: unexpected status ${response.status}`);
  }
}

describe("saves and a killed server", () => {
  it("keeps every acknowledged save and a sound database file", async () => {
    app = await prepareApp({ quiet: true });
    server = await app.start();
    const cookie = await signIn(app.base, "director");
    db = createClient({ url: `file:${app.dbFile}` });
    const ids = (await db.execute("SELECT id FROM layouts ORDER BY name")).rows.map((r) => String(r.id));
    expect(ids.length).toBeGreaterThanOrEqual(2);
    const startVersions: Record<string, number> = {};
    for (const id of ids.slice(0, 2)) startVersions[id] = (await current(app.base, cookie, id)).version;

    const acks: Ack[] = [];
    const loops = [
      saveLoop(app.base, cookie, ids[0], "a", acks, "save"),
      saveLoop(app.base, cookie, ids[1], "b", acks, "save"),
      saveLoop(app.base, cookie, ids[0], "copy", acks, "save-copy"),
    ];
    // Kill once a good number of saves are through, while each loop has one in flight.
    const deadline = Date.now() + 60_000;
    while (acks.length < 24 && Date.now() < deadline) await new Promise((r) => setTimeout(r, 5));
    expect(acks.length).toBeGreaterThanOrEqual(24);
    const exited = new Promise((resolve) => server!.child.once("exit", resolve));
    server.child.kill("SIGKILL");
    await exited;
    await Promise.all(loops);
    const acknowledged = acks.length;

    expect((await db.execute("PRAGMA integrity_check")).rows.map((r) => r[0])).toEqual(["ok"]);
    expect((await db.execute("PRAGMA foreign_key_check")).rows).toEqual([]);
    const stored = await db.execute(
      "SELECT layout_id, number, json_extract(document, '$.description') AS marker FROM layout_versions",
    );
    const byMarker = new Map(stored.rows.map((r) => [String(r.marker), r]));
    const missing = acks.filter((a) => {
      const row = byMarker.get(a.marker);
      return !row || (a.layoutId !== null && (row.layout_id !== a.layoutId || row.number !== a.version));
    });
    expect(missing).toEqual([]);
    // Each save moved the layout's counter and added its drawing in one transaction: the counter
    // went up by exactly the drawings the burst added, numbered one after another.
    for (const id of ids.slice(0, 2)) {
      const burst = stored.rows
        .filter((r) => r.layout_id === id && String(r.marker).startsWith("burst "))
        .map((r) => Number(r.number))
        .sort((a, b) => a - b);
      const [row] = (await db.execute({ sql: "SELECT version FROM layouts WHERE id = ?", args: [id] })).rows;
      expect(burst).toEqual(burst.map((_, i) => startVersions[id] + 1 + i));
      expect(row.version).toBe(startVersions[id] + burst.length);
    }
    const copies = await db.execute(`
      SELECT l.version, count(v.id) AS drawings, min(v.number) AS first FROM layouts l
      JOIN layout_versions v ON v.layout_id = l.id
      WHERE json_extract(v.document, '$.description') LIKE 'burst copy %' GROUP BY l.id`);
    for (const copy of copies.rows) expect([copy.version, copy.drawings, copy.first]).toEqual([1, 1, 1]);
    const unacknowledged =
      stored.rows.filter((r) => String(r.marker).startsWith("burst ")).length - acknowledged;
    expect(unacknowledged).toBeGreaterThanOrEqual(0);
    expect(unacknowledged).toBeLessThanOrEqual(loops.length); // at most the saves in flight
    console.log(
      `[saves-kill] ${acknowledged} saves acknowledged before kill -9, all ${acknowledged} kept; ${unacknowledged} more committed while in flight`,
    );

    // The restarted server serves the newest drawing and takes the next save.
    server = await app.start();
    const again = await signIn(app.base, "director");
    for (const id of ids.slice(0, 2)) {
      const newest = (
        await db.execute({
          sql: "SELECT number, json_extract(document, '$.description') AS marker FROM layout_versions WHERE layout_id = ? ORDER BY number DESC LIMIT 1",
          args: [id],
        })
      ).rows[0];
      const now = await current(app.base, again, id);
      expect(now.version).toBe(newest.number);
      expect(now.document.description).toBe(newest.marker);
      const next = await fetch(`${app.base}/layouts/${id}/edit.data`, {
        method: "POST",
        headers: { cookie: again, "Content-Type": "application/json", Origin: app.base },
        body: JSON.stringify({ intent: "save", baseVersion: now.version, document: now.document }),
      });
      expect(next.status).toBe(200);
    }
  }, 120_000);
});
