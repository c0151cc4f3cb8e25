"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { useSubmit } from "@/components/ui/use-submit";
import { readingSchema, type ReadingValues } from "@/lib/jobs/reading-schemas";

type Form = { kind: "resistor" | "voltage"; designator: string; partDesignators: string; nominal: string; measured: string; tolerance: string };
const EMPTY: Form = { kind: "resistor", designator: "", partDesignators: "", nominal: "", measured: "", tolerance: "" };

/**
 * Any member may add a reading; numbers take engineering notation ("470k", "4k7", "250 V").
 * A voltage may name the capacitor(s) it was measured across: only then is it compared with their ratings.
 */
export function ReadingAddForm({ jobId }: { jobId: number }) {
  const form = useForm<Form, unknown, ReadingValues>({
    resolver: zodResolver(readingSchema) as never,
    defaultValues: EMPTY,
  });
  const {
    register,
    reset,
    watch,
    setFocus,
    formState: { errors, isSubmitting },
  } = form;
  const kind = watch("kind");
  // The typed text goes to the server, which parses the same schema.
  const { submit: onSubmit, formError } = useSubmit(form, {
    url: `/api/jobs/${jobId}/readings`,
    body: (values) => ({ ...watch(), kind: values.kind }),
    fields: Object.keys(EMPTY),
    onDone: (_data, values) => {
      reset({ ...EMPTY, kind: values.kind, tolerance: watch("tolerance") });
      setFocus("designator");
    },
  });
  const resistor = kind === "resistor";
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a reading" className="grid gap-x-3 sm:grid-cols-5">
      <SelectField
        id="reading-kind"
        label="Reading"
        options={[
          { value: "resistor", label: "Resistor" },
          { value: "voltage", label: "Voltage" },
        ]}
        {...register("kind")}
      />
      <Field
        id="reading-designator"
        label={resistor ? "Ref." : "Test point"}
        placeholder={resistor ? "R4" : "B+ at C5a"}
        error={errors.designator?.message}
        {...register("designator")}
      />
      {resistor ? null : (
        <Field
          id="reading-parts"
          label="Across"
          placeholder="C5a, C5b"
          hint="Capacitors checked against this reading"
          error={errors.partDesignators?.message}
          {...register("partDesignators")}
        />
      )}
      <Field
        id="reading-nominal"
        label={resistor ? "Marked value" : "Expected"}
        placeholder={resistor ? "470k" : "250 V"}
        suffix={resistor ? "Ω" : "V"}
        error={errors.nominal?.message}
        {...register("nominal")}
      />
      <Field
        id="reading-measured"
        label="Measured"
        placeholder={resistor ? "655k or open" : "240 V"}
        suffix={resistor ? "Ω" : "V"}
        error={errors.measured?.message}
        {...register("measured")}
      />
      <Field id="reading-tolerance" label="Tolerance" placeholder="0.2" hint="0.2 = ±20 %" error={errors.tolerance?.message} {...register("tolerance")} />
      <div className="flex items-center gap-3 sm:col-span-5">
        <Button type="submit" disabled={isSubmitting}>
          Add reading
        </Button>
        <p role="alert" aria-live="polite" className="font-bold text-flag">
          {formError ?? ""}
        </p>
      </div>
    </form>
  );
}
