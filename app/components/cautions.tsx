/**
 * The standard safety cautions Loftline shows wherever its work can hurt someone: the landing page,
 * jump pages, the corner-risk sheet and the marshal plan. The plain-text lines are exported too, so
 * a PDF or an e-mail can carry exactly the same words.
 */

export const CAUTIONS_TITLE = "Safety around the track";

/** One caution per line, in plain words (also used by printable and PDF outputs). */
export const SAFETY_CAUTIONS = [
  "RC cars reach 15 to 20 m/s (about 55 to 70 km/h) and leave the track off jumps. Marshals get hit.",
  "Marshals stand out of the overshoot zone beyond landings and away from the outside of fast turns, stay low and face the traffic.",
  "Wear closed shoes, eye protection and hi-vis at the track side.",
  "Loftline's analysis is an estimate, not a safety certification.",
  "Your club's sanctioning body's current rulebook, local regulations and the site's own risk assessment decide.",
] as const;

/** The one short line the compact block shows before it is opened. */
export const CAUTIONS_LINE =
  "Cars leave the track off jumps: marshals stand clear of landings; these numbers are estimates.";

type Props = {
  /**
   * One short line that opens to the full list (a details element: it prints open), for reader
   * pages where the cautions must not push the content down.
   */
  compact?: boolean;
  /** Heading level of the title, to fit the page outline. */
  headingLevel?: 2 | 3;
  className?: string;
};

/** A reusable block of the standard safety cautions. Prints as shown (no no-print class). */
export function Cautions({ compact = false, headingLevel = 2, className = "" }: Props) {
  const Heading = headingLevel === 2 ? "h2" : "h3";
  const headingId = `cautions-title-${headingLevel}`;
  const list = (
    <ul className={`mt-2 list-disc space-y-1 pl-5 ${compact ? "" : "text-ink-700"}`}>
      {SAFETY_CAUTIONS.map((line) => (
        <li key={line}>{line}</li>
      ))}
    </ul>
  );
  if (compact)
    return (
      <aside
        aria-labelledby={headingId}
        className={`rounded-md border border-clay-500/40 bg-clay-100/60 px-3 py-1.5 text-sm text-ink-900 ${className}`}
      >
        <details>
          <summary className="cursor-pointer list-none [&::-webkit-details-marker]:hidden">
            <Heading id={headingId} className="inline font-semibold">
              <WarningMark />
              {CAUTIONS_TITLE}
            </Heading>
            <span className="text-ink-700">: {CAUTIONS_LINE} </span>
            <span className="text-pine-700 underline print:hidden">Read all</span>
          </summary>
          {list}
        </details>
      </aside>
    );
  return (
    <aside
      aria-labelledby={headingId}
      className={`rounded-lg border border-clay-500/40 bg-clay-100/60 p-5 text-ink-900 ${className}`}
    >
      <Heading id={headingId} className="flex items-center gap-2 text-lg font-semibold">
        <WarningMark />
        {CAUTIONS_TITLE}
      </Heading>
      {list}
    </aside>
  );
}

/** A small triangle mark; the heading text carries the meaning, so it is hidden from readers. */
function WarningMark() {
  return (
    <svg viewBox="0 0 20 20" className="mr-1.5 inline-block h-4 w-4 shrink-0 align-[-3px]" aria-hidden="true">
      <path d="M10 2 L19 18 H1 Z" fill="var(--color-clay-500)" />
      <path d="M10 7.5 V12.5" stroke="white" strokeWidth="2" strokeLinecap="round" />
      <circle cx="10" cy="15.2" r="1.1" fill="white" />
    </svg>
  );
}
