"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, type FieldValues, type Resolver } from "react-hook-form";
import { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FieldNotes } from "@/components/ui/field-notes";
import { SelectField } from "@/components/ui/select-field";
import { useSubmit } from "@/components/ui/use-submit";
import { drillAssignmentSchema, type DrillAssignmentInput } from "@/lib/drills/schemas";

/** What the inputs hold; the shared schema reads it (blank count: one drill per calculator chosen). */
interface FormValues {
  apprentice: string;
  kinds: string[];
  count: string;
  due: string;
  note: string;
}

const NAMES = ["apprentice", "kinds", "count", "due", "note"] as const;

const formSchema = z.preprocess((raw) => {
  const v = raw as FormValues;
  const kinds = Array.isArray(v.kinds) ? v.kinds : v.kinds ? [v.kinds as unknown as string] : [];
  return { apprentice: v.apprentice, kinds, due: v.due, ...(v.count.trim() ? { count: v.count.trim() } : {}), ...(v.note.trim() ? { note: v.note } : {}) };
}, drillAssignmentSchema);

const inAWeek = () => new Date(Date.now() + 7 * 86_400_000).toISOString().slice(0, 10);

export interface CalculatorChoice {
  slug: string;
  title: string;
  group: string;
}

/** For owners and technicians: a set of drills over chosen calculators for one apprentice, due on a date. */
export function AssignForm({ apprentices, calculators }: { apprentices: { userId: number; name: string }[]; calculators: CalculatorChoice[] }) {
  const [done, setDone] = useState<string | null>(null);
  const form = useForm<FormValues, unknown, DrillAssignmentInput>({
    // The preprocess step takes the form's text; its input type is unknown to zod, so it is named here.
    // What the resolver passes on is the schema's output: that is what is sent.
    resolver: zodResolver(formSchema as unknown as z.ZodType<unknown, FieldValues>) as unknown as Resolver<FormValues, unknown, DrillAssignmentInput>,
    defaultValues: { apprentice: String(apprentices[0]?.userId ?? ""), kinds: [], count: "", due: inAWeek(), note: "" },
  });
  const {
    register,
    reset,
    formState: { errors, isSubmitting },
  } = form;
  const { submit: onSubmit, formError } = useSubmit<FormValues, { assignment: { count: number; apprentice: { name: string } } }, DrillAssignmentInput>(form, {
    url: "/api/drills/assignments",
    fields: NAMES,
    onStart: () => setDone(null),
    onDone: (data) => {
      const a = data.assignment;
      setDone(`${a.count} ${a.count === 1 ? "drill" : "drills"} set for ${a.apprentice.name}.`);
      // Keep who and when for the next set; clear what was chosen.
      reset({ ...form.getValues(), kinds: [], note: "" });
    },
  });
  const status = formError ? { ok: false, message: formError } : done ? { ok: true, message: done } : null;
  const groups = [...new Set(calculators.map((c) => c.group))];
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Set drills" className="flex flex-col gap-2">
      <div className="grid gap-x-3 sm:grid-cols-2">
        <SelectField
          id="assign-apprentice"
          label="Apprentice"
          options={apprentices.map((a) => ({ value: String(a.userId), label: a.name }))}
          error={errors.apprentice?.message}
          {...register("apprentice")}
        />
        <Field id="assign-due" type="date" label="Due" error={errors.due?.message} {...register("due")} />
      </div>
      <fieldset aria-describedby="assign-kinds-error">
        <legend className="font-bold">Calculators to practise</legend>
        <div className="mt-1 max-h-72 overflow-y-auto rounded-chip border border-edge bg-panel p-3">
          {groups.map((g) => (
            <div key={g} className="mb-2">
              <p className="text-note font-bold text-muted">{g}</p>
              <div className="grid gap-x-4 sm:grid-cols-2">
                {calculators
                  .filter((c) => c.group === g)
                  .map((c) => (
                    <label key={c.slug} className="flex min-h-11 items-center gap-2">
                      <input type="checkbox" value={c.slug} className="h-5 w-5 shrink-0 accent-glow" {...register("kinds")} />
                      <span className="min-w-0">{c.title}</span>
                    </label>
                  ))}
              </div>
            </div>
          ))}
        </div>
        <FieldNotes id="assign-kinds" error={errors.kinds?.message} />
      </fieldset>
      <div className="grid gap-x-3 sm:grid-cols-[10rem_minmax(0,1fr)]">
        <Field
          id="assign-count"
          label="How many"
          inputMode="numeric"
          placeholder="one each"
          hint="1 to 20, taken in turn"
          error={errors.count?.message}
          {...register("count")}
        />
        <Field id="assign-note" label="Note (optional)" placeholder="Before Thursday's bring-up" error={errors.note?.message} {...register("note")} />
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={isSubmitting || apprentices.length === 0}>
          {isSubmitting ? "Setting…" : "Set these drills"}
        </Button>
        <p role="status" aria-live="polite" className={`text-note font-bold ${status?.ok ? "text-ok" : "text-flag"}`}>
          {status?.message ?? ""}
        </p>
      </div>
    </form>
  );
}
