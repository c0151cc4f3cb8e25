"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { sendJson } from "@/lib/client/fetch-json";

/** A small confirm-then-DELETE button for one record of a job. */
export function DeleteButton({ url, confirm, label }: { url: string; confirm: string; label: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  return (
    <span>
      <button
        type="button"
        aria-label={label}
        className="min-h-9 rounded-chip px-2 text-note font-bold text-flag hover:bg-flag-bg"
        onClick={async () => {
          if (!window.confirm(confirm)) return;
          const res = await sendJson(url, undefined, "DELETE");
          if (!res.ok) return setError(res.message);
          router.refresh();
        }}
      >
        Remove
      </button>
      {error ? <span role="alert" className="ml-2 text-note font-bold text-flag">{error}</span> : null}
    </span>
  );
}
