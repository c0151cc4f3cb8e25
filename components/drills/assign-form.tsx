"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type FieldValues, type Resolver } from "react-hook-form";
import { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FieldNotes } from "@/components/ui/field-notes";
import { SelectField } from "@/components/ui/select-field";
import { sendJson } from "@/lib/client/fetch-json";
import { drillAssignmentSchema } from "@/lib/drills/schemas";

/** What the inputs hold; the shared schema reads it (blank count: one drill per calculator chosen). */
interface FormValues {
  apprentice: string;
  kinds: string[];
  count: string;
  due: string;
  note: string;
}

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
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; message: string } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<FormValues>({
    // The preprocess step takes the form's text; its input type is unknown to zod, so it is named here.
    resolver: zodResolver(formSchema as unknown as z.ZodType<unknown, FieldValues>) as unknown as Resolver<FormValues>,
    defaultValues: { apprentice: String(apprentices[0]?.userId ?? ""), kinds: [], count: "", due: inAWeek(), note: "" },
  });
  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    const body = formSchema.parse(values);
    const res = await sendJson<{ assignment: { count: number; apprentice: { name: string } } }>("/api/drills/assignments", body);
    if (!res.ok) {
      for (const [name, message] of Object.entries(res.fields)) if (name in values) setError(name as keyof FormValues, { message });
      setStatus({ ok: false, message: res.message });
      return;
    }
    const a = res.data.assignment;
    setStatus({ ok: true, message: `${a.count} ${a.count === 1 ? "drill" : "drills"} set for ${a.apprentice.name}.` });
    reset({ ...values, kinds: [], note: "" });
    router.refresh();
  });
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
