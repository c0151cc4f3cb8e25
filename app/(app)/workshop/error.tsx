"use client";

export default function WorkshopError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div className="flex max-w-xl flex-col gap-4 py-10">
      <h1 className="text-title font-bold">The workshop page did not load</h1>
      <p className="text-muted">Members and settings are untouched. Try again; if it keeps happening, restart Glowbench.</p>
      <button type="button" onClick={reset} className="w-fit rounded-chip bg-glow px-4 py-2 font-bold text-glow-ink">
        Try again
      </button>
    </div>
  );
}
