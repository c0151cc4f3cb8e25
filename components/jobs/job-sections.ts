/**
 * The sections of a job page, in tab order. Each is a route under /jobs/[id]; to add one, add a
 * line here and its page at app/(app)/jobs/[id]/<slug>/page.tsx.
 */
export interface JobSection {
  /** Path segment under /jobs/[id]; "" is the Overview at /jobs/[id] itself. */
  slug: string;
  label: string;
}

export const JOB_SECTIONS: JobSection[] = [
  { slug: "", label: "Overview" },
  { slug: "parts", label: "Parts" },
  { slug: "readings", label: "Readings" },
  { slug: "tubes", label: "Tubes" },
  { slug: "power-ups", label: "Power-ups" },
  { slug: "faults", label: "Faults" },
  { slug: "calculations", label: "Calculations" },
  { slug: "files", label: "Files" },
  { slug: "estimate", label: "Estimate" },
  { slug: "log", label: "Log" },
];

export function jobSectionHref(jobId: number, slug: string): string {
  return slug ? `/jobs/${jobId}/${slug}` : `/jobs/${jobId}`;
}
