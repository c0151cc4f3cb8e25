"use client";

import type { FieldErrors, UseFormRegister } from "react-hook-form";
import { EQUIPMENT_KINDS, EQUIPMENT_KIND_LABELS } from "@/lib/vocabulary";
import { CustomerPicker, type PickedCustomer } from "@/components/customers/customer-picker";
import { Field } from "@/components/ui/field";
import { FormActions } from "@/components/ui/form-actions";
import { SelectField } from "@/components/ui/select-field";
import { TextareaField } from "@/components/ui/textarea-field";
import type { JobCreateInput } from "@/lib/jobs/job-schemas";
import { AccessoriesField, IntakePhotosField } from "./intake-fields";
import { useJobForm, type EditedJob } from "./use-job-form";

const id = (n: string) => `job-${n}`;
const heading = "sm:col-span-2 mt-3 border-t border-rule pt-3 text-lead font-bold";

/**
 * Book in a set (POST /api/jobs) or edit its details (PATCH /api/jobs/[id]); one zod schema with the server.
 * The customer is picked from the list or typed new; intake records the serial number, what came with the
 * set and, when booking in, photos of it as it arrived (Files, kind "intake").
 */
export function JobForm({ job, onDone, bookFor = null }: { job?: EditedJob; onDone?: () => void; bookFor?: PickedCustomer }) {
  const { register, errors, fieldErrors, ...form } = useJobForm({ job, onDone, bookFor });
  return (
    <form onSubmit={form.submit} noValidate className="grid grid-cols-1 gap-x-4 gap-y-1 sm:grid-cols-2" aria-describedby="job-form-error">
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
      <JobCustomerSection picked={form.picked} onPick={form.setPicked} register={register} errors={errors} error={fieldErrors.customerId} />
      <h3 className={heading}>Intake</h3>
      <Field id={id("serial")} label="Serial or chassis number" autoComplete="off" error={errors.serialNumber?.message} {...register("serialNumber")} />
      <div className="sm:col-span-2">
        <AccessoriesField value={form.accessories} onChange={form.setAccessories} error={fieldErrors.accessories} />
      </div>
      {!job ? <IntakePhotosField onChange={form.setPhotos} /> : null}
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
        formError={form.formError}
        pending={form.pending}
        busy={form.photos.length ? "Saving and uploading…" : "Saving…"}
        onCancel={onDone}
      >
        {job ? "Save details" : "Book in"}
      </FormActions>
    </form>
  );
}

/** The customer: picked from the list, or typed new (name, e-mail, phone) for the server to find or add. */
function JobCustomerSection({
  picked,
  onPick,
  register,
  errors,
  error,
}: {
  picked: PickedCustomer;
  onPick: (c: PickedCustomer) => void;
  register: UseFormRegister<JobCreateInput>;
  errors: FieldErrors<JobCreateInput>;
  error?: string;
}) {
  return (
    <>
      <h3 className={heading}>Customer</h3>
      <div className="sm:col-span-2">
        <CustomerPicker
          picked={picked}
          onPick={onPick}
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
        {error ? (
          <p role="alert" className="mt-1 text-note font-bold text-flag">
            {error}
          </p>
        ) : null}
      </div>
    </>
  );
}
