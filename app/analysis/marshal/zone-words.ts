/**
 * A zone's contents in words and as a score (docs/decisions/0701): where a car that leaves the
 * track ends up (other track, beside or at a marshal point, past the site boundary).
 */
import type { MarshalZone } from "./marshal-types";
import { listWords } from "./words";

/**
 * Where a car that leaves the track ends up, in words, from a zone's contents: "on the track
 * after T3 beside M4", "on the flat past the site boundary".
 * @param track how other track is met ("on the track", "across the track").
 * @param flat the words when no other track is met ("on the flat"; may be empty).
 */
export function zonePlaceWords(zone: MarshalZone, track: string, flat: string): string {
  const c = zone.contents;
  const places = [...new Set(c.crosses.map((x) => x.place))].slice(0, 2);
  const parts = [places.length ? `${track} ${listWords(places)}` : flat];
  if (c.marshalPoints.length)
    parts.push(`where ${listWords(c.marshalPoints)} ${c.marshalPoints.length > 1 ? "stand" : "stands"}`);
  else if (c.besidePoints.length) parts.push(`beside ${listWords(c.besidePoints)}`);
  if (c.leavesSite)
    parts.push(parts.length > 1 || places.length ? "and past the site boundary" : "past the site boundary");
  return parts.filter((p) => p !== "").join(" ");
}

/** Score of a zone's contents: 1, +2 with other track in it, +1 with a marshal point, +1 past the site boundary. */
export function zoneScore(zone: MarshalZone): number {
  const c = zone.contents;
  return Math.min(
    5,
    1 + (c.crosses.length ? 2 : 0) + (c.marshalPoints.length ? 1 : 0) + (c.leavesSite ? 1 : 0),
  );
}
