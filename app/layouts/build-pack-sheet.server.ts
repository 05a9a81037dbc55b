/**
 * The build pack as plain data for the page, the PDFs and the CSV: every stake measured from the
 * datums (and placed on the earth when datum A's latitude and longitude are given), the turns,
 * the jumps' points and the earth in each jump. Numbers stay numbers; the formats are shared
 * (~/lib/build-pack-format).
 */
import {
  earthworks,
  layoutGeometry,
  markingOut,
  trackEdges,
  type LayoutDocument,
  type Stake,
  JUMP_PRESET_LABELS,
} from "~/analysis";
import type { StakeRow } from "~/lib/build-pack-rows";
import { STAKE_KIND_LABELS } from "~/lib/build-pack-words";
import type { BuildSettings } from "./build-pack-settings.server";
import { geoLocator } from "./build-pack-geo.server";

const DEG = 180 / Math.PI;

export type BuildSheet = ReturnType<typeof buildSheet>;

/** Everything the sheets show. @param versionLabel e.g. "version 3". */
export function buildSheet(doc: LayoutDocument, settings: BuildSettings, versionLabel: string) {
  const marking = markingOut(doc, settings.a, settings.b, settings.spacing);
  const earth = earthworks(doc, settings.truck);
  const geo = settings.geo ? geoLocator(marking.baseline, settings.geo) : null;
  const row = (stake: Stake, what = STAKE_KIND_LABELS[stake.kind], context = ""): StakeRow => {
    const at = geo?.locate(stake.measure);
    return {
      id: stake.id,
      kind: stake.kind,
      what,
      context,
      s: stake.s,
      height: stake.height,
      x: stake.x,
      y: stake.y,
      distance: stake.measure.distance,
      bearing: stake.measure.bearing * DEG,
      along: stake.measure.along,
      offset: stake.measure.offset,
      lat: at?.lat ?? null,
      lon: at?.lon ?? null,
    };
  };
  const sectionName = (index: number) => {
    const s = doc.sections[index];
    return s.name ?? (s.kind === "jump" ? JUMP_PRESET_LABELS[s.preset] : s.id);
  };
  const presetLabel = (index: number) => {
    const s = doc.sections[index];
    return s.kind === "jump" ? JUMP_PRESET_LABELS[s.preset] : "";
  };
  const [a, b] = marking.datums;
  return {
    layoutName: doc.name,
    versionLabel,
    trackWidth: doc.trackWidth,
    lapLength: marking.lapLength,
    closureGap: marking.closureGap,
    settings,
    baseline: {
      length: marking.baseline.length,
      bearing: marking.baseline.bearing * DEG,
      trueBearing: geo ? geo.locate(b.measure).trueBearingDeg : null,
    },
    gridTrueBearing: geo?.gridTrueBearingDeg ?? null,
    datums: [row(a, `Datum A: ${settings.a.label}`), row(b, `Datum B: ${settings.b.label}`)],
    turns: marking.turns.map((t) => ({
      number: t.number,
      name: sectionName(t.sectionIndex),
      direction: t.direction,
      angle: t.angle * DEG,
      radius: t.radius,
      innerRadius: t.innerRadius,
      outerRadius: t.outerRadius,
      startS: t.startS,
      endS: t.endS,
      centre: row(t.centre, undefined, `T${t.number} ${sectionName(t.sectionIndex)}`),
    })),
    jumps: marking.jumps.map((j) => ({
      number: j.number,
      name: sectionName(j.sectionIndex),
      kindLabel: presetLabel(j.sectionIndex),
      points: j.points.map((p) => row(p, undefined, `J${j.number} ${sectionName(j.sectionIndex)}`)),
    })),
    stations: marking.stations.flatMap((st) => [row(st.centre), row(st.left), row(st.right)]),
    earth: {
      rows: earth.jumps.map((j) => ({
        number: j.number,
        name: sectionName(j.sectionIndex),
        kindLabel: presetLabel(j.sectionIndex),
        length: j.length,
        maxHeight: j.maxHeight,
        section: j.fillSection,
        fill: j.fill,
        cut: j.cut,
        fillLoads: j.fillLoads,
        cutLoads: j.cutLoads,
      })),
      fill: earth.fill,
      cut: earth.cut,
      fillLoads: earth.fillLoads,
      cutLoads: earth.cutLoads,
      truck: earth.truckLoad,
      width: earth.width,
      sideSlope: earth.sideSlope * DEG,
    },
    plan: planFigure(doc),
  };
}

/** Every stake of the sheet in the order the CSV lists them. */
export function allStakes(sheet: BuildSheet): StakeRow[] {
  return [
    ...sheet.datums,
    ...sheet.turns.map((t) => t.centre),
    ...sheet.jumps.flatMap((j) => j.points),
    ...sheet.stations,
  ];
}

type Pts = [number, number][];

/** The plan drawn on the sheets: centre line, both edges and the site boundary, m (1 cm). */
function planFigure(doc: LayoutDocument) {
  const { line } = layoutGeometry(doc, 0.5);
  const edges = trackEdges(line, doc.trackWidth);
  const r = (v: number) => Math.round(v * 100) / 100;
  const poly = (xs: Float64Array, ys: Float64Array): Pts => Array.from(xs, (x, i) => [r(x), r(ys[i])]);
  return {
    centre: poly(line.x, line.y),
    left: poly(edges.leftX, edges.leftY),
    right: poly(edges.rightX, edges.rightY),
    boundary: (doc.siteBoundary ?? null) as Pts | null,
  };
}
