"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { sendJson } from "@/lib/client/fetch-json";

/** Confirm, then DELETE one record of a job; a full-size button (44 px) for the bench record's cards. */
export function RemoveButton({ url, confirm, label }: { url: string; confirm: string; label: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <Button
        type="button"
        variant="destructive"
        aria-label={label}
        onClick={async () => {
          if (!window.confirm(confirm)) return;
          const res = await sendJson(url, undefined, "DELETE");
          if (!res.ok) return setError(res.message);
          router.refresh();
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
