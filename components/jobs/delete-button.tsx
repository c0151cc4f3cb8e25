"use client";

import { useAction } from "@/components/ui/use-submit";

/** A small confirm-then-DELETE button for one record of a job. */
export function DeleteButton({ url, confirm, label }: { url: string; confirm: string; label: string }) {
  const { run, error } = useAction({ url, method: "DELETE" });
  return (
    <span>
      <button
        type="button"
        aria-label={label}
        className="min-h-9 rounded-chip px-2 text-note font-bold text-flag hover:bg-flag-bg"
        onClick={() => {
          if (window.confirm(confirm)) void run();
        }}
      >
        Remove
      </button>
      {error ? (
        <span role="alert" className="ml-2 text-note font-bold text-flag">
          {error}
        </span>
      ) : null}
    </span>
  );
}
