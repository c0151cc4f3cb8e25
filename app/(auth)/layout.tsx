import Link from "next/link";
import { Wordmark } from "@/components/shell/logo";

// Rendered per request so each page carries the nonce of its Content-Security-Policy (proxy.ts);
// a page prerendered at build time has no nonce, its scripts are blocked and forms never hydrate.
export const dynamic = "force-dynamic";

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="grid min-h-screen lg:grid-cols-[1.1fr_1fr]">
      <aside className="relative hidden overflow-hidden bg-ink p-12 text-paper lg:flex lg:flex-col lg:justify-between">
        <Link href="/" className="[&_*]:text-paper" aria-label="Glowbench home">
          <Wordmark />
        </Link>
        <div className="max-w-md">
          <p className="text-display font-bold leading-tight">Every set on the bench, every number with its working.</p>
          <p className="mt-4 text-lead text-paper/80">
            Bias points, bleeders, ripple and heater strings worked out step by step, and a job record your whole
            workshop shares: parts, readings, photos and the bench log.
          </p>
        </div>
        <p className="text-note text-paper/70">
          Tube-era sets run at lethal voltages. Glowbench helps you think; it does not replace safe practice or local codes.
        </p>
        <div aria-hidden="true" className="pointer-events-none absolute -right-24 top-1/3 h-96 w-96 rounded-full bg-glow/30 blur-3xl" />
      </aside>
      <main className="flex items-center justify-center p-6">
        <div className="w-full max-w-md">
          <div className="mb-8 lg:hidden">
            <Wordmark />
          </div>
          {children}
        </div>
      </main>
    </div>
  );
}
