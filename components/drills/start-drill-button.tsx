"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { useAction } from "@/components/ui/use-submit";

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
  // Set once the new drill opens, so the button stays busy while the page changes.
  const [leaving, setLeaving] = useState(false);
  const { run, error, pending } = useAction<{ id: number }>({
    url: "/api/drills",
    refresh: false,
    onDone: (data) => {
      setLeaving(true);
      router.push(`/drills/${data.id}`);
    },
  });
  const busy = pending || leaving;
  const start = async () => {
    await run(body);
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
