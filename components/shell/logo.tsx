/** Glowbench's mark: a valve envelope with a lit filament. Our own drawing. */
export function LogoMark({ className = "h-8 w-8" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <path d="M9 27V12a7 7 0 0 1 14 0v15" fill="none" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round" />
      <path d="M7 27h18" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round" />
      <path d="M13 23v-7l3 3 3-3v7" fill="none" className="stroke-glow" strokeWidth="2.2" strokeLinejoin="round" strokeLinecap="round" />
      <circle cx="16" cy="12" r="2" className="fill-glow" />
    </svg>
  );
}

export function Wordmark() {
  return (
    <span className="flex items-center gap-2 text-ink">
      <LogoMark />
      <span className="text-lead font-bold tracking-tight">Glowbench</span>
    </span>
  );
}
