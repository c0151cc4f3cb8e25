"use client";

export default function ErrorPage({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <main className="mx-auto flex min-h-[60vh] max-w-xl flex-col justify-center gap-4 px-6">
      <h1 className="text-title font-bold">Something tripped on our side</h1>
      <p className="text-muted">Your saved records are untouched. Try again; if it keeps happening, tell your workshop owner.</p>
      <button type="button" onClick={reset} className="w-fit rounded-chip bg-glow px-4 py-2 font-bold text-glow-ink">
        Try again
      </button>
    </main>
  );
}
