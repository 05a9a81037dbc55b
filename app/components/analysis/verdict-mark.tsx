/**
 * The verdict's mark on the pages: its shape (app/lib/verdict-marks.ts) in the verdict's colour,
 * and its word beside it, so no reader depends on telling colours apart. The one component every
 * page, table and panel uses; the plan drawings draw the same shapes from VERDICT_MARKS.
 */
import type { VerdictKind } from "~/analysis";
import { PLAN } from "~/components/editor/colours";
import { VERDICT_MARK_OUTLINE, VERDICT_MARKS } from "~/lib/verdict-marks";

export function VerdictMark({
  kind,
  size = 14,
  showWord = true,
  className = "",
}: {
  kind: VerdictKind;
  /** Size of the shape, px. */
  size?: number;
  /**
   * False only where the caller writes the verdict's word (VERDICT_WORDS) right beside the
   * mark: the shape alone is hidden from screen readers, since the word says it.
   */
  showWord?: boolean;
  className?: string;
}) {
  const mark = VERDICT_MARKS[kind];
  const shape = (
    <svg
      viewBox="-1.3 -1.3 2.6 2.6"
      width={size}
      height={size}
      aria-hidden="true"
      data-shape={mark.shape}
      className={`inline-block shrink-0 align-[-2px] ${showWord ? "" : className}`}
    >
      <path d={mark.path} fill={PLAN.verdict[kind]} stroke="white" strokeWidth={VERDICT_MARK_OUTLINE} />
    </svg>
  );
  if (!showWord) return shape;
  return (
    <span className={`inline-flex items-center gap-1.5 ${className}`} data-verdict={kind}>
      {shape}
      <span>{mark.word}</span>
    </span>
  );
}
