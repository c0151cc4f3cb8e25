"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import type { PickedCustomer } from "@/components/customers/customer-picker";
import { useSchemaForm } from "@/components/ui/use-schema-form";
import { useAction } from "@/components/ui/use-submit";
import { formText } from "@/lib/client/form-text";
import { jobCreateSchema, type JobCreateInput } from "@/lib/jobs/job-schemas";

const NAMES = ["title", "equipmentKind", "maker", "model", "year", "customerName", "customerEmail", "customerPhone", "serialNumber", "notes"] as const;
type Name = (typeof NAMES)[number];
export type EditedJob = { id: number; customerId?: number | null; accessories?: string[] | null } & Partial<Record<Name, string | number | null>>;

/** Uploads the intake photos of a job just booked in, one multipart POST each by `send`; returns how many failed. */
async function uploadIntakePhotos(jobId: number, photos: File[], send: ReturnType<typeof useAction>["run"]): Promise<number> {
  let failed = 0;
  for (const photo of photos) {
    const form = new FormData();
    form.set("file", photo);
    form.set("kind", "intake");
    const res = await send(form, { url: `/api/jobs/${jobId}/files` });
    if (!res.ok) failed++;
  }
  return failed;
}

/**
 * The job form's state and its way to the server: book in (POST /api/jobs) or edit (PATCH /api/jobs/[id]),
 * with the picked customer, the accessories and, after booking in, the intake photos.
 */
export function useJobForm({ job, onDone, bookFor }: { job?: EditedJob; onDone?: () => void; bookFor: PickedCustomer }) {
  const router = useRouter();
  const [picked, setPicked] = useState<PickedCustomer>(
    job?.customerId ? { id: job.customerId, name: String(job.customerName ?? ""), email: (job.customerEmail as string | null) ?? null } : bookFor,
  );
  const [accessories, setAccessories] = useState<string[]>(job?.accessories ?? []);
  const [photos, setPhotos] = useState<File[]>([]);
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  // The photos go after the job is booked; the page then moves to the job, so nothing refreshes here.
  const upload = useAction({ refresh: false });
  const initial = formText(NAMES, job);
  if (!initial.equipmentKind) initial.equipmentKind = "table-radio";

  // The customer and accessories live outside react-hook-form, so their messages are kept in fieldErrors.
  const form = useSchemaForm(jobCreateSchema, initial as JobCreateInput, {
    url: job ? `/api/jobs/${job.id}` : "/api/jobs",
    method: job ? "PATCH" : "POST",
    body: (values) => {
      const customer = picked
        ? { customerId: picked.id, customerName: null, customerEmail: null, customerPhone: null }
        : { customerId: job ? null : undefined };
      return { ...values, ...customer, accessories };
    },
    fields: NAMES,
    invalidate: [["jobs"]],
    refresh: Boolean(job),
    onStart: () => setFieldErrors({}),
    onFail: (f) => setFieldErrors(f.fields),
    onDone: async (data: { job: { id: number } }) => {
      if (job) return onDone?.();
      const failed = photos.length ? await uploadIntakePhotos(data.job.id, photos, upload.run) : 0;
      router.push(`/jobs/${data.job.id}${failed ? "/files" : ""}`);
    },
  });
  return { ...form, picked, setPicked, accessories, setAccessories, photos, setPhotos, fieldErrors };
}
