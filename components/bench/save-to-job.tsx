"use client";

import { Link } from "@/components/ui/link";
import { useEffect, useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { TextareaField } from "@/components/ui/textarea-field";
import { useAction } from "@/components/ui/use-submit";
import type { searchJobs } from "@/db/queries/jobs";
import { EQUIPMENT_KINDS, EQUIPMENT_KIND_LABELS, type EquipmentKind } from "@/lib/vocabulary";
import { getJson } from "@/lib/client/fetch-json";

/** What this form reads of GET /api/jobs and POST /api/jobs. */
type JobSummary = Pick<ReturnType<typeof searchJobs>["jobs"][number], "id" | "title">;

const NEW = "new";

/** Save this calculation to one of the workshop's jobs (or a new one), with a note. The server recomputes it. */
export default function SaveToJob({
  slug,
  inputs,
  disabled,
  canCreateJob,
}: {
  slug: string;
  inputs: Record<string, unknown>;
  disabled: boolean;
  canCreateJob: boolean;
}) {
  const id = useId();
  const [jobs, setJobs] = useState<JobSummary[] | null>(null);
  const [loadError, setLoadError] = useState("");
  const [jobId, setJobId] = useState("");
  const [title, setTitle] = useState("");
  const [kind, setKind] = useState<EquipmentKind>("table-radio");
  const [note, setNote] = useState("");
  const [busy, setBusy] = useState(false);
  // Two calls in a row (a new job, then the calculation): each refusal is put on its own field below.
  const { run } = useAction({ refresh: false });
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
      const made = await run({ title: title.trim(), equipmentKind: kind }, { url: "/api/jobs" });
      if (!made.ok) {
        setBusy(false);
        return setErrors({ title: made.fields.title ?? made.message, ...(made.fields.equipmentKind ? { kind: made.fields.equipmentKind } : {}) });
      }
      const job = (made.data as { job: JobSummary }).job;
      target = job;
      setJobs((js) => [job, ...(js ?? [])]);
      setJobId(String(job.id));
      setTitle("");
    }
    if (!target) {
      setBusy(false);
      return setErrors({ job: "Pick a job to save to." });
    }
    const res = await run({ slug, inputs, note: note.trim() }, { url: `/api/jobs/${target.id}/calculations` });
    setBusy(false);
    if (!res.ok) return setErrors({ form: res.fields.note ?? res.message });
    setSaved({ jobId: target.id, title: target.title });
    setNote("");
  }

  if (loadError) return <p className="text-flag">Could not load the workshop’s jobs: {loadError}</p>;
  if (!jobs) return <p className="text-muted">Loading the workshop’s jobs…</p>;

  return (
    <form onSubmit={save} className="grid gap-4 md:grid-cols-2" noValidate aria-label="Save to a job">
      <SelectField
        id={`${id}-job`}
        label="Job"
        value={jobId}
        onChange={(e) => setJobId(e.target.value)}
        error={errors.job}
        options={[
          ...jobs.map((j) => ({ value: String(j.id), label: j.title })),
          ...(canCreateJob ? [{ value: NEW, label: "New job…" }] : []),
          ...(!canCreateJob && jobs.length === 0 ? [{ value: "", label: "No jobs yet: ask a technician to book the set in" }] : []),
        ]}
      />
      {jobId === NEW ? (
        <div className="grid gap-4 sm:grid-cols-2 md:col-span-2">
          <Field
            id={`${id}-title`}
            label="New job title"
            value={title}
            onChange={(e) => setTitle(e.target.value)}
            error={errors.title}
            placeholder="Five-tube table radio, 1950s"
          />
          <SelectField
            id={`${id}-kind`}
            label="Kind of set"
            value={kind}
            onChange={(e) => setKind(e.target.value as EquipmentKind)}
            error={errors.kind}
            options={EQUIPMENT_KINDS.map((k) => ({ value: k, label: EQUIPMENT_KIND_LABELS[k] }))}
          />
        </div>
      ) : null}
      <TextareaField
        id={`${id}-note`}
        label={
          <>
            Note <span className="font-normal text-muted">(optional)</span>
          </>
        }
        className="md:col-span-2"
        value={note}
        onChange={(e) => setNote(e.target.value)}
        rows={2}
        maxLength={1000}
        placeholder="Where it goes, what you measured, what you fitted."
      />
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
