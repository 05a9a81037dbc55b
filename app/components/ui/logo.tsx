/** Loftline's mark: a flight arc leaving a ramp and landing on the next. */
export function LogoMark({ className = "h-7 w-7" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect width="32" height="32" rx="7" fill="var(--color-pine-700)" />
      <path
        d="M3 25 L11 25 L14 20"
        fill="none"
        stroke="var(--color-sand-100)"
        strokeWidth="2.2"
        strokeLinecap="round"
        strokeLinejoin="round"
      />
      <path
        d="M19 20 L22 25 L29 25"
        fill="none"
        stroke="var(--color-sand-100)"
        strokeWidth="2.2"
        strokeLinecap="round"
        strokeLinejoin="round"
      />
      <path
        d="M14 20 Q16.5 5 19.5 19"
        fill="none"
        stroke="var(--color-clay-500)"
        strokeWidth="2.2"
        strokeLinecap="round"
        strokeDasharray="0.1 3.2"
      />
    </svg>
  );
}

export function Wordmark() {
  return (
    <span className="flex items-center gap-2 font-semibold tracking-tight text-ink-900">
      <LogoMark />
      <span className="text-lg">Loftline</span>
    </span>
  );
}
