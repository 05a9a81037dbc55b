/**
 * Layout documents for the analysis budget's tests and benchmarks. `heaviestAccepted(n)` is about
 * the costliest analysis the work budget lets through: 40 distinct doubles, each landing into a
 * hairpin (so every jump gets a set-up plan), for all 4 car classes (160 jump analyses) on a
 * centre line just under the length limit; `n` changes every jump a little, so no memo holds it.
 * `overBudget(n)` is 500 distinct jumps (about 70 kB), what one account once used to hold the
 * server for seconds per request.
 */
import { CAR_PRESET_IDS, type LayoutDocumentInput } from "~/analysis";

function base(name: string, sections: LayoutDocumentInput["sections"]): LayoutDocumentInput {
  return {
    format: "loftline-layout",
    formatVersion: 1,
    name,
    surface: "clay",
    trackWidth: 3,
    start: { x: 0, y: 0, headingDeg: 0 },
    carClasses: [...CAR_PRESET_IDS],
    driverStand: { x: 5, y: -5, eyeHeight: 4 },
    sections,
  };
}

/** 40 jumps x 4 classes, every jump landing into a hairpin; distinct for each `n`. */
export function heaviestAccepted(n = 0): LayoutDocumentInput {
  const sections: LayoutDocumentInput["sections"] = [];
  for (let i = 0; i < 40; i++) {
    sections.push({ id: `s${i}`, kind: "straight", length: 16 });
    sections.push({
      id: `j${i}`,
      kind: "jump",
      name: `Double ${i + 1}`,
      preset: "double",
      faceHeight: 1.2 - i * 0.001 - (n % 1000) * 0.0001,
      faceAngleDeg: 40,
      gap: 10 + i * 0.01,
      landingHeight: 1.2,
      landingAngleDeg: 35,
    });
    sections.push({
      id: `t${i}`,
      kind: "turn",
      radius: 6,
      angleDeg: 180,
      direction: i % 2 ? "left" : "right",
    });
  }
  return base(`Heaviest accepted ${n}`, sections);
}

/** 500 distinct doubles in a row: far over the work budget. */
export function overBudget(n = 0): LayoutDocumentInput {
  const sections: LayoutDocumentInput["sections"] = [];
  for (let i = 0; i < 500; i++)
    sections.push({
      id: `j${i}`,
      kind: "jump",
      preset: "double",
      faceHeight: 0.3 + (i % 50) * 0.01,
      faceAngleDeg: 25 + (i % 7),
      gap: 3 + (i % 11) * 0.1 + (n % 100) * 0.001,
      landingHeight: 0.3 + (i % 13) * 0.01,
      landingAngleDeg: 20,
    });
  return base(`Over budget ${n}`, sections);
}
