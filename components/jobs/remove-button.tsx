"use client";

import { Button } from "@/components/ui/button";
import { useAction } from "@/components/ui/use-submit";

/** Confirm, then DELETE one record of a job; a full-size button (44 px) for the bench record's cards. */
export function RemoveButton({ url, confirm, label }: { url: string; confirm: string; label: string }) {
  const { run, error } = useAction({ url, method: "DELETE" });
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <Button
        type="button"
        variant="destructive"
        aria-label={label}
        onClick={() => {
          if (window.confirm(confirm)) void run();
        }}
      >
        Remove
      </Button>
      {error ? (
        <span role="alert" className="text-note font-bold text-flag">
          {error}
        </span>
      ) : null}
    </span>
  );
}
