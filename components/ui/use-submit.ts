"use client";

import { QueryClientContext, type QueryKey } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useContext, useState } from "react";
import type { FieldValues, Path, UseFormReturn } from "react-hook-form";
import { sendJson, type ApiResult } from "@/lib/client/fetch-json";
import { fieldErrorsOf, type Failure } from "@/lib/client/submit-errors";

type Method = "POST" | "PUT" | "PATCH" | "DELETE";

type After<D> = {
  /** router.refresh() after a good answer, so server components read again (default true). */
  refresh?: boolean;
  /** TanStack Query keys to invalidate after a good answer (client-fetched lists). */
  invalidate?: QueryKey[];
  /** Runs after a good answer, before the refresh. */
  onDone?: (data: D) => void | Promise<void>;
  /** Runs after a refusal, once the messages are shown (a 409's extra list, say). */
  onFail?: (failure: Failure) => void;
};

/** What every good answer is followed by; the query client is optional, as signed-out pages have none. */
function useAfterSuccess() {
  const router = useRouter();
  const queryClient = useContext(QueryClientContext);
  return async (opts: { refresh?: boolean; invalidate?: QueryKey[] }) => {
    for (const queryKey of opts.invalidate ?? []) await queryClient?.invalidateQueries({ queryKey });
    if (opts.refresh ?? true) router.refresh();
  };
}

/**
 * One submit path for a react-hook-form form: send the values as JSON (or what `body` makes of them),
 * put the server's field messages beside their inputs (dotted paths), show its message as the form
 * error (render it with <FormError>), then refresh and/or invalidate. `fields` limits which names
 * the form holds; `pending` follows react-hook-form's isSubmitting.
 */
export function useSubmit<F extends FieldValues, D = unknown>(
  form: UseFormReturn<F>,
  opts: After<D> & {
    url: string | ((values: F) => string);
    method?: Method;
    body?: (values: F) => unknown;
    fields?: readonly string[];
    onDone?: (data: D, values: F) => void | Promise<void>;
  },
) {
  const after = useAfterSuccess();
  const [formError, setFormError] = useState<string | null>(null);
  const submit = form.handleSubmit(async (values) => {
    setFormError(null);
    const url = typeof opts.url === "function" ? opts.url(values) : opts.url;
    const res = await sendJson<D>(url, opts.body ? opts.body(values) : values, opts.method ?? "POST");
    if (!res.ok) {
      for (const [name, message] of fieldErrorsOf(res.fields, opts.fields)) form.setError(name as Path<F>, { message });
      setFormError(res.message);
      opts.onFail?.(res);
      return;
    }
    await opts.onDone?.(res.data, values);
    await after(opts);
  });
  return { submit, formError, setFormError, pending: form.formState.isSubmitting };
}

/**
 * The same path for a button without a form (delete, a status change, send): `run(body?)` sends,
 * shows the server's message as `error` and returns the answer, so the caller may branch on it.
 */
export function useAction<D = unknown>(opts: After<D> & { url: string; method?: Method }) {
  const after = useAfterSuccess();
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  async function run(body?: unknown, url = opts.url): Promise<ApiResult<D>> {
    setError(null);
    setPending(true);
    try {
      const res = await sendJson<D>(url, body, opts.method ?? "POST");
      if (!res.ok) {
        setError(res.message);
        opts.onFail?.(res);
        return res;
      }
      await opts.onDone?.(res.data);
      await after(opts);
      return res;
    } finally {
      setPending(false);
    }
  }
  return { run, error, setError, pending };
}
