/**
 * The landing page's picture: a side view of a tabletop with the car's flight path dashed from the
 * lip to the landing, the overshoot zone beyond the landing and a marshal standing clear of it.
 * Drawn in SVG user units (heights exaggerated); the geometry is computed once below so the flight
 * arc leaves along the face and meets the landing along its slope, as a well-judged jump does.
 */

const GROUND = 210;
const FACE_FOOT = { x: 160, y: GROUND };
const LIP = { x: 230, y: 140 };
const TABLE_END = { x: 410, y: 140 };
const LANDING_FOOT = { x: 490, y: GROUND };
const ZONE = { from: 490, to: 610 };

/** Touchdown one third of the way down the landing (a little past it, for the picture). */
const TOUCH_FRACTION = 0.35;
const TOUCH = {
  x: TABLE_END.x + (LANDING_FOOT.x - TABLE_END.x) * TOUCH_FRACTION,
  y: TABLE_END.y + (LANDING_FOOT.y - TABLE_END.y) * TOUCH_FRACTION,
};

/**
 * Control point of the quadratic Bezier (a parabola) whose start tangent runs up the face and whose
 * end tangent runs down the landing: intersection of the two tangent lines.
 */
function controlPoint() {
  const face = { x: LIP.x - FACE_FOOT.x, y: LIP.y - FACE_FOOT.y };
  const land = { x: LANDING_FOOT.x - TABLE_END.x, y: LANDING_FOOT.y - TABLE_END.y };
  // LIP + a*face = TOUCH - b*land, solved for a by Cramer's rule.
  const det = face.x * -land.y - -land.x * face.y;
  const rx = TOUCH.x - LIP.x;
  const ry = TOUCH.y - LIP.y;
  const a = (rx * -land.y - -land.x * ry) / det;
  return { x: LIP.x + a * face.x, y: LIP.y + a * face.y };
}

const C = controlPoint();

/** Point and tangent angle (degrees, SVG's clockwise-positive) on the flight path at parameter t. */
function onFlight(t: number) {
  const u = 1 - t;
  const x = u * u * LIP.x + 2 * u * t * C.x + t * t * TOUCH.x;
  const y = u * u * LIP.y + 2 * u * t * C.y + t * t * TOUCH.y;
  const dx = 2 * u * (C.x - LIP.x) + 2 * t * (TOUCH.x - C.x);
  const dy = 2 * u * (C.y - LIP.y) + 2 * t * (TOUCH.y - C.y);
  return { x, y, angle: (Math.atan2(dy, dx) * 180) / Math.PI };
}

const f = (n: number) => n.toFixed(1);
const GROUND_PATH = `M 10 ${GROUND} L ${FACE_FOOT.x} ${GROUND} L ${LIP.x} ${LIP.y} L ${TABLE_END.x} ${TABLE_END.y} L ${LANDING_FOOT.x} ${GROUND} L 710 ${GROUND}`;
const FLIGHT_PATH = `M ${LIP.x} ${LIP.y} Q ${f(C.x)} ${f(C.y)} ${f(TOUCH.x)} ${f(TOUCH.y)}`;
const APEX = onFlight(0.45);
/** The car on its way up the face, 60 % of the way to the lip. */
const ON_FACE = {
  x: FACE_FOOT.x + 0.6 * (LIP.x - FACE_FOOT.x),
  y: FACE_FOOT.y + 0.6 * (LIP.y - FACE_FOOT.y),
  angle: (Math.atan2(LIP.y - FACE_FOOT.y, LIP.x - FACE_FOOT.x) * 180) / Math.PI,
};

/** A buggy seen from the side, centred on its centre of mass, 4 px above the path. */
function Car({ x, y, angle, faded = false }: { x: number; y: number; angle: number; faded?: boolean }) {
  return (
    <g
      transform={`translate(${f(x)} ${f(y)}) rotate(${f(angle)}) translate(0 -9)`}
      opacity={faded ? 0.35 : 1}
    >
      <path d="M -17 -2 L -12 -8 L 8 -8 L 16 -3 L 17 2 L -17 2 Z" fill="var(--color-pine-700)" />
      <rect x="-4" y="-12" width="9" height="4" rx="1.5" fill="var(--color-clay-500)" />
      <circle cx="-11" cy="4" r="5.5" fill="var(--color-ink-900)" />
      <circle cx="11" cy="4" r="5.5" fill="var(--color-ink-900)" />
    </g>
  );
}

