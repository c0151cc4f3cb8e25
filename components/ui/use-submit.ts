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
  /** Runs after a good answer: after the invalidation, before the refresh (so it may navigate first). */
  onDone?: (data: D) => void | Promise<void>;
  /** Runs after a refusal, once the messages are shown (a 409's extra list, say). */
  onFail?: (failure: Failure) => void;
};

/**
 * What every good answer is followed by: invalidate, the caller's own step, refresh. The query client is
 * optional, as signed-out pages have no provider.
 */
function useAfterSuccess() {
  const router = useRouter();
  const queryClient = useContext(QueryClientContext);
  return async (opts: { refresh?: boolean; invalidate?: QueryKey[] }, done?: () => void | Promise<void>) => {
    for (const queryKey of opts.invalidate ?? []) await queryClient?.invalidateQueries({ queryKey });
    await done?.();
    if (opts.refresh ?? true) router.refresh();
  };
}

/**
 * One submit path for a react-hook-form form: send the values as JSON (or what `body` makes of them),
 * put the server's field messages beside their inputs (dotted paths), show its message as the form
 * error (render it with <FormError>), then refresh and/or invalidate. `fields` limits which names
 * the form holds; `pending` follows react-hook-form's isSubmitting.
 */
export function useSubmit<F extends FieldValues, D = unknown, T extends FieldValues = F>(
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- any form context
  form: UseFormReturn<F, any, T>,
  opts: Omit<After<D>, "onDone" | "onFail"> & {
    url: string | ((values: T) => string);
    method?: Method;
    /** What to send; by default the values the resolver passed (T). */
    body?: (values: T) => unknown;
    /** The names the form holds; a message for any other name stays out of the form. */
    fields?: readonly string[];
    /** Runs once the values have passed the check, before sending (clear a "saved" note). */
    onStart?: () => void;
    onDone?: (data: D, values: T) => void | Promise<void>;
    /** Runs after a refusal, once the messages are shown, with the values that were sent. */
    onFail?: (failure: Failure, values: T) => void;
  },
) {
  const after = useAfterSuccess();
  const [formError, setFormError] = useState<string | null>(null);
  // The path itself, for a second button that sends values already checked (go on with a reason).
  const send = async (values: T) => {
    setFormError(null);
    opts.onStart?.();
    const url = typeof opts.url === "function" ? opts.url(values) : opts.url;
    const res = await sendJson<D>(url, opts.body ? opts.body(values) : values, opts.method ?? "POST");
    if (!res.ok) {
      for (const [name, message] of fieldErrorsOf(res.fields, opts.fields)) form.setError(name as Path<F>, { message });
      setFormError(res.message);
      opts.onFail?.(res, values);
      return;
    }
    await after(opts, () => opts.onDone?.(res.data, values));
  };
  const submit = form.handleSubmit(send);
  return { submit, send, formError, setFormError, pending: form.formState.isSubmitting };
}

/**
 * The same path for a button without a form (delete, a status change, send): `run(body?)` sends,
 * shows the server's message as `error` and returns the answer, so the caller may branch on it.
 * A list of rows passes each row's `url` (and `method`) to `run` instead.
 */
export function useAction<D = unknown>(opts: After<D> & { url?: string; method?: Method }) {
  const after = useAfterSuccess();
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  async function run(body?: unknown, to: { url?: string; method?: Method } = {}): Promise<ApiResult<D>> {
    setError(null);
    setPending(true);
    try {
      const res = await sendJson<D>(to.url ?? opts.url ?? "", body, to.method ?? opts.method ?? "POST");
      if (!res.ok) {
        setError(res.message);
        opts.onFail?.(res);
        return res;
      }
      await after(opts, () => opts.onDone?.(res.data));
      return res;
    } finally {
      setPending(false);
    }
  }
  return { run, error, setError, pending };
}
