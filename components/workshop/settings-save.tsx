"use client";

import type { DefaultValues, FieldValues } from "react-hook-form";
import type { z } from "zod";
import { SubmitButton } from "@/components/ui/submit-button";
import { useSchemaForm } from "@/components/ui/use-schema-form";

/**
 * A workshop card's settings form (details, charges): PATCH sends the typed text rather than the parsed
 * values, since the server parses the same schema; once saved, those values are the form's new starting
 * point, so Save waits for the next change.
 */
export function useSettingsForm<I extends FieldValues, O extends FieldValues>(
  schema: z.ZodType<O, I>,
  initial: DefaultValues<I>,
  { url, fields, saved }: { url: string; fields: readonly string[]; saved: string },
) {
  const settings = useSchemaForm(schema, initial, {
    url,
    method: "PATCH",
    body: (): unknown => settings.form.getValues(),
    fields,
    onDone: (): void => settings.form.reset(settings.form.getValues()),
    success: () => saved,
  });
  return settings;
}

/** Save (only once something changed) and the line saying it was saved, or why not. */
export function SaveRow({
  label,
  pending,
  dirty,
  formError,
  success,
}: {
  label: string;
  pending: boolean;
  dirty: boolean;
  formError: string | null;
  success: string | null;
}) {
  return (
    <div className="flex items-center gap-4">
      <SubmitButton pending={pending} busy="Saving…" disabled={!dirty}>
        {label}
      </SubmitButton>
      <p role="status" aria-live="polite" className={`text-note font-bold ${formError ? "text-flag" : "text-ok"}`}>
        {formError ?? success ?? ""}
      </p>
    </div>
  );
}
