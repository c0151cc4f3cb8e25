"use client";

import { useState } from "react";
import { buttonClass } from "@/components/ui/button";

/** Copy the page's address (it carries the inputs) and print the calculation sheet. */
export function ShareActions({ onReset }: { onReset: () => void }) {
  const [copied, setCopied] = useState("");
  async function copy() {
    try {
      await navigator.clipboard.writeText(window.location.href);
      setCopied("Link copied: it opens this calculation with your values.");
    } catch {
      setCopied("Copy the address from the address bar: it carries your values.");
    }
  }
  return (
    <div className="gb-no-print flex flex-wrap items-center gap-2">
      <button type="button" className={buttonClass("secondary")} onClick={copy}>
        Copy link
      </button>
      <button type="button" className={buttonClass("secondary")} onClick={() => window.print()}>
        Print sheet
      </button>
      <button type="button" className={buttonClass("quiet")} onClick={onReset}>
        Back to the example
      </button>
      <p role="status" className="text-note text-muted">
        {copied}
      </p>
    </div>
  );
}
