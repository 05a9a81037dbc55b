/**
 * `loftline analyse FILE [--class ID] [--car CAR_FILE] [--skill novice|club|expert]`: the whole analysis of a
 * layout file (the product's own format, docs/layout-format.md) as JSON: lap length and time,
 * closure, rule checks, and per car class and jump: takeoff speed, speed window, airtime,
 * landing, equivalent fall height, the turn it lands into and the distance to it, the verdict
 * with its reason and numbers, and for a whoops row the ways through it. `--class` may be given
 * more than once (default: the layout's own classes); `--car` names a car profile file (the profile
 * page's download, format in app/analysis/format/car-schema.ts) analysed in place of a class, as
 * "own-1", "own-2", ...; `--skill` picks the level of each jump's `verdict` (default club; every
 * level is in `verdicts`). Bad input names the field on stderr, exit code 2, nothing on stdout.
 */
import {
  analyseLayout,
  quotedList,
  SKILL_LEVELS,
  type JumpAnalysis,
  type LayoutAnalysis,
  type SkillLevel,
  CAR_PRESET_IDS,
  carPreset,
  parseLayoutDocument,
  carFromProfile,
  parseCarProfile,
  type CarParams,
} from "~/analysis";
import { InputError, parseJson, readInput, type CliCommand } from "./io";

const SKILL_OPTION = `--skill ${SKILL_LEVELS.join("|")}`;

export interface AnalyseArgs {
  classIds?: string[];
  /** Own cars from `--car` files, by their id in the output ("own-1", ...). */
  cars?: Record<string, CarParams>;
  skill?: SkillLevel;
}

/** Reads a `--car` file: a car profile; a bad one names the file and the field. */
function readCarFile(path: string, id: string): CarParams {
  let json: unknown;
  try {
    json = parseJson(readInput(path));
  } catch (error) {
    throw new InputError(`--car ${path}`, (error as InputError).message.replace(/^FILE: /, ""));
  }
  const parsed = parseCarProfile(json);
  if (!parsed.ok) {
    const [first] = parsed.issues;
    throw new InputError(`--car ${path}: ${first.path}`, first.message);
  }
  return carFromProfile(parsed.profile, id);
}

/** Reads the options after FILE; unknown options and missing values are InputErrors. */
export function parseAnalyseArgs(args: readonly string[]): AnalyseArgs {
  const out: AnalyseArgs = {};
  for (let i = 0; i < args.length; i++) {
    const [flag, inline] =
      args[i].startsWith("--") && args[i].includes("=") ? args[i].split(/=(.*)/s) : [args[i], undefined];
    const value = inline ?? args[++i];
    if (flag === "--class") {
      if (!value) throw new InputError("--class", "needs a car class id");
      if (!carPreset(value))
        throw new InputError("--class", `unknown car class "${value}" (known: ${CAR_PRESET_IDS.join(", ")})`);
      (out.classIds ??= []).push(value);
    } else if (flag === "--car") {
      if (!value) throw new InputError("--car", "needs a car profile file");
      const id = `own-${Object.keys(out.cars ?? {}).length + 1}`;
      (out.cars ??= {})[id] = readCarFile(value, id);
      (out.classIds ??= []).push(id);
    } else if (flag === "--skill") {
      if (!value) throw new InputError("--skill", `needs a level: ${quotedList(SKILL_LEVELS)}`);
      if (!SKILL_LEVELS.includes(value as SkillLevel))
        throw new InputError("--skill", `must be ${quotedList(SKILL_LEVELS)} (got "${value}")`);
      out.skill = value as SkillLevel;
    } else {
      throw new InputError(flag, `unknown option (known: --class ID, --car CAR_FILE, ${SKILL_OPTION})`);
    }
  }
  return out;
}

function jumpOutput(j: JumpAnalysis) {
  return {
    id: j.sectionId,
    name: j.name,
    preset: j.preset,
    takeoffSpeed: j.takeoffSpeed,
    approachMaxSpeed: j.approachMaxSpeed,
    speedWindow: j.window
      ? { min: j.window.min, max: j.window.max, maxIsSearchLimit: j.window.maxIsSearchLimit }
      : null,
    sweetSpotSpeed: j.sweetSpotSpeed,
    cannotClear: j.cannotClear,
    flownOverBy: j.flownOverBy,
    airtime: j.airtime,
    apex: j.apex,
    landing: j.landing,
    equivalentFallHeight: j.equivalentFallHeight,
    turn: j.turn,
    distanceToTurn: j.turn ? j.turn.distance : null,
    nextTurnDistance: j.nextTurnDistance,
    verdict: j.verdict,
    verdicts: j.verdicts,
    plan: j.plan,
    whoops: j.whoops,
  };
}

/** The command's JSON: the analysis without the drawing data (centre line and speeds along it). */
export function analyseOutput(a: LayoutAnalysis) {
  return {
    name: a.name,
    lapLength: a.lapLength,
    closure: a.closure,
    trackWidth: a.trackWidth,
    skill: a.skill,
    rules: a.rules,
    laneConflicts: a.laneConflicts,
    outsideBoundary: a.outsideBoundary,
    farthestFromStand: a.farthestFromStand,
    hiddenFromStand: a.hiddenFromStand,
    startStraight: a.startStraight,
    classes: a.classes.map((c) => ({
      classId: c.classId,
      label: c.label,
      lapTime: c.lapTime,
      speed: c.speed,
      tightTurns: c.tightTurns,
      cannotClear: c.cannotClear,
      jumps: c.jumps.map(jumpOutput),
    })),
    note: a.note,
  };
}

/** The `analyse` command with the options given after FILE (`process.argv.slice(4)` from the registry). */
export function analyseCommand(args: readonly string[]): CliCommand {
  return {
    summary: `analyse FILE [--class ID] [--car CAR_FILE] [${SKILL_OPTION}]   whole analysis of a layout file`,
    run(input) {
      const options = parseAnalyseArgs(args);
      const parsed = parseLayoutDocument(input);
      if (!parsed.ok) {
        const [first, ...rest] = parsed.issues;
        const more = rest.map((i) => `\n  ${i.path}: ${i.message}`).join("");
        throw new InputError(first.path, `${first.message}${more}`);
      }
      const doc = parsed.document;
      doc.carClasses.forEach((id, i) => {
        if (!options.classIds && !carPreset(id)) {
          throw new InputError(
            `carClasses[${i}]`,
            `unknown car class "${id}" (known: ${CAR_PRESET_IDS.join(", ")}); pick one with --class`,
          );
        }
      });
      return analyseOutput(
        analyseLayout(doc, { classIds: options.classIds, skill: options.skill, cars: options.cars }),
      );
    },
  };
}
