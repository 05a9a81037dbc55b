/**
 * The car and skill a reader looks at a layout with (docs/decisions/0803-car-and-skill-choice.md):
 * `car` in the address is one of the layout's class ids or `profile:<id>` of the reader's own car
 * profile (`class` is still read, from older links); `skill` a skill level. What was asked and
 * understood is remembered for the member (table reader_choices), so the layout, jump and plan
 * pages open with the last choice when their address names none.
 */
import { eq } from "drizzle-orm";
import { carPreset, SKILL_LEVELS, wordList, type CarParams, type SkillLevel } from "~/analysis";
import { getDb } from "~/db/client.server";
import { parseClassId } from "~/layouts/analysis.server";
import { readerChoices } from "~/db/schema";
import { getOwnProfile, listProfiles, ownCar } from "./profiles.server";

export const PROFILE_PREFIX = "profile:";

export type CarOption = { value: string; label: string; own: boolean };

export type OwnCar = { profileId: string; classId: string; car: CarParams };

export type ReaderChoice = {
  /** The picker's value: a class id or "profile:<id>". */
  car: string;
  /** The class id in the analysis: the class itself, or the own car's "own-<hash>". */
  classId: string;
  label: string;
  skill: SkillLevel;
  /** The own car when a profile is chosen. */
  own: OwnCar | null;
  /** What the picker offers: the layout's classes, then the reader's own cars. */
  options: CarOption[];
  /** Plain-words notes about parameters that were not understood (the page answers 400). */
  problems: string[];
};

const classLabel = (id: string) => carPreset(id)?.label ?? id;

/** The reader's own profile named by "profile:<id>" as the engine's car, or null. */
export async function ownCarFor(userId: string, value: string): Promise<OwnCar | null> {
  if (!value.startsWith(PROFILE_PREFIX)) return null;
  const id = value.slice(PROFILE_PREFIX.length);
  if (!/^[0-9a-f-]{36}$/.test(id)) return null;
  const stored = await getOwnProfile(userId, id);
  return stored ? { profileId: id, ...ownCar(stored) } : null;
}

/** The member's last chosen car ("<class id>" or "profile:<id>"), or null; read only. */
export async function rememberedCar(userId: string): Promise<string | null> {
  const db = await getDb();
  const [stored] = await db
    .select({ car: readerChoices.car })
    .from(readerChoices)
    .where(eq(readerChoices.userId, userId));
  return stored?.car ?? null;
}

/**
 * Reads `car` (or `class`) and `skill` from the query, falls back to the member's last choice and
 * then to the layout's first class and "club", and remembers a choice that was asked and understood.
 */
export async function readerChoice(
  userId: string,
  query: URLSearchParams,
  layoutClasses: readonly string[],
): Promise<ReaderChoice> {
  const db = await getDb();
  const [stored] = await db
    .select({ car: readerChoices.car, skill: readerChoices.skill })
    .from(readerChoices)
    .where(eq(readerChoices.userId, userId));
  const profiles = await listProfiles(userId);
  const options: CarOption[] = [
    ...layoutClasses.map((id) => ({ value: id, label: classLabel(id), own: false })),
    ...profiles.map((p) => ({ value: `${PROFILE_PREFIX}${p.id}`, label: p.label, own: true })),
  ];
  const problems: string[] = [];
  const resolve = async (value: string | null | undefined) => {
    if (!value) return null;
    if (layoutClasses.includes(value))
      return { car: value, classId: value, label: classLabel(value), own: null };
    const own = await ownCarFor(userId, value);
    return own ? { car: value, classId: own.classId, label: own.car.label, own } : null;
  };
  const fallback = {
    car: layoutClasses[0],
    classId: layoutClasses[0],
    label: classLabel(layoutClasses[0]),
    own: null,
  };

  const param = query.get("car") !== null ? "car" : "class";
  const askedCar = query.get(param) || null;
  const askedResolved = await resolve(askedCar);
  const car = askedResolved ?? (await resolve(stored?.car)) ?? fallback;
  if (askedCar && !askedResolved) {
    const what =
      param === "class"
        ? "one of this layout's car classes"
        : "one of this layout's car classes or your car profiles";
    problems.push(`${param}: "${askedCar.slice(0, 40)}" is not ${what}; showing ${car.label}.`);
  }

  const isSkill = (v: string | null | undefined): v is SkillLevel =>
    typeof v === "string" && (SKILL_LEVELS as readonly string[]).includes(v);
  const askedSkill = query.get("skill") || null;
  const skill: SkillLevel = isSkill(askedSkill) ? askedSkill : isSkill(stored?.skill) ? stored.skill : "club";
  if (askedSkill && !isSkill(askedSkill))
    problems.push(`skill: must be ${wordList(SKILL_LEVELS)}; showing ${skill}.`);

  const remember = {
    car: askedResolved ? askedResolved.car : (stored?.car ?? null),
    skill: isSkill(askedSkill) ? askedSkill : (stored?.skill ?? null),
  };
  if (remember.car !== (stored?.car ?? null) || remember.skill !== (stored?.skill ?? null))
    await db
      .insert(readerChoices)
      .values({ userId, ...remember })
      .onConflictDoUpdate({ target: readerChoices.userId, set: { ...remember, updatedAt: new Date() } });

  return { ...car, skill, options, problems };
}

/**
 * A car named in an API request (`car` or `class` in a query, `car` or `classId` in a body): a
 * class id known to the engine, or "profile:<id>" of the caller's own profile.
 * @throws AnalysisInputError (400) naming `field` for an unknown class; a JSON 404 Response for a
 *   profile that is not the caller's.
 */
export async function carParam(
  userId: string,
  value: unknown,
  field: string,
): Promise<{ classId?: string; own: OwnCar | null }> {
  if (typeof value === "string" && value.startsWith(PROFILE_PREFIX)) {
    const own = await ownCarFor(userId, value);
    if (!own)
      throw Response.json(
        {
          error: "No such car profile of yours.",
          issues: [{ path: field, message: "is not one of your car profiles" }],
        },
        { status: 404 },
      );
    return { classId: own.classId, own };
  }
  return { classId: parseClassId(value, field), own: null };
}

/** Only the skill level (pages without a car, like the compare page): asked, else remembered, else "club". */
export async function readerSkill(userId: string, query: URLSearchParams): Promise<SkillLevel> {
  const asked = query.get("skill");
  const db = await getDb();
  if (asked && (SKILL_LEVELS as readonly string[]).includes(asked)) {
    await db
      .insert(readerChoices)
      .values({ userId, skill: asked })
      .onConflictDoUpdate({ target: readerChoices.userId, set: { skill: asked, updatedAt: new Date() } });
    return asked as SkillLevel;
  }
  const [stored] = await db
    .select({ skill: readerChoices.skill })
    .from(readerChoices)
    .where(eq(readerChoices.userId, userId));
  return stored?.skill && (SKILL_LEVELS as readonly string[]).includes(stored.skill)
    ? (stored.skill as SkillLevel)
    : "club";
}
