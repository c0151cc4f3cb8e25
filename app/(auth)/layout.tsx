import { Link } from "@/components/ui/link";
import { Wordmark } from "@/components/shell/logo";

// Rendered per request so each page carries the nonce of its Content-Security-Policy (proxy.ts);
// a page prerendered at build time has no nonce, its scripts are blocked and forms never hydrate.
export const dynamic = "force-dynamic";

// The page lies on perforated board, the way a set's chassis sits on the bench; one card on it.
const perfboard = {
  backgroundImage: "radial-gradient(rgb(var(--gb-rule)) 1.3px, transparent 1.6px)",
  backgroundSize: "20px 20px",
  backgroundPosition: "10px 10px",
};

/** A lightning stroke of our own drawing, for the high-voltage note. */
function Bolt() {
  return (
    <svg viewBox="0 0 20 20" className="mt-0.5 h-5 w-5 shrink-0" aria-hidden="true">
      <path d="M11.5 1.5 4.5 11h4.8l-1.3 7.5L15.5 9h-4.8z" fill="currentColor" />
    </svg>
  );
}

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col items-center px-4 py-8 sm:py-14" style={perfboard}>
      <Link href="/" aria-label="Glowbench home" className="rounded-chip bg-paper px-3 py-1.5">
        <Wordmark />
      </Link>
      <div className="mt-6 w-full max-w-md overflow-hidden rounded-card border border-rule bg-panel shadow-card">
        <main className="p-6 sm:p-8">{children}</main>
        <aside aria-label="High voltage" className="flex gap-3 border-t border-rule bg-sunk px-6 py-4 text-note text-muted sm:px-8">
          <Bolt />
          <p>
            <strong className="text-ink">Tube sets hold lethal voltages,</strong> in filter capacitors even when unplugged. Glowbench works out the figures;
            discharging, isolating and your local codes stay with you.
          </p>
        </aside>
      </div>
    </div>
  );
}
