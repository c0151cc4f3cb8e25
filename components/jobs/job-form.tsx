"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { EQUIPMENT_KINDS, EQUIPMENT_KIND_LABELS } from "@/lib/vocabulary";
import { CustomerPicker, type PickedCustomer } from "@/components/customers/customer-picker";
import { Field } from "@/components/ui/field";
import { FormActions } from "@/components/ui/form-actions";
import { SelectField } from "@/components/ui/select-field";
import { TextareaField } from "@/components/ui/textarea-field";
import { useSchemaForm } from "@/components/ui/use-schema-form";
import { useAction } from "@/components/ui/use-submit";
import { formText } from "@/lib/client/form-text";
import { jobCreateSchema, type JobCreateInput } from "@/lib/jobs/job-schemas";
import { AccessoriesField } from "./intake-fields";

const NAMES = ["title", "equipmentKind", "maker", "model", "year", "customerName", "customerEmail", "customerPhone", "serialNumber", "notes"] as const;
type Name = (typeof NAMES)[number];
type EditedJob = { id: number; customerId?: number | null; accessories?: string[] | null } & Partial<Record<Name, string | number | null>>;

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
 * Book in a set (POST /api/jobs) or edit its details (PATCH /api/jobs/[id]); one zod schema with the server.
 * The customer is picked from the list or typed new; intake records the serial number, what came with the
 * set and, when booking in, photos of it as it arrived (Files, kind "intake").
 */
export function JobForm({ job, onDone, bookFor = null }: { job?: EditedJob; onDone?: () => void; bookFor?: PickedCustomer }) {
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
  const { register, errors, submit, formError, pending } = useSchemaForm(jobCreateSchema, initial as JobCreateInput, {
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

  const id = (n: string) => `job-${n}`;
  const heading = "sm:col-span-2 mt-3 border-t border-rule pt-3 text-lead font-bold";
  return (
    <form onSubmit={submit} noValidate className="grid grid-cols-1 gap-x-4 gap-y-1 sm:grid-cols-2" aria-describedby="job-form-error">
      <Field
        id={id("title")}
        label="Title"
        placeholder="Five-tube table radio, 1950s"
        className="sm:col-span-2"
        error={errors.title?.message}
        {...register("title")}
      />
      <SelectField
        id={id("kind")}
        label="Kind of set"
        options={EQUIPMENT_KINDS.map((k) => ({ value: k, label: EQUIPMENT_KIND_LABELS[k] }))}
        error={errors.equipmentKind?.message}
        {...register("equipmentKind")}
      />
      <Field id={id("year")} label="Year" inputMode="numeric" placeholder="1952" error={errors.year?.message} {...register("year")} />
      <Field id={id("maker")} label="Maker" error={errors.maker?.message} {...register("maker")} />
      <Field id={id("model")} label="Model" error={errors.model?.message} {...register("model")} />
      <h3 className={heading}>Customer</h3>
      <div className="sm:col-span-2">
        <CustomerPicker
          picked={picked}
          onPick={setPicked}
          newCustomer={
            <>
              <Field id={id("customer-name")} label="Customer name" autoComplete="off" error={errors.customerName?.message} {...register("customerName")} />
              <Field
                id={id("customer-email")}
                label="Customer e-mail"
                type="email"
                inputMode="email"
                autoComplete="off"
                error={errors.customerEmail?.message}
                {...register("customerEmail")}
              />
              <Field
                id={id("customer-phone")}
                label="Customer phone"
                type="tel"
                inputMode="tel"
                autoComplete="off"
                error={errors.customerPhone?.message}
                {...register("customerPhone")}
              />
            </>
          }
        />
        {fieldErrors.customerId ? (
          <p role="alert" className="mt-1 text-note font-bold text-flag">
            {fieldErrors.customerId}
          </p>
        ) : null}
      </div>
      <h3 className={heading}>Intake</h3>
      <Field id={id("serial")} label="Serial or chassis number" autoComplete="off" error={errors.serialNumber?.message} {...register("serialNumber")} />
      <div className="sm:col-span-2">
        <AccessoriesField value={accessories} onChange={setAccessories} error={fieldErrors.accessories} />
      </div>
      {!job ? (
        <label className="flex flex-col gap-1 sm:col-span-2">
          <span className="font-bold">Intake photos</span>
          <input
            type="file"
            accept="image/jpeg,image/png,image/webp"
            capture="environment"
            multiple
            onChange={(e) => setPhotos([...(e.target.files ?? [])])}
            aria-describedby="job-photos-hint"
            className="min-h-11 w-full min-w-0 rounded-chip border border-edge bg-panel px-3 py-2 file:mr-3 file:rounded-chip file:border-0 file:bg-sunk file:px-3 file:py-1 file:font-bold"
          />
          <span id="job-photos-hint" className="text-note text-muted">
            The set as it came in: cabinet, back, chassis. JPEG, PNG or WebP, up to 20 MB each; they go to the job&rsquo;s Files.
          </span>
        </label>
      ) : null}
      <TextareaField
        id={id("notes")}
        label="Notes"
        className="sm:col-span-2"
        hint="Symptoms, condition, what the customer asked for."
        error={errors.notes?.message}
        {...register("notes")}
      />
      <FormActions
        errorId="job-form-error"
        formError={formError}
        pending={pending}
        busy={photos.length ? "Saving and uploading…" : "Saving…"}
        onCancel={onDone}
      >
        {job ? "Save details" : "Book in"}
      </FormActions>
    </form>
  );
}
