"use client";

import Link from "next/link";

export default function DrillsError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div className="mx-auto flex min-h-[50vh] max-w-xl flex-col justify-center gap-4">
      <h1 className="text-title font-bold">This drill tripped</h1>
      <p className="text-muted">Your answers so far are kept. Try again, or go back to the drills and start another.</p>
      <div className="flex gap-4">
        <button type="button" onClick={reset} className="min-h-11 rounded-chip bg-glow px-4 py-2 font-bold text-glow-ink">
          Try again
        </button>
        <Link href="/drills" className="inline-flex min-h-11 items-center font-bold text-signal underline underline-offset-4">
          Back to the drills
        </Link>
      </div>
    </div>
  );
}
