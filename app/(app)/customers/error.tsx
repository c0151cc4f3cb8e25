"use client";

export default function CustomersError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div className="flex flex-col gap-4 py-10">
      <h1 className="text-title font-bold">The customer list did not load</h1>
      <p className="max-w-prose text-muted">Nothing you saved is lost. Try again; if it keeps happening, tell your workshop owner.</p>
      <button type="button" onClick={reset} className="min-h-11 w-fit rounded-chip bg-glow px-4 py-2 font-bold text-glow-ink">
        Try again
      </button>
    </div>
  );
}
