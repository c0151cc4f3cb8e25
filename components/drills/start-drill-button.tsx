"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { sendJson } from "@/lib/client/fetch-json";

/** Makes a fresh drill (of a kind, or from a saved calculation) on the server and opens it. */
export function StartDrillButton({
  body,
  label,
  ariaLabel,
  variant = "secondary",
  className = "",
}: {
  body: { kind: string } | { slug: string } | { calculationId: number };
  label: string;
  /** The button's name when its label alone would repeat down a list ("Start a drill: cathode resistor"). */
  ariaLabel?: string;
  variant?: "primary" | "secondary";
  className?: string;
}) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const start = async () => {
    setBusy(true);
    setError(null);
    const res = await sendJson<{ id: number }>("/api/drills", body);
    if (!res.ok) {
      setError(res.message);
      setBusy(false);
      return;
    }
    router.push(`/drills/${res.data.id}`);
  };
  return (
    <span className={`inline-flex flex-col gap-1 ${className}`}>
      <Button type="button" variant={variant} onClick={start} disabled={busy} aria-label={ariaLabel}>
        {busy ? "Making one…" : label}
      </Button>
      {error ? (
        <span role="alert" className="text-note font-bold text-flag">
          {error}
        </span>
      ) : null}
    </span>
  );
}
