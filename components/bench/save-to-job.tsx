"use client";

import Link from "next/link";
import { useEffect, useId, useState } from "react";
import { Button } from "@/components/ui/button";
import type { searchJobs } from "@/db/queries/jobs";
import { EQUIPMENT_KINDS, EQUIPMENT_KIND_LABELS, type EquipmentKind } from "@/lib/vocabulary";
import { getJson, sendJson } from "@/lib/client/fetch-json";

/** What this form reads of GET /api/jobs and POST /api/jobs. */
type JobSummary = Pick<ReturnType<typeof searchJobs>["jobs"][number], "id" | "title">;

const NEW = "new";
const field = "min-h-11 w-full rounded-chip border border-edge bg-panel px-3 py-2 text-body text-ink";

/** Save this calculation to one of the workshop's jobs (or a new one), with a note. The server recomputes it. */
export default function SaveToJob({ slug, inputs, disabled, canCreateJob }: { slug: string; inputs: Record<string, unknown>; disabled: boolean; canCreateJob: boolean }) {
  const id = useId();
  const [jobs, setJobs] = useState<JobSummary[] | null>(null);
  const [loadError, setLoadError] = useState("");
  const [jobId, setJobId] = useState("");
  const [title, setTitle] = useState("");
  const [kind, setKind] = useState<EquipmentKind>("table-radio");
  const [note, setNote] = useState("");
  const [busy, setBusy] = useState(false);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState<{ jobId: number; title: string } | null>(null);

  useEffect(() => {
    getJson<{ jobs: JobSummary[] }>("/api/jobs")
      .then((r) => {
        setJobs(r.jobs);
        setJobId(r.jobs[0] ? String(r.jobs[0].id) : canCreateJob ? NEW : "");
      })
      .catch((e: Error) => setLoadError(e.message));
  }, [canCreateJob]);

  async function save(e: React.FormEvent) {
    e.preventDefault();
    setErrors({});
    setSaved(null);
    if (jobId === NEW && !title.trim()) return setErrors({ title: "Give the new job a title, such as the set's kind and era." });
    setBusy(true);
    let target = jobs?.find((j) => String(j.id) === jobId) ?? null;
    if (jobId === NEW) {
      const made = await sendJson<{ job: JobSummary }>("/api/jobs", { title: title.trim(), equipmentKind: kind });
      if (!made.ok) {
        setBusy(false);
        return setErrors({ title: made.fields.title ?? made.message, ...(made.fields.equipmentKind ? { kind: made.fields.equipmentKind } : {}) });
      }
      target = made.data.job;
      setJobs((js) => [made.data.job, ...(js ?? [])]);
      setJobId(String(made.data.job.id));
      setTitle("");
    }
    if (!target) {
      setBusy(false);
      return setErrors({ job: "Pick a job to save to." });
    }
    const res = await sendJson(`/api/jobs/${target.id}/calculations`, { slug, inputs, note: note.trim() });
    setBusy(false);
    if (!res.ok) return setErrors({ form: res.fields.note ?? res.message });
    setSaved({ jobId: target.id, title: target.title });
    setNote("");
  }

  if (loadError) return <p className="text-flag">Could not load the workshop’s jobs: {loadError}</p>;
  if (!jobs) return <p className="text-muted">Loading the workshop’s jobs…</p>;

  return (
    <form onSubmit={save} className="grid gap-4 md:grid-cols-2" noValidate aria-label="Save to a job">
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-job`} className="font-bold">
          Job
        </label>
        <select id={`${id}-job`} value={jobId} onChange={(e) => setJobId(e.target.value)} className={field} aria-describedby={errors.job ? `${id}-job-error` : undefined}>
          {jobs.map((j) => (
            <option key={j.id} value={j.id}>
              {j.title}
            </option>
          ))}
          {canCreateJob ? <option value={NEW}>New job…</option> : null}
          {!canCreateJob && jobs.length === 0 ? <option value="">No jobs yet: ask a technician to book the set in</option> : null}
        </select>
        <p id={`${id}-job-error`} role="alert" className="min-h-5 text-note font-bold text-flag">
          {errors.job ?? ""}
        </p>
      </div>
      {jobId === NEW ? (
        <div className="grid gap-4 sm:grid-cols-2 md:col-span-2">
          <div className="flex flex-col gap-1">
            <label htmlFor={`${id}-title`} className="font-bold">
              New job title
            </label>
            <input id={`${id}-title`} value={title} onChange={(e) => setTitle(e.target.value)} className={field} aria-invalid={errors.title ? true : undefined} aria-describedby={`${id}-title-error`} placeholder="Five-tube table radio, 1950s" />
            <p id={`${id}-title-error`} role="alert" className="min-h-5 text-note font-bold text-flag">
              {errors.title ?? ""}
            </p>
          </div>
          <div className="flex flex-col gap-1">
            <label htmlFor={`${id}-kind`} className="font-bold">
              Kind of set
            </label>
            <select id={`${id}-kind`} value={kind} onChange={(e) => setKind(e.target.value as EquipmentKind)} className={field} aria-describedby={`${id}-kind-error`}>
              {EQUIPMENT_KINDS.map((k) => (
                <option key={k} value={k}>
                  {EQUIPMENT_KIND_LABELS[k]}
                </option>
              ))}
            </select>
            <p id={`${id}-kind-error`} role="alert" className="min-h-5 text-note font-bold text-flag">
              {errors.kind ?? ""}
            </p>
          </div>
        </div>
      ) : null}
      <div className="flex flex-col gap-1 md:col-span-2">
        <label htmlFor={`${id}-note`} className="font-bold">
          Note <span className="font-normal text-muted">(optional)</span>
        </label>
        <textarea id={`${id}-note`} value={note} onChange={(e) => setNote(e.target.value)} rows={2} maxLength={1000} className={field} placeholder="Where it goes, what you measured, what you fitted." />
      </div>
      <div className="flex flex-wrap items-center gap-4 md:col-span-2">
        <Button type="submit" disabled={busy || disabled}>
          {busy ? "Saving…" : "Save to job"}
        </Button>
        {disabled ? <span className="text-note text-muted">Fix the marked fields first.</span> : null}
        <p role="status" className="text-body">
          {saved ? (
            <>
              Saved to{" "}
              <Link href={`/jobs/${saved.jobId}`} className="font-bold text-signal underline underline-offset-4">
                {saved.title}
              </Link>
              .
            </>
          ) : null}
        </p>
        <p role="alert" className="text-note font-bold text-flag">
          {errors.form ?? ""}
        </p>
      </div>
    </form>
  );
}
