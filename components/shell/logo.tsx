import { FILAMENT } from "@/lib/theme/palette";

/**
 * Glowbench's mark: a glass envelope with its exhaust tip, a lit plate inside and a bakelite base
 * with pins, so it reads as a glowing tube from 16 px up. Our own drawing (app/icon.svg is the same
 * mark on a dark tile). Outlines follow the text colour, so it works on day and night themes.
 */
export function LogoMark({ className = "h-8 w-8" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <circle cx="16" cy="16.5" r="10" fill={FILAMENT} opacity="0.16" />
      <circle cx="16" cy="16.5" r="6.5" fill={FILAMENT} opacity="0.28" />
      <path d="M16 3.2v2.6" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
      <path d="M9.6 24.5V12.4a6.4 6.4 0 0 1 12.8 0v12.1" fill="currentColor" fillOpacity="0.06" stroke="currentColor" strokeWidth="2" strokeLinejoin="round" />
      <rect x="13.4" y="11.5" width="5.2" height="9.5" rx="1.2" fill={FILAMENT} />
      <path d="M16 13.5v5.5" stroke="#fff3d6" strokeWidth="1.4" strokeLinecap="round" />
      <rect x="8.2" y="23.6" width="15.6" height="3.6" rx="1.2" fill="currentColor" />
      <path d="M12.5 27.2v1.8M16 27.2v1.8M19.5 27.2v1.8" stroke="currentColor" strokeWidth="1.3" strokeLinecap="round" />
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
