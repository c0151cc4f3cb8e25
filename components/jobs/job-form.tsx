"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { EQUIPMENT_KINDS, EQUIPMENT_KIND_LABELS } from "@/lib/vocabulary";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { TextareaField } from "@/components/ui/textarea-field";
import { sendJson } from "@/lib/client/fetch-json";
import { jobCreateSchema, type JobCreate, type JobCreateInput } from "@/lib/jobs/job-schemas";

type Values = { title: string; equipmentKind: string; maker: string; model: string; year: string; customerName: string; customerEmail: string; notes: string };
const NAMES = ["title", "equipmentKind", "maker", "model", "year", "customerName", "customerEmail", "notes"] as const;

/** Book in a set (POST /api/jobs) or edit its details (PATCH /api/jobs/[id]); one zod schema with the server. */
export function JobForm({ job, onDone }: { job?: { id: number } & Partial<Record<keyof Values, string | number | null>>; onDone?: () => void }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [formError, setFormError] = useState<string | null>(null);
  const initial = Object.fromEntries(NAMES.map((n) => [n, job?.[n] == null ? "" : String(job[n])])) as Values;
  if (!initial.equipmentKind) initial.equipmentKind = "table-radio";
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<JobCreateInput, unknown, JobCreate>({ resolver: zodResolver(jobCreateSchema), defaultValues: initial as JobCreateInput });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = job ? await sendJson<{ job: { id: number } }>(`/api/jobs/${job.id}`, values, "PATCH") : await sendJson<{ job: { id: number } }>("/api/jobs", values);
    if (!res.ok) {
      for (const [name, message] of Object.entries(res.fields)) if ((NAMES as readonly string[]).includes(name)) setError(name as keyof Values, { message });
      setFormError(res.message);
      return;
    }
    await queryClient.invalidateQueries({ queryKey: ["jobs"] });
    if (job) {
      router.refresh();
      onDone?.();
    } else router.push(`/jobs/${res.data.job.id}`);
  });

  const id = (n: string) => `job-${n}`;
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-x-4 gap-y-1 sm:grid-cols-2" aria-describedby="job-form-error">
      <Field id={id("title")} label="Title" placeholder="Five-tube table radio, 1950s" className="sm:col-span-2" error={errors.title?.message} {...register("title")} />
      <SelectField id={id("kind")} label="Kind of set" options={EQUIPMENT_KINDS.map((k) => ({ value: k, label: EQUIPMENT_KIND_LABELS[k] }))} error={errors.equipmentKind?.message} {...register("equipmentKind")} />
      <Field id={id("year")} label="Year" inputMode="numeric" placeholder="1952" error={errors.year?.message} {...register("year")} />
      <Field id={id("maker")} label="Maker" error={errors.maker?.message} {...register("maker")} />
      <Field id={id("model")} label="Model" error={errors.model?.message} {...register("model")} />
      <Field id={id("customer-name")} label="Customer name" error={errors.customerName?.message} {...register("customerName")} />
      <Field id={id("customer-email")} label="Customer e-mail" type="email" error={errors.customerEmail?.message} {...register("customerEmail")} />
      <TextareaField id={id("notes")} label="Notes" className="sm:col-span-2" hint="Symptoms, condition, what the customer asked for." error={errors.notes?.message} {...register("notes")} />
      <p id="job-form-error" role="alert" aria-live="polite" className="min-h-6 font-bold text-flag sm:col-span-2">
        {formError ?? ""}
      </p>
      <div className="flex gap-3 sm:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? "Saving…" : job ? "Save details" : "Book in"}
        </Button>
        {onDone ? (
          <Button type="button" variant="secondary" onClick={onDone}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
