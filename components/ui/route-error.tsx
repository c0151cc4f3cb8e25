"use client";

import { Link } from "@/components/ui/link";
import type { ReactNode } from "react";

/** What Next hands a section's error.tsx. */
export type ErrorPageProps = { error: Error & { digest?: string }; reset: () => void };

/**
 * inline: inside a page that keeps its own header (a job's estimate, an invoice, a customer's link);
 * section: a whole section of the app; centred: a tool that tripped, with the way back to its index.
 */
const BOX = {
  inline: "flex flex-col gap-4",
  section: "flex flex-col gap-4 py-10",
  centred: "mx-auto flex min-h-[50vh] max-w-xl flex-col justify-center gap-4",
} as const;

/** A page that threw: what happened, what it left untouched, and Try again (Next's reset). */
export function RouteError({
  title,
  children,
  reset,
  layout = "inline",
  back,
}: {
  title: string;
  children: ReactNode;
  reset: () => void;
  layout?: keyof typeof BOX;
  back?: { href: string; label: string };
}) {
  const tryAgain = (
    <button type="button" onClick={reset} className="min-h-11 w-fit rounded-chip bg-glow px-4 py-2 font-bold text-glow-ink">
      Try again
    </button>
  );
  return (
    <div className={BOX[layout]}>
      <h1 className="text-title font-bold">{title}</h1>
      <p className={layout === "section" ? "max-w-prose text-muted" : "text-muted"}>{children}</p>
      {back ? (
        <div className="flex gap-4">
          {tryAgain}
          <Link href={back.href} className="inline-flex min-h-11 items-center font-bold text-signal underline underline-offset-4">
            {back.label}
          </Link>
        </div>
      ) : (
        tryAgain
      )}
    </div>
  );
}
