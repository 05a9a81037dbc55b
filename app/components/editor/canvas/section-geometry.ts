/**
 * A section's drawing in its own frame (x along the start heading, y to the left, m), so that when
 * an earlier section changes, later ones only move as a whole and are not recomputed.
 */
import { jumpProfile, type LayoutSection } from "~/analysis";

export interface LocalSectionDrawing {
  /** Closed outline of the track band, flat [x0, y0, x1, y1, ...]. */
  band: number[];
  centre: number[];
  /** Line across the band at the section's end. */
  endTick: number[];
  /** Middle of the section on the centre line and the heading there, deg (for labels and arrows). */
  mid: { x: number; y: number; headingDeg: number };
  /** Arrow of the direction of travel at the middle, flat [x0, y0, x1, y1, x2, y2]. */
  chevron: number[];
  /** Jumps: rectangles across the band (face, landing), the lip line and the whole mound span. */
  jump: { mound: number[]; face: number[]; landing: number[]; lip: number[] } | null;
}

const DEG = Math.PI / 180;

function across(d0: number, d1: number, half: number): number[] {
  return [d0, -half, d1, -half, d1, half, d0, half];
}

/** @param trackWidth m. */
export function localDrawing(section: LayoutSection, trackWidth: number): LocalSectionDrawing {
  const drawing = sectionDrawing(section, trackWidth);
  const size = Math.min(1.2, trackWidth / 3);
  const h = drawing.mid.headingDeg * DEG;
  const at = (ax: number, ay: number) => [
    drawing.mid.x + ax * Math.cos(h) - ay * Math.sin(h),
    drawing.mid.y + ax * Math.sin(h) + ay * Math.cos(h),
  ];
  drawing.chevron = [...at(-size * 0.5, -size * 0.45), ...at(0, 0), ...at(-size * 0.5, size * 0.45)];
  return drawing;
}

function sectionDrawing(section: LayoutSection, trackWidth: number): LocalSectionDrawing {
  const half = trackWidth / 2;
  if (section.kind === "turn")
    return turnDrawing(section.radius, section.angleDeg * DEG, section.direction === "left" ? 1 : -1, half);
  const profile = section.kind === "jump" ? jumpProfile(section) : null;
  const length = section.kind === "straight" ? section.length : profile!.length;
  const drawing: LocalSectionDrawing = {
    band: across(0, length, half),
    centre: [0, 0, length, 0],
    endTick: [length, -half, length, half],
    mid: { x: length / 2, y: 0, headingDeg: 0 },
    chevron: [],
    jump: null,
  };
  if (profile) {
    const { d, h, lipIndex, landingStartIndex, landingEndIndex } = profile;
    const raised = d.filter((_, k) => h[k] > 0.005);
    const first = raised.length ? Math.max(0, d[d.indexOf(raised[0]) - 1]) : 0;
    const last = raised.length ? d[Math.min(d.length - 1, d.indexOf(raised[raised.length - 1]) + 1)] : length;
    drawing.jump = {
      mound: across(first, last, half),
      face: across(d[lipIndex - 1], d[lipIndex], half),
      landing: across(d[landingStartIndex], d[landingEndIndex], half),
      lip: [d[lipIndex], -half, d[lipIndex], half],
    };
  }
  return drawing;
}

/** @param angle rad; @param sign +1 left, -1 right; @param half half the track width, m. */
function turnDrawing(radius: number, angle: number, sign: number, half: number): LocalSectionDrawing {
  const steps = Math.max(2, Math.ceil(angle / (3 * DEG)));
  const at = (r: number, t: number) => [r * Math.sin(t), sign * (radius - r * Math.cos(t))];
  const left: number[] = [];
  const right: number[] = [];
  const centre: number[] = [];
  const rl = Math.max(0, radius - sign * half);
  const rr = Math.max(0, radius + sign * half);
  for (let k = 0; k <= steps; k++) {
    const t = (angle * k) / steps;
    centre.push(...at(radius, t));
    left.push(...at(rl, t));
    right.push(...at(rr, t));
  }
  const band = [...right];
  for (let k = left.length - 2; k >= 0; k -= 2) band.push(left[k], left[k + 1]);
  const [mx, my] = at(radius, angle / 2);
  const endLeft = at(rl, angle);
  const endRight = at(rr, angle);
  return {
    band,
    centre,
    endTick: [...endRight, ...endLeft],
    mid: { x: mx, y: my, headingDeg: (sign * angle) / 2 / DEG },
    chevron: [],
    jump: null,
  };
}
