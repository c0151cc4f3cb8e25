"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm, type DefaultValues, type FieldValues, type Resolver } from "react-hook-form";
import type { z } from "zod";
import { useSubmit } from "@/components/ui/use-submit";

/**
 * The forms of the bench record (Tubes, Power-ups, Faults): react-hook-form with the contract's zod
 * schema through zodResolver, sent by the one submit path (useSubmit): the server's field messages put
 * back beside their fields, and the page refreshed. `prepare` turns what the form holds into what the schema
 * reads (a blank tester reading into "no test"), on the client and before sending.
 */
export function useRecordForm<F extends FieldValues, S extends z.ZodType>(
  schema: S,
  options: {
    url: string;
    method?: "POST" | "PATCH";
    defaults: F;
    prepare?: (values: F) => unknown;
    /** After a good answer; by default the form is cleared. */
    onDone?: (data: unknown, values: F) => void;
  },
) {
  const base = zodResolver(schema as never) as unknown as Resolver<F>;
  const resolver: Resolver<F> = async (values, context, opts) => {
    const result = await base((options.prepare ? options.prepare(values) : values) as F, context, opts);
    // Keep what the person typed in the form: only the errors are taken from the check.
    return Object.keys(result.errors).length ? result : { values, errors: {} };
  };
  const form = useForm<F>({ resolver, defaultValues: options.defaults as DefaultValues<F> });
  const { submit, formError, setFormError } = useSubmit(form, {
    url: options.url,
    method: options.method,
    body: options.prepare,
    onDone: (data, values) => {
      if (options.onDone) options.onDone(data, values);
      else form.reset(options.defaults);
    },
  });
  return { form, onSubmit: submit, formError, setFormError };
}

/** The message of a field, nested names included ("test.reading"). */
export function fieldError(errors: Record<string, unknown>, name: string): string | undefined {
  let at: unknown = errors;
  for (const part of name.split(".")) at = (at as Record<string, unknown> | undefined)?.[part];
  const message = (at as { message?: unknown } | undefined)?.message;
  return typeof message === "string" ? message : undefined;
}
