import { spawn } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { analyseLayout, carFromProfile, carProfileFile, CAR_PRESETS, profileFromCar } from "~/analysis";
import { BIG_DOUBLE, ovalWithJump } from "../analysis/analysis-fixtures";

const dir = mkdtempSync(join(tmpdir(), "loftline-analyse-"));

// Child processes start slowly on a busy machine: allow a minute and a half per test.
const SLOW = { timeout: 90_000 };

function file(name: string, content: unknown): string {
  const path = join(dir, name);
  writeFileSync(path, typeof content === "string" ? content : JSON.stringify(content));
  return path;
}

/** Runs the real command line: `loftline analyse ARGS...`. */
function analyse(...args: string[]): Promise<{ code: number | null; stdout: string; stderr: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn("node_modules/.bin/tsx", ["scripts/loftline.ts", "analyse", ...args]);
    let stdout = "";
    let stderr = "";
    child.stdout.on("data", (d) => (stdout += d));
    child.stderr.on("data", (d) => (stderr += d));
    child.on("error", reject);
    child.on("close", (code) => resolve({ code, stdout, stderr }));
    child.stdin.end("");
  });
}

const summer = file("summer.json", SUMMER_LAYOUT);
const keys = (o: object) => Object.keys(o).sort();

describe("loftline analyse", () => {
  it("prints the whole analysis of a layout file for one class and skill level", SLOW, async () => {
    const r = await analyse(summer, "--class", "buggy-4wd-10", "--skill", "expert");
    expect(r.stderr).toBe("");
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    const expected = analyseLayout(SUMMER_LAYOUT, { classIds: ["buggy-4wd-10"], skill: "expert" });
    expect(out.lapLength).toBeCloseTo(expected.lapLength, 9);
    expect(keys(out.closure)).toEqual(["gap", "headingDeg"]);
    expect(out.skill).toBe("expert");
    expect(out.rules.checks.map((c: { id: string }) => c.id)).toContain("minTrackWidth");
    expect(out.rules.note).toMatch(/rulebook/);
    expect(out.note).toMatch(/not a safety certification/);
    expect(out.classes).toHaveLength(1);
    const cls = out.classes[0];
    expect(cls.classId).toBe("buggy-4wd-10");
    expect(cls.lapTime).toBeCloseTo(expected.classes[0].lapTime, 9);
    expect(cls.jumps).toHaveLength(expected.classes[0].jumps.length);
    for (const [k, j] of cls.jumps.entries()) {
      const e = expected.classes[0].jumps[k];
      expect(j.id).toBe(e.sectionId);
      expect(j.takeoffSpeed).toBe(e.takeoffSpeed);
      expect(j.airtime).toBe(e.airtime);
      expect(j.equivalentFallHeight).toBe(e.equivalentFallHeight);
      if (e.whoops) {
        // A whoops row: the ways through it and their speeds, not one landing's window.
        expect(j.whoops).toEqual(e.whoops);
        expect(j).toHaveProperty("whoops.skimSpeed");
      } else {
        expect(j).toHaveProperty("speedWindow.min");
        expect(j).toHaveProperty("speedWindow.max");
        expect(j).toHaveProperty("landing.x");
      }
      expect(j).toHaveProperty("turn");
      expect(j.distanceToTurn).toBe(e.turn ? e.turn.distance : null);
      expect(keys(j.verdict)).toEqual([
        "expectedGain",
        "failCost",
        "mainError",
        "minGainPerPass",
        "minNoseTurnDeg",
        "noseTurnDeg",
        "reason",
        "reasonText",
        "skill",
        "successRate",
        "text",
        "timeSaved",
        "trackLengthSaved",
        "verdict",
      ]);
      expect(j.verdict.skill).toBe("expert");
      expect(j.verdict).toEqual(e.verdicts.expert);
    }
    // Jumps landing into turns name the turn and the distance to it.
    const into = cls.jumps.filter((j: { turn: unknown }) => j.turn !== null);
    expect(into.length).toBeGreaterThan(0);
    for (const j of into)
      expect(keys(j.turn)).toEqual([
        "angleDeg",
        "distance",
        "entrySpeed",
        "lookahead",
        "radius",
        "sectionId",
        "sectionIndex",
        "side",
      ]);
  });

  it(
    "defaults to the layout's classes and the club level; a hairpin after a big double: the expert is told why to take it straight",
    SLOW,
    async () => {
      const [all, hairpin] = await Promise.all([
        analyse(summer),
        analyse(file("hairpin.json", ovalWithJump(BIG_DOUBLE, { after: 0.5 })), "--skill=expert"),
      ]);
      expect(all.code).toBe(0);
      const out = JSON.parse(all.stdout);
      expect(out.classes.map((c: { classId: string }) => c.classId)).toEqual(SUMMER_LAYOUT.carClasses);
      expect(out.skill).toBe("club");
      expect(hairpin.code).toBe(0);
      const j = JSON.parse(hairpin.stdout).classes[0].jumps[0];
      // The plan turns the nose, but a yawed car rolls at touchdown and the takeoff speed's spread
      // moves the touchdown: the failed landings cost more than the clean ones save.
      expect(j.plan.feasible).toBe(true);
      expect(j.verdict.verdict).toBe("straight");
      expect(j.verdict.reason).toBe("too-risky");
      expect(j.verdict.mainError).toBe("speed");
      expect(j.verdict.text).toMatch(/the gain is smaller than the risk: \d+% clean/);
      expect(j.turn.sectionId).toBe("hairpin");
    },
  );

  it("bad input: exit 2, nothing on stdout, stderr names the field", SLOW, async () => {
    const narrow = file("narrow.json", { ...SUMMER_LAYOUT, trackWidth: 0.5 });
    const clubClass = file("club-class.json", { ...SUMMER_LAYOUT, carClasses: ["club-special"] });
    const runs = await Promise.all([
      analyse(narrow),
      analyse(summer, "--class", "hovercraft"),
      analyse(summer, "--skill", "pro"),
      analyse(summer, "--speed", "9"),
      analyse(join(dir, "missing.json")),
      analyse(file("broken.json", "{ not json")),
      analyse(clubClass),
    ]);
    const fields = [
      /trackWidth: must be at least 1 m/,
      /--class: unknown car class "hovercraft"/,
      /--skill: must be/,
      /--speed: unknown option/,
      /FILE: cannot read/,
      /FILE: not valid JSON/,
      /carClasses\[0\]: unknown car class "club-special"/,
    ];
    runs.forEach((r, k) => {
      expect(r.code).toBe(2);
      expect(r.stdout).toBe("");
      expect(r.stderr).toMatch(fields[k]);
    });
  });

  it(
    "analyses an own car from a profile file with --car, and names the field of a bad one",
    SLOW,
    async () => {
      const profile = {
        ...profileFromCar(CAR_PRESETS["buggy-2wd-10"]),
        label: "Measured buggy",
        massKg: 1.9,
      };
      const good = file("car.json", carProfileFile(profile));
      const bad = file("bad-car.json", carProfileFile({ ...profile, servoSecondsPer60: 5 }));
      const [r, refused] = await Promise.all([analyse(summer, "--car", good), analyse(summer, "--car", bad)]);
      expect(r.stderr).toBe("");
      const out = JSON.parse(r.stdout);
      expect(out.classes.map((c: { classId: string; label: string }) => [c.classId, c.label])).toEqual([
        ["own-1", "Measured buggy"],
      ]);
      const expected = analyseLayout(SUMMER_LAYOUT, {
        classIds: ["own-1"],
        cars: { "own-1": carFromProfile(profile, "own-1") },
      });
      expect(out.classes[0].lapTime).toBeCloseTo(expected.classes[0].lapTime, 9);
      expect(refused.code).toBe(2);
      expect(refused.stdout).toBe("");
      expect(refused.stderr).toMatch(
        /--car .*bad-car\.json: servoSecondsPer60: Servo speed \(time per 60°\) must be at most 1 s/,
      );
    },
  );
});
