"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { JOB_SECTIONS, jobSectionHref } from "./job-sections";

export function JobTabs({ jobId }: { jobId: number }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Job sections" className="gb-no-print -mb-px flex gap-1 overflow-x-auto border-b border-rule">
      {JOB_SECTIONS.map((s) => {
        const href = jobSectionHref(jobId, s.slug);
        const active = pathname === href;
        return (
          <Link
            key={s.slug || "overview"}
            href={href}
            aria-current={active ? "page" : undefined}
            className={`inline-flex min-h-11 items-center whitespace-nowrap border-b-4 px-4 font-bold ${
              active ? "border-glow text-ink" : "border-transparent text-muted hover:border-rule hover:text-ink"
            }`}
          >
            {s.label}
          </Link>
        );
      })}
    </nav>
  );
}
