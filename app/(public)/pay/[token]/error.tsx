"use client";

export default function PayError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-title font-bold">The invoice could not be shown</h1>
      <p className="text-muted">Nothing has been charged. Try again in a moment, or reply to the workshop&apos;s e-mail.</p>
      <button type="button" onClick={reset} className="w-fit rounded-chip bg-glow px-4 py-2 font-bold text-glow-ink">
        Try again
      </button>
    </div>
  );
}
