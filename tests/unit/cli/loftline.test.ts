import { spawn } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

const dir = mkdtempSync(join(tmpdir(), "loftline-cli-"));

// Child processes start slowly on a busy machine: allow a minute per test.
const SLOW = { timeout: 60_000 };

/** Runs the real command line as a child process, with `input` written to a file or piped in. */
function loftline(
  command: string,
  input: unknown,
  viaStdin = false,
): Promise<{ code: number | null; stdout: string; stderr: string }> {
  const text = typeof input === "string" ? input : JSON.stringify(input);
  let file = "-";
  if (!viaStdin) {
    file = join(dir, `${command}-${Math.random().toString(36).slice(2)}.json`);
    writeFileSync(file, text);
  }
  return new Promise((resolve, reject) => {
    const child = spawn("node_modules/.bin/tsx", ["scripts/loftline.ts", command, file]);
    let stdout = "";
    let stderr = "";
    child.stdout.on("data", (d) => (stdout += d));
    child.stderr.on("data", (d) => (stderr += d));
    child.on("error", reject);
    child.on("close", (code) => resolve({ code, stdout, stderr }));
    child.stdin.end(viaStdin ? text : "");
  });
}

const keys = (o: object) => Object.keys(o).sort();

describe("loftline flight", () => {
  it(
    "answers the flight contract (check: EFH example from engine.md, after Levy et al. 2015)",
    SLOW,
    async () => {
      const input = {
        speed: 6,
        faceAngleDeg: 30,
        lip: [0, 0],
        surface: [
          [0, 0],
          [3, 0],
          [10, -7 * Math.tan((25 * Math.PI) / 180)],
        ],
      };
      const r = await loftline("flight", input);
      expect(r.code).toBe(0);
      const out = JSON.parse(r.stdout);
      expect(keys(out)).toEqual(["airtime", "apex", "landing"]);
      expect(keys(out.landing)).toEqual([
        "equivalentFallHeight",
        "flightPathDeg",
        "normalSpeed",
        "speed",
        "surfaceSlopeDeg",
        "x",
        "z",
      ]);
      expect(out.airtime).toBeCloseTo(0.6956, 4);
      expect(out.landing.x).toBeCloseTo(3.6144, 4);
      expect(out.landing.equivalentFallHeight).toBeCloseTo(0.0821, 4);
      expect(out.landing.surfaceSlopeDeg).toBeCloseTo(-25, 9);
      expect(out.apex).toHaveLength(2);
    },
  );

  it("reads standard input for -", SLOW, async () => {
    const r = await loftline(
      "flight",
      {
        speed: 70,
        faceAngleDeg: 75,
        lip: [0, 0],
        surface: [
          [-1, 0],
          [2000, 0],
        ],
        g: 9.8,
      },
      true,
    );
    expect(r.code).toBe(0);
    // OpenStax University Physics Vol. 1 (2016), Example 4.7: apex 233 m
    expect(JSON.parse(r.stdout).apex[1]).toBeCloseTo(233, 0);
  });

  it("bad input: exit 2, nothing on stdout, stderr names the field", SLOW, async () => {
    const [missing, order, broken] = await Promise.all([
      loftline("flight", {
        speed: 6,
        lip: [0, 0],
        surface: [
          [0, 0],
          [3, 0],
        ],
      }),
      loftline("flight", {
        speed: 6,
        faceAngleDeg: 20,
        lip: [0, 0],
        surface: [
          [0, 0],
          [-1, 0],
        ],
      }),
      loftline("flight", "{ not json", true),
    ]);
    expect(missing.code).toBe(2);
    expect(missing.stdout).toBe("");
    expect(missing.stderr).toMatch(/faceAngleDeg/);
    expect(order.code).toBe(2);
    expect(order.stderr).toMatch(/surface\[1\]\.x/);
    expect(broken.code).toBe(2);
    expect(broken.stdout).toBe("");
    expect(broken.stderr).toMatch(/FILE: not valid JSON/);
  });
});

