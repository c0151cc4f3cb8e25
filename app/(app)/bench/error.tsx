"use client";

import Link from "next/link";

export default function BenchError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div className="mx-auto flex min-h-[50vh] max-w-xl flex-col justify-center gap-4">
      <h1 className="text-title font-bold">This calculator tripped</h1>
      <p className="text-muted">Nothing you saved is affected. Try again, or go back to the Bench and open the calculator afresh.</p>
      <div className="flex gap-4">
        <button type="button" onClick={reset} className="rounded-chip bg-glow px-4 py-2 font-bold text-glow-ink min-h-11">
          Try again
        </button>
        <Link href="/bench" className="inline-flex min-h-11 items-center font-bold text-signal underline underline-offset-4">
          Back to the Bench
        </Link>
      </div>
    </div>
  );
}