export function JumpIllustration({ className = "" }: { className?: string }) {
  return (
    <svg
      viewBox="0 50 720 195"
      className={className}
      role="img"
      aria-labelledby="jump-art-title jump-art-desc"
    >
      <title id="jump-art-title">Side view of a tabletop jump</title>
      <desc id="jump-art-desc">
        A car leaves the lip at the top of the face, flies a dashed arc over the table and lands a third of
        the way down the landing. Beyond the landing lies the overshoot zone; a marshal stands clear of it.
      </desc>
      <defs>
        <pattern
          id="jump-art-hatch"
          width="8"
          height="8"
          patternUnits="userSpaceOnUse"
          patternTransform="rotate(45)"
        >
          <rect width="8" height="8" fill="var(--color-clay-100)" />
          <line x1="0" y1="0" x2="0" y2="8" stroke="var(--color-clay-500)" strokeWidth="2" opacity="0.5" />
        </pattern>
      </defs>

      <rect
        x={ZONE.from}
        y={GROUND - 60}
        width={ZONE.to - ZONE.from}
        height="60"
        fill="url(#jump-art-hatch)"
      />
      <path d={`${GROUND_PATH} L 710 240 L 10 240 Z`} fill="var(--color-sand-200)" />
      <path
        d={GROUND_PATH}
        fill="none"
        stroke="var(--color-ink-700)"
        strokeWidth="3"
        strokeLinejoin="round"
      />
      <path
        d={FLIGHT_PATH}
        fill="none"
        stroke="var(--color-clay-500)"
        strokeWidth="3"
        strokeDasharray="2 9"
        strokeLinecap="round"
      />
      <circle
        cx={f(TOUCH.x)}
        cy={f(TOUCH.y)}
        r="5"
        fill="none"
        stroke="var(--color-clay-700)"
        strokeWidth="2"
      />

      <Car {...ON_FACE} faded />
      <Car {...APEX} />

      <Marshal x={665} />

      <g fill="var(--color-ink-500)" fontSize="14" fontFamily="inherit">
        <text x="214" y="200" textAnchor="middle">
          face
        </text>
        <text x={LIP.x + 4} y={LIP.y + 18}>
          lip
        </text>
        <text x="320" y="175" textAnchor="middle">
          table
        </text>
        <text x="430" y="200" textAnchor="middle">
          landing
        </text>
        <text
          x={ZONE.from + (ZONE.to - ZONE.from) / 2}
          y={GROUND - 66}
          textAnchor="middle"
          fill="var(--color-clay-700)"
        >
          overshoot zone
        </text>
        <text x="660" y="130" textAnchor="middle">
          marshal
        </text>
        <text x={f(APEX.x + 36)} y={f(APEX.y - 26)}>
          flight path
        </text>
      </g>
    </svg>
  );
}

/** A marshal crouched low, facing the oncoming traffic (to the left), in a hi-vis vest. */
function Marshal({ x }: { x: number }) {
  return (
    <g transform={`translate(${x} ${GROUND})`} strokeLinecap="round" strokeLinejoin="round">
      <path
        d="M 2 -24 L -10 -14 L -6 0 M 2 -24 L 12 -12 L 10 0"
        fill="none"
        stroke="var(--color-ink-700)"
        strokeWidth="5"
      />
      <path d="M 2 -26 L -6 -46" stroke="var(--color-clay-500)" strokeWidth="12" />
      <path d="M -6 -42 L -14 -26" stroke="var(--color-ink-700)" strokeWidth="4" />
      <circle cx="-11" cy="-57" r="8" fill="var(--color-ink-700)" />
    </g>
  );
}
