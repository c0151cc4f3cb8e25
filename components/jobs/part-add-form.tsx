"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { PART_KINDS, PART_STATES, PART_STATE_LABELS } from "@/lib/vocabulary";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { useSubmit } from "@/components/ui/use-submit";
import { PART_KIND_LABELS, partSchema, type PartInput, type PartValues } from "@/lib/jobs/part-schemas";

const EMPTY: PartInput = {
  designator: "",
  kind: "paper",
  originalValue: "",
  originalRating: "",
  replacementValue: "",
  replacementRating: "",
  state: "to-order",
  quantity: "1",
  supplier: "",
  supplierPartNumber: "",
  unitCost: "",
};

/** Adds one part; the unit cost field only for those who see prices (`currency`), typed as text and priced by the server. */
export function PartAddForm({ jobId, currency = null }: { jobId: number; currency?: string | null }) {
  const form = useForm<PartInput, unknown, PartValues>({
    resolver: zodResolver(partSchema),
    defaultValues: EMPTY,
  });
  const {
    register,
    reset,
    setFocus,
    getValues,
    formState: { errors, isSubmitting },
  } = form;
  const { submit: onSubmit, formError } = useSubmit(form, {
    url: `/api/jobs/${jobId}/parts`,
    fields: Object.keys(EMPTY),
    onDone: (_data, values) => {
      // The next part is often from the same supplier: keep the kind and the supplier.
      reset({ ...EMPTY, kind: values.kind, supplier: getValues("supplier") });
      setFocus("designator");
    },
  });
  const id = (n: string) => `part-${n}`;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a part" className="grid gap-x-3 sm:grid-cols-4">
      <Field id={id("designator")} label="Ref." placeholder="C12" error={errors.designator?.message} {...register("designator")} />
      <SelectField
        id={id("kind")}
        label="Kind"
        options={PART_KINDS.map((k) => ({ value: k, label: PART_KIND_LABELS[k] }))}
        error={errors.kind?.message}
        {...register("kind")}
      />
      <Field id={id("original-value")} label="Original value" placeholder="0.05 mfd" error={errors.originalValue?.message} {...register("originalValue")} />
      <Field id={id("original-rating")} label="Original rating" placeholder="400 V" error={errors.originalRating?.message} {...register("originalRating")} />
      <SelectField
        id={id("state")}
        label="State"
        options={PART_STATES.map((s) => ({ value: s, label: PART_STATE_LABELS[s] }))}
        error={errors.state?.message}
        {...register("state")}
      />
      <Field id={id("quantity")} label="Quantity" inputMode="numeric" error={errors.quantity?.message} {...register("quantity")} />
      <Field
        id={id("replacement-value")}
        label="Replacement value"
        placeholder="0.047 µF"
        error={errors.replacementValue?.message}
        {...register("replacementValue")}
      />
      <Field
        id={id("replacement-rating")}
        label="Replacement rating"
        placeholder="630 V"
        error={errors.replacementRating?.message}
        {...register("replacementRating")}
      />
      <Field id={id("supplier")} label="Supplier" list="part-suppliers" autoComplete="off" error={errors.supplier?.message} {...register("supplier")} />
      <Field
        id={id("supplier-part-number")}
        label="Their part no."
        autoComplete="off"
        error={errors.supplierPartNumber?.message}
        {...register("supplierPartNumber")}
      />
      {currency ? (
        <Field
          id={id("unit-cost")}
          label={`Unit cost (${currency})`}
          inputMode="decimal"
          placeholder="1.20"
          error={errors.unitCost?.message}
          {...register("unitCost")}
        />
      ) : null}
      <div className="flex flex-wrap items-center gap-3 sm:col-span-4">
        <Button type="submit" disabled={isSubmitting}>
          Add part
        </Button>
        <p role="alert" aria-live="polite" className="font-bold text-flag">
          {formError ?? ""}
        </p>
      </div>
    </form>
  );
}
