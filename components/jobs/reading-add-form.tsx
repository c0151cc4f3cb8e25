"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { sendJson } from "@/lib/client/fetch-json";
import { readingSchema, type ReadingValues } from "@/lib/jobs/reading-schemas";

type Form = { kind: "resistor" | "voltage"; designator: string; partDesignators: string; nominal: string; measured: string; tolerance: string };
const EMPTY: Form = { kind: "resistor", designator: "", partDesignators: "", nominal: "", measured: "", tolerance: "" };

/**
 * Any member may add a reading; numbers take engineering notation ("470k", "4k7", "250 V").
 * A voltage may name the capacitor(s) it was measured across: only then is it compared with their ratings.
 */
export function ReadingAddForm({ jobId }: { jobId: number }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, reset, watch, setError, setFocus, formState: { errors, isSubmitting } } = useForm<Form, unknown, ReadingValues>({
    resolver: zodResolver(readingSchema) as never,
    defaultValues: EMPTY,
  });
  const kind = watch("kind");
  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const raw = watch();
    const res = await sendJson(`/api/jobs/${jobId}/readings`, { ...raw, kind: values.kind });
    if (!res.ok) {
      for (const [name, message] of Object.entries(res.fields)) if (name in EMPTY) setError(name as keyof Form, { message });
      return setFormError(res.message);
    }
    reset({ ...EMPTY, kind: values.kind, tolerance: raw.tolerance });
    setFocus("designator");
    router.refresh();
  });
  const resistor = kind === "resistor";
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a reading" className="grid gap-x-3 sm:grid-cols-5">
      <SelectField id="reading-kind" label="Reading" options={[{ value: "resistor", label: "Resistor" }, { value: "voltage", label: "Voltage" }]} {...register("kind")} />
      <Field id="reading-designator" label={resistor ? "Ref." : "Test point"} placeholder={resistor ? "R4" : "B+ at C5a"} error={errors.designator?.message} {...register("designator")} />
      {resistor ? null : (
        <Field id="reading-parts" label="Across" placeholder="C5a, C5b" hint="Capacitors checked against this reading" error={errors.partDesignators?.message} {...register("partDesignators")} />
      )}
      <Field id="reading-nominal" label={resistor ? "Marked value" : "Expected"} placeholder={resistor ? "470k" : "250 V"} suffix={resistor ? "Ω" : "V"} error={errors.nominal?.message} {...register("nominal")} />
      <Field id="reading-measured" label="Measured" placeholder={resistor ? "655k or open" : "240 V"} suffix={resistor ? "Ω" : "V"} error={errors.measured?.message} {...register("measured")} />
      <Field id="reading-tolerance" label="Tolerance" placeholder="0.2" hint="0.2 = ±20 %" error={errors.tolerance?.message} {...register("tolerance")} />
      <div className="flex items-center gap-3 sm:col-span-5">
        <Button type="submit" disabled={isSubmitting}>Add reading</Button>
        <p role="alert" aria-live="polite" className="font-bold text-flag">{formError ?? ""}</p>
      </div>
    </form>
  );
}
