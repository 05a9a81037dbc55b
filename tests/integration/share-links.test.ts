import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { publishedVersions, shareLinks } from "~/db/schema";
import { createLayoutFromDocument } from "~/layouts/documents.server";
import { resetShareLimits, SHARE_REQUESTS_PER_MINUTE } from "~/layouts/share-access.server";
import { loader as jumpLoader } from "~/routes/shared-jump";
import { loader as sharedLoader, meta as sharedMeta } from "~/routes/shared-layout";
import * as layoutPage from "~/routes/layout-page";
import * as publishing from "~/routes/layout-publishing";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles } from "./helpers/factories";
import { useFakeSmtp } from "./helpers/mail";
import { args, formRequest, getRequest, run } from "./helpers/requests";

const { db } = useTestDatabase();
useFakeSmtp();
beforeEach(() => resetShareLimits());

const RACE_DAY = new Date(Date.now() + 10 * 86400_000).toISOString().slice(0, 10);
const act = (layoutId: string, fields: Record<string, string>, cookie: string) =>
  run(() =>
    publishing.action(args(formRequest(`/layouts/${layoutId}/publishing`, fields, cookie), { layoutId })),
  );
/** Opens a share link as the server would pass it on: `clientAddress` is the socket's (or a trusted proxy's). */
const open = (token: string, query = "", clientAddress: string | null = null) =>
  run(() => sharedLoader(args(getRequest(`/shared/${token}${query}`), { token }, { clientAddress })));

/** A published summer layout and a share link to it; returns the token from the address shown once. */
async function sharedLayout() {
  const people = await makeClubWithRoles();
  const layout = await createLayoutFromDocument(people.club.id, SUMMER_LAYOUT, people.director.id);
  await act(
    layout.id,
    { intent: "publish", version: "1", raceDate: RACE_DAY, note: "Bring spare tyres" },
    people.director.cookie,
  );
  const [publication] = await (
    await db()
  )
    .select()
    .from(publishedVersions)
    .where(eq(publishedVersions.layoutId, layout.id));
  const made = await act(layout.id, { intent: "share", publication: publication.id }, people.director.cookie);
  expect(made.status).toBe(200);
  const url = (made.data as { shared: { url: string } }).shared.url;
  expect(url).toMatch(/\/shared\/[A-Za-z0-9_-]{43}$/);
  return { ...people, layout, publication, token: url.split("/").pop()! };
}

describe("share links", () => {
  it("opens the published plan, jumps and verdicts signed out, not indexed, with nothing about members", async () => {
    const { token, director, marshal, driver, outsider, layout } = await sharedLayout();
    const r = await open(token, "?car=sct-10&skill=expert");
    expect(r.status).toBe(200);
    expect(r.headers.get("X-Robots-Tag")).toBe("noindex, nofollow");
    expect(r.headers.get("Referrer-Policy")).toBe("no-referrer");
    const d = r.data as {
      layoutName: string;
      publication: { raceDate: string; note: string };
      analysis: { classId: string; skill: string; result: { ok: boolean; chosen: { jumps: unknown[] } } };
    };
    expect(d.layoutName).toBe("Summer layout");
    expect(d.publication).toMatchObject({ raceDate: RACE_DAY, note: "Bring spare tyres" });
    expect([d.analysis.classId, d.analysis.skill]).toEqual(["sct-10", "expert"]);
    expect(d.analysis.result.chosen.jumps.length).toBeGreaterThan(0);
    const text = JSON.stringify(r.data);
    for (const person of [director, marshal, driver, outsider]) {
      expect(text).not.toContain(person.email);
      expect(text).not.toContain(person.name);
      expect(text).not.toContain(person.id);
    }
    expect(text).not.toContain(layout.id);
    expect(sharedMeta({ data: r.data } as never)).toContainEqual({
      name: "robots",
      content: "noindex, nofollow",
    });
    const jump = await run(() =>
      jumpLoader(
        args(getRequest(`/shared/${token}/jumps/first-double`), { token, sectionId: "first-double" }),
      ),
    );
    expect(jump.status).toBe(200);
    expect((jump.data as { jump: { sectionId: string } }).jump.sectionId).toBe("first-double");
  });

  it("stores only the token's hash, and stops opening once revoked (404 like an unknown link)", async () => {
    const { token, layout, director } = await sharedLayout();
    const [row] = await (await db()).select().from(shareLinks).where(eq(shareLinks.layoutId, layout.id));
    expect(row.tokenHash).not.toContain(token);
    expect(row.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect((await act(layout.id, { intent: "revoke-share", link: row.id }, director.cookie)).status).toBe(
      302,
    );
    expect((await open(token)).status).toBe(404);
    expect((await act(layout.id, { intent: "revoke-share", link: row.id }, director.cookie)).status).toBe(
      409,
    );
    expect((await open("A".repeat(43))).status).toBe(404);
    expect((await open("short")).status).toBe(404);
  });

  it("stops a link when its version is withdrawn or the layout archived, and shares no withdrawn version", async () => {
    const first = await sharedLayout();
    await act(
      first.layout.id,
      { intent: "withdraw", publication: first.publication.id, reason: "Rained off" },
      first.director.cookie,
    );
    expect((await open(first.token)).status).toBe(404);
    const refused = await act(
      first.layout.id,
      { intent: "share", publication: first.publication.id },
      first.director.cookie,
    );
    expect(refused.status).toBe(409);
    const second = await sharedLayout();
    await run(() =>
      layoutPage.action(
        args(
          formRequest(
            `/layouts/${second.layout.id}`,
            { intent: "archive", version: "1" },
            second.director.cookie,
          ),
          {
            layoutId: second.layout.id,
          },
        ),
      ),
    );
    expect((await open(second.token)).status).toBe(404);
  });

  it("only directors make or revoke links (403)", async () => {
    const { layout, publication, marshal, driver } = await sharedLayout();
    const [row] = await (await db()).select().from(shareLinks).where(eq(shareLinks.layoutId, layout.id));
    for (const who of [marshal, driver]) {
      expect(
        (await act(layout.id, { intent: "share", publication: publication.id }, who.cookie)).status,
      ).toBe(403);
      expect((await act(layout.id, { intent: "revoke-share", link: row.id }, who.cookie)).status).toBe(403);
    }
  });

  it(`answers 429 with Retry-After past ${SHARE_REQUESTS_PER_MINUTE} requests a minute from one address`, async () => {
    const { token } = await sharedLayout();
    const from = "203.0.113.7";
    for (let i = 0; i < SHARE_REQUESTS_PER_MINUTE; i++)
      expect((await open(token, "", from)).status).toBe(200);
    const over = await open(token, "", from);
    expect(over.status).toBe(429);
    expect(Number(over.headers.get("Retry-After"))).toBeGreaterThan(0);
    expect((await open(token, "", "203.0.113.8")).status).toBe(200);
  });
});
