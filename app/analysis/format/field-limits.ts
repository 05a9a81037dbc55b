/**
 * The one set of limits for every field a person types or drags: the layout file's schema, the
 * new-layout and settings forms, the club's rule values, the editor's fields and handles and
 * "Close the loop" all read them from here (docs/decisions/0512-one-set-of-field-limits.md).
 */

/** A number's allowed range and its unit as written after it ("m", "deg", "" for none). */
export interface FieldLimit {
  readonly min: number;
  readonly max: number;
  readonly unit: string;
}

const limit = (min: number, max: number, unit: string): FieldLimit => ({ min, max, unit });

export const FIELD_LIMITS = {
  /** Track width between the edges, m. */
  trackWidth: limit(1, 10, "m"),
  /** A straight's length along the centre line, m. */
  straightLength: limit(0.5, 300, "m"),
  /** A turn's centre-line radius, m. */
  turnRadius: limit(1, 300, "m"),
  /** A turn's angle, degrees. */
  turnAngle: limit(1, 360, "deg"),
  /** A position on the plan, m. */
  position: limit(-10000, 10000, "m"),
  /** The start heading, degrees. */
  headingDeg: limit(-360, 360, "deg"),
  /** The drivers' eye height above the ground at the stand, m. */
  eyeHeight: limit(0.5, 15, "m"),
  /** Height of a lip, a landing crest or a deck, m. */
  jumpHeight: limit(0.05, 2, "m"),
  /** Face and landing angles of a jump, degrees. */
  jumpAngle: limit(5, 60, "deg"),
  tableLength: limit(0.5, 15, "m"),
  /** Lip to landing crest, m. */
  gap: limit(1, 15, "m"),
  deckLength: limit(0.5, 10, "m"),
  whoopsCount: limit(2, 30, ""),
  bumpHeight: limit(0.03, 0.5, "m"),
  /** Crest to crest of whoops, m. */
  spacing: limit(0.4, 3, "m"),
  /** A free profile point: distance along the section and height, m. */
  profileDistance: limit(0, 100, "m"),
  profileHeight: limit(-2, 3, "m"),
  /** A site photo's scale, m per pixel. */
  metresPerPixel: limit(0.0001, 10, "m per pixel"),
  rotationDeg: limit(-360, 360, "deg"),
  opacity: limit(0, 1, ""),
} as const satisfies Record<string, FieldLimit>;

/** How many car classes a layout is analysed for. */
export const CAR_CLASS_COUNT = { min: 1, max: 10 } as const;

/**
 * Why a value is refused by its limit, as the end of a sentence ("must be at least 1 m"), or null
 * when it is inside.
 */
export function limitProblem(value: number, l: FieldLimit): string | null {
  const u = l.unit === "" ? "" : ` ${l.unit}`;
  if (!Number.isFinite(value)) return `must be a number${u ? ` (${l.unit})` : ""}`;
  if (value < l.min) return `must be at least ${l.min}${u}`;
  if (value > l.max) return `must be at most ${l.max}${u}`;
  return null;
}

/** "1 to 10 m": the range in words, for hints beside a field. */
export function limitRange(l: FieldLimit): string {
  return `${l.min} to ${l.max}${l.unit === "" ? "" : ` ${l.unit}`}`;
}
