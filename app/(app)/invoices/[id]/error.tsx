"use client";

export default function InvoiceError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-title font-bold">This invoice could not be shown</h1>
      <p className="text-muted">Nothing was changed: an invoice turns paid only when the payment service confirms it. Try again in a moment.</p>
      <button type="button" onClick={reset} className="w-fit rounded-chip bg-glow px-4 py-2 font-bold text-glow-ink">
        Try again
      </button>
    </div>
  );
}
