import { describe, expect, it } from "vitest";
import type { LayoutDocument } from "~/analysis";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { createLayoutFromDocument, saveLayoutDocument } from "~/layouts/documents.server";
import { publishDraft } from "~/layouts/publishing.server";
import { loader as compareLoader } from "~/routes/layout-compare";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles } from "./helpers/factories";
import { args, getRequest, run } from "./helpers/requests";

useTestDatabase();

/** Version 2: the whoops removed, the triple's gap longer, the first hairpin wider, a straight added. */
function secondVersion(): LayoutDocument {
  const sections = SUMMER_LAYOUT.sections
    .filter((s) => s.id !== "whoops")
    .map((s) => {
      if (s.id === "triple" && s.kind === "jump" && s.preset === "triple") return { ...s, gap: s.gap + 1 };
      if (s.id === "east-hairpin-1" && s.kind === "turn") return { ...s, radius: 4 };
      return s;
    });
  sections.splice(1, 0, { id: "run-in", kind: "straight", length: 5 });
  return { ...SUMMER_LAYOUT, sections, trackWidth: 4 };
}

type Compare = {
  from: number | "draft";
  to: number | "draft";
  numbers: Record<string, number>;
  result: {
    documents: {
      counts: { added: number; removed: number; changed: number };
      sections: {
        sectionId: string;
        kind: string;
        fields: { field: string; from: unknown; to: unknown }[];
      }[];
      layout: { field: string; from: unknown; to: unknown }[];
    };
    classes: {
      classId: string;
      lapTime: { from: number; to: number };
      jumps: {
        sectionId: string;
        from: string | null;
        to: string | null;
        takeoffSpeed: { from: number | null };
      }[];
    }[];
    lines: { sectionId: string; kind: string; points: unknown[] }[];
  } | null;
};

const compare = (layoutId: string, query: string, cookie: string) =>
  run(() => compareLoader(args(getRequest(`/layouts/${layoutId}/compare${query}`, cookie), { layoutId })));

describe("comparing two versions", () => {
  it("lists the sections added, removed and changed, and how each class's lap and jump verdicts moved", async () => {
    const { club, director, driver } = await makeClubWithRoles();
    const layout = await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id);
    await publishDraft(layout.id, 1, { raceDate: "2030-06-01", note: "" }, director.id);
    await saveLayoutDocument(layout.id, 1, secondVersion(), director.id);
    await publishDraft(layout.id, 2, { raceDate: "2030-06-08", note: "" }, director.id);

    const r = await compare(layout.id, "?from=1&to=2&skill=expert", driver.cookie);
    expect(r.status).toBe(200);
    const d = r.data as Compare;
    const docs = d.result!.documents;
    expect(docs.counts).toEqual({ added: 1, removed: 1, changed: 2 });
    const byKind = (kind: string) => docs.sections.filter((s) => s.kind === kind).map((s) => s.sectionId);
    expect(byKind("added")).toEqual(["run-in"]);
    expect(byKind("removed")).toEqual(["whoops"]);
    expect(byKind("changed").sort()).toEqual(["east-hairpin-1", "triple"]);
    const triple = docs.sections.find((s) => s.sectionId === "triple")!;
    expect(triple.fields.map((f) => f.field)).toEqual(["gap"]);
    expect(docs.layout).toEqual([{ field: "trackWidth", from: SUMMER_LAYOUT.trackWidth, to: 4 }]);
    // Numbered as in the list, and drawn: removed sections from the older version's line.
    expect(Object.keys(d.numbers).sort()).toEqual(["east-hairpin-1", "run-in", "triple", "whoops"]);
    expect(d.result!.lines.find((l) => l.sectionId === "whoops")?.kind).toBe("removed");
    expect(d.result!.lines.find((l) => l.sectionId === "run-in")?.kind).toBe("added");
    // Every class of the layout, each jump in both versions or marked as gone.
    expect(d.result!.classes.map((c) => c.classId)).toEqual(SUMMER_LAYOUT.carClasses);
    for (const c of d.result!.classes) {
      expect(c.lapTime.to).not.toBeCloseTo(c.lapTime.from, 3);
      const whoops = c.jumps.find((j) => j.sectionId === "whoops")!;
      expect(whoops.to).toBeNull();
      expect(whoops.from).not.toBeNull();
      const first = c.jumps.find((j) => j.sectionId === "first-double")!;
      expect(first.from).not.toBeNull();
      expect(first.to).not.toBeNull();
    }
  });

  it("shows marshals and drivers published versions only (404 for the draft); directors compare with the draft", async () => {
    const { club, director, marshal } = await makeClubWithRoles();
    const layout = await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id);
    await publishDraft(layout.id, 1, { raceDate: "2030-06-01", note: "" }, director.id);
    await saveLayoutDocument(layout.id, 1, secondVersion(), director.id);
    expect((await compare(layout.id, "?from=1&to=draft", marshal.cookie)).status).toBe(404);
    expect((await compare(layout.id, "?from=1&to=2", marshal.cookie)).status).toBe(404);
    const only = (await compare(layout.id, "", marshal.cookie)).data as Compare;
    expect(only.result).toBeNull();
    const own = (await compare(layout.id, "", director.cookie)).data as Compare;
    expect([own.from, own.to]).toEqual([1, "draft"]);
    expect(own.result!.documents.counts).toEqual({ added: 1, removed: 1, changed: 2 });
  });
});
