import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { getDb } from "~/db/client.server";
import { clubs } from "~/db/schema";
import { useTestDatabase } from "./helpers/db";

useTestDatabase();

const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe("one local database file shared by concurrent requests", () => {
  it("runs parallel transactions that await between statements without SQLITE_BUSY", async () => {
    const db = await getDb();
    const started = Date.now();
    const names = await Promise.all(
      Array.from({ length: 6 }, (_, i) =>
        db.transaction(async (tx) => {
          const [club] = await tx
            .insert(clubs)
            .values({ name: `Club ${i}` })
            .returning();
          await pause(20); // another request's turn would come here
          await tx
            .update(clubs)
            .set({ name: `Club ${i} renamed` })
            .where(eq(clubs.id, club.id));
          return `Club ${i} renamed`;
        }),
      ),
    );
    expect(names).toHaveLength(6);
    const rows = await db.select({ name: clubs.name }).from(clubs);
    expect(rows.map((r) => r.name).sort()).toEqual(names.sort());
    // Without the queue, waiting writers block the process for the 5 s busy timeout.
    expect(Date.now() - started).toBeLessThan(3000);
  });

  it("lets a plain write wait for an open transaction instead of failing", async () => {
    const db = await getDb();
    const slow = db.transaction(async (tx) => {
      await tx.insert(clubs).values({ name: "Slow" });
      await pause(50);
    });
    const plain = db.insert(clubs).values({ name: "Plain" });
    await Promise.all([slow, plain]);
    const rows = await db.select({ name: clubs.name }).from(clubs).where(eq(clubs.name, "Plain"));
    expect(rows).toHaveLength(1);
  });

  it("rolls back a failed transaction and keeps serving", async () => {
    const db = await getDb();
    await expect(
      db.transaction(async (tx) => {
        await tx.insert(clubs).values({ name: "Half written" });
        throw new Error("boom");
      }),
    ).rejects.toThrow("boom");
    const rows = await db.select().from(clubs).where(eq(clubs.name, "Half written"));
    expect(rows).toHaveLength(0);
  });
});