describe("loftline attitude and airplan", () => {
  it("attitude answers the contract with a car object", SLOW, async () => {
    const car = {
      inertia: [0.0048, 0.0167, 0.0201],
      frontWheel: { spinInertia: 4.7e-5, radius: 0.041 },
      rearWheel: { spinInertia: 7.1e-5, radius: 0.043 },
      casterDeg: 28,
      steeringLockDeg: 32,
      servoSecondsPer60: 0.08,
    };
    const r = await loftline("attitude", {
      car,
      speed: 10,
      duration: 0.6,
      steering: [
        [0.05, 30],
        [0.3, 0],
      ],
      rearWheelAccel: [
        [0.05, -2000],
        [0.08, 0],
      ],
    });
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(keys(out)).toEqual(["angularMomentumDrift", "pitchDeg", "rollDeg", "yawDeg"]);
    expect(out.angularMomentumDrift).toBeLessThan(1e-6);
    expect(out.pitchDeg).toBeLessThan(-5); // brake drops the nose (common practice, no source)
  });

  it("the airplan output replays through attitude to the landing it reports", SLOW, async () => {
    const plan = await loftline("airplan", {
      car: "buggy-4wd-10",
      speed: 11,
      airtime: 0.65,
      turn: "left",
      pitchChangeDeg: -20,
      takeoffPitchDeg: 25,
    });
    expect(plan.code).toBe(0);
    const p = JSON.parse(plan.stdout);
    for (const k of ["steering", "yawDeg", "pitchDeg", "rollDeg", "timingWindowMs", "successRate"])
      expect(p).toHaveProperty(k);
    expect(keys(p.successRate)).toEqual(["club", "expert", "novice"]);
    expect(keys(p.successAlone)).toEqual(["pulse", "speed", "steering"]);
    expect(["steering", "pulse", "speed", null]).toContain(p.mainError.club);
    expect(p.yawDeg).toBeGreaterThan(3);
    expect(p.initialPitchDeg).toBe(25);
    const replay = await loftline("attitude", {
      car: "buggy-4wd-10",
      speed: 11,
      duration: 0.65,
      steering: p.steering,
      rearWheelAccel: p.rearWheelAccel,
      initialPitchDeg: p.initialPitchDeg,
    });
    expect(replay.code).toBe(0);
    const a = JSON.parse(replay.stdout);
    expect(a.yawDeg).toBeCloseTo(p.yawDeg, 6);
    expect(a.pitchDeg).toBeCloseTo(p.pitchDeg, 6);
    expect(a.rollDeg).toBeCloseTo(p.rollDeg, 6);
  });

  it("bad airplan and attitude input name the field", SLOW, async () => {
    const wheelCar = {
      inertia: [0.005, 0.017, 0.02],
      frontWheel: { spinInertia: 5e-5, radius: -0.04 },
      rearWheel: { spinInertia: 7e-5, radius: 0.043 },
      casterDeg: 28,
      steeringLockDeg: 32,
      servoSecondsPer60: 0.08,
    };
    const [turn, car, wheel, unknown] = await Promise.all([
      loftline("airplan", { car: "buggy-8", speed: 10, airtime: 0.6, turn: "up" }),
      loftline("attitude", { car: "hovercraft", speed: 10, duration: 0.5, steering: [] }),
      loftline("attitude", { car: wheelCar, speed: 10, duration: 0.5, steering: [] }),
      loftline("hover", "{}", true),
    ]);
    expect(turn.code).toBe(2);
    expect(turn.stdout).toBe("");
    expect(turn.stderr).toMatch(/turn/);
    expect(car.code).toBe(2);
    expect(car.stderr).toMatch(/car/);
    expect(wheel.code).toBe(2);
    expect(wheel.stderr).toMatch(/car\.frontWheel\.radius/);
    expect(unknown.code).toBe(2);
    expect(unknown.stdout).toBe("");
  });
});
