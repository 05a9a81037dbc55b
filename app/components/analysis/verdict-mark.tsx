/**
 * The verdict's mark: a shape for each verdict (triangle: set up in the air; circle: take it
 * straight; cross: cannot clear), so the plan and the tables never rely on colour alone.
 */
import { PLAN } from "~/components/editor/colours";
import type { VerdictKind } from "./format";

/** The shape's path centred on (0, 0) with a radius of about 1. */
export function verdictPath(kind: VerdictKind): string {
  switch (kind) {
    case "set-up":
      return "M 0 -1.15 L 1.05 0.75 L -1.05 0.75 Z";
    case "straight":
      return "M 1 0 A 1 1 0 1 1 -1 0 A 1 1 0 1 1 1 0 Z";
    case "cannot-clear":
      return "M -0.9 -0.6 L -0.6 -0.9 L 0 -0.3 L 0.6 -0.9 L 0.9 -0.6 L 0.3 0 L 0.9 0.6 L 0.6 0.9 L 0 0.3 L -0.6 0.9 L -0.9 0.6 L -0.3 0 Z";
  }
}

export const VERDICT_COLOUR: Record<VerdictKind, string> = PLAN.verdict;

/** The mark as a small inline icon beside text (hidden from screen readers: the text says it). */
export function VerdictIcon({ kind, size = 14 }: { kind: VerdictKind; size?: number }) {
  return (
    <svg
      viewBox="-1.3 -1.3 2.6 2.6"
      width={size}
      height={size}
      aria-hidden="true"
      className="inline-block shrink-0 align-[-2px]"
    >
      <path d={verdictPath(kind)} fill={VERDICT_COLOUR[kind]} stroke="white" strokeWidth={0.15} />
    </svg>
  );
}
