"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, type DefaultValues, type FieldValues } from "react-hook-form";
import type { z } from "zod";
import { useSubmit } from "./use-submit";

type SubmitOptions<I extends FieldValues, D, O extends FieldValues> = Parameters<typeof useSubmit<I, D, O>>[1];

/**
 * A form checked by its zod schema (the one the server parses) and sent by useSubmit. `success` words the
 * line a good answer leaves ("Settings saved.", "Invitation sent to …"); the line is cleared when the
 * next send starts. Returns the form, its register and errors, the line, and what useSubmit gives.
 */
export function useSchemaForm<I extends FieldValues, O extends FieldValues = I, D = unknown>(
  schema: z.ZodType<O, I>,
  defaultValues: DefaultValues<I>,
  { success: successOf, ...opts }: SubmitOptions<I, D, O> & { success?: (data: D, values: O) => string },
) {
  const [success, setSuccess] = useState<string | null>(null);
  const form = useForm<I, unknown, O>({ resolver: zodResolver(schema), defaultValues });
  const submit = useSubmit<I, D, O>(form, {
    ...opts,
    onStart: () => {
      setSuccess(null);
      opts.onStart?.();
    },
    onDone: async (data, values) => {
      await opts.onDone?.(data, values);
      if (successOf) setSuccess(successOf(data, values));
    },
  });
  return { form, register: form.register, errors: form.formState.errors, success, ...submit };
}
