"use client";

import { Link } from "@/components/ui/link";
import { usePathname } from "next/navigation";
import { JOB_SECTIONS, jobSectionHref } from "./job-sections";

/**
 * The job's sections: a grid of chips up to a wide screen, where all ten fit, so none is ever out of
 * sight on a phone or tablet; an underlined strip on a wide screen.
 */
export function JobTabs({ jobId }: { jobId: number }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Job sections" className="gb-no-print grid grid-cols-3 gap-1.5 sm:grid-cols-5 xl:-mb-px xl:flex xl:gap-1 xl:border-b xl:border-rule">
      {JOB_SECTIONS.map((s) => {
        const href = jobSectionHref(jobId, s.slug);
        const active = pathname === href;
        return (
          <Link
            key={s.slug || "overview"}
            href={href}
            aria-current={active ? "page" : undefined}
            className={`inline-flex min-h-11 items-center justify-center whitespace-nowrap rounded-chip border px-1 font-bold xl:justify-start xl:rounded-none xl:border-0 xl:border-b-4 xl:px-4 ${
              active
                ? "border-ink bg-ink text-paper xl:border-glow xl:bg-transparent xl:text-ink"
                : "border-rule bg-panel text-muted hover:text-ink xl:border-transparent xl:bg-transparent xl:hover:border-rule"
            }`}
          >
            {s.label}
          </Link>
        );
      })}
    </nav>
  );
}
