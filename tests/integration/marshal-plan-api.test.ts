import { beforeAll, describe, expect, it } from "vitest";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { createLayoutFromDocument } from "~/layouts/documents.server";
import type { EditorMarshalPlan } from "~/lib/editor/marshal-plan-types";
import { action } from "~/routes/api-marshal-plan";
import { saveClubMarshal } from "~/clubs/marshal-settings.server";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles } from "./helpers/factories";
import { args, jsonRequest, run } from "./helpers/requests";

useTestDatabase();

let people: Awaited<ReturnType<typeof makeClubWithRoles>>;
let layoutId = "";

beforeAll(async () => {
  people = await makeClubWithRoles();
  layoutId = (await createLayoutFromDocument(people.club.id, SUMMER_LAYOUT, people.director.id)).id;
}, 60_000);

const post = (body: unknown, cookie: string) =>
  run(() => action(args(jsonRequest(`/api/layouts/${layoutId}/marshal-plan`, body, cookie), { layoutId })));

describe("the editor's marshal plan", () => {
  it("is for directors only: 403 for a marshal, a driver and an outsider", async () => {
    for (const who of [people.marshal, people.driver, people.outsider])
      expect((await post({ document: SUMMER_LAYOUT }, who.cookie)).status).toBe(403);
  });

  it("warns about a point on the track and one beyond reach, each with what to do", async () => {
    const onTrack = { x: SUMMER_LAYOUT.start.x + 2, y: SUMMER_LAYOUT.start.y };
    const document = { ...SUMMER_LAYOUT, marshalPoints: [onTrack, { x: 30, y: -5.5 }] };
    const res = await post({ document }, people.director.cookie);
    expect(res.status).toBe(200);
    const plan = res.data as EditorMarshalPlan;
    expect(plan.points.map((p) => p.id)).toEqual(["M1", "M2"]);
    expect(plan.points[0].warnings.map((w) => w.kind)).toContain("on-track");
    expect(plan.points[1].warnings.map((w) => w.kind)).toContain("too-far");
    for (const w of plan.points.flatMap((p) => p.warnings)) expect(w.action.length).toBeGreaterThan(10);
    expect(plan.zones.length).toBeGreaterThan(0);
    expect(plan.hotspots.length).toBeGreaterThan(0);
    for (const h of plan.hotspots) expect(Number.isFinite(h.x) && Number.isFinite(h.y)).toBe(true);
    expect(plan.suggested).toBeNull();
  });

  it("suggests as many points as the club's largest heat, none of them warned about", async () => {
    await saveClubMarshal(people.club.id, { reach: 3, heatSize: 6 });
    const res = await post({ document: SUMMER_LAYOUT, suggest: true }, people.director.cookie);
    expect(res.status).toBe(200);
    const plan = res.data as EditorMarshalPlan;
    expect(plan.suggested?.asked).toBe(6);
    expect(plan.suggested?.points.length).toBe(6);
    const again = await post(
      { document: { ...SUMMER_LAYOUT, marshalPoints: plan.suggested!.points } },
      people.director.cookie,
    );
    const checked = again.data as EditorMarshalPlan;
    expect(checked.points.flatMap((p) => p.warnings)).toEqual([]);
  });

  it("answers 400 naming the field for a bad body", async () => {
    const bad = await post({ document: SUMMER_LAYOUT, suggest: "yes" }, people.director.cookie);
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.data)).toContain('"path":"suggest"');
    const missing = await post({}, people.director.cookie);
    expect(missing.status).toBe(400);
    expect(JSON.stringify(missing.data)).toContain('"path":"document"');
  });
});
