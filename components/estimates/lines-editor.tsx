"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useFieldArray, useForm, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormError } from "@/components/ui/form-error";
import { useSubmit } from "@/components/ui/use-submit";
import { linesSchema, type LinesInput, type LinesValues } from "@/lib/estimates/schemas";
import { LINE_KIND_LABELS } from "@/lib/vocabulary";
import { computeTotals, formatMoney, formatTaxRate, parseMoney, parseQuantityMilli } from "@/lib/money";

/**
 * Edits priced lines (labour at the workshop's rate, parts from the job's Parts list, fixed fees) and shows the
 * totals as you type, with the same lib/money module the server uses; the server recomputes on save.
 */

export interface EditorPart {
  id: number;
  designator: string;
  replacementValue: string | null;
  replacementRating: string | null;
  unitCostMinor: number | null;
}

type Line = LinesInput["lines"][number];

export function LinesEditor({
  initial,
  parts,
  currency,
  hourlyRateMinor,
  taxRateBp,
  url,
  method,
  submitLabel,
  afterSave = "refresh",
}: {
  initial: Line[];
  parts: EditorPart[];
  currency: string;
  hourlyRateMinor: number;
  taxRateBp: number;
  url: string;
  method: "PUT" | "POST";
  submitLabel: string;
  /** "open-invoice": the answer is a new invoice; go to its page. */
  afterSave?: "refresh" | "open-invoice";
}) {
  const router = useRouter();
  const [saved, setSaved] = useState("");
  const form = useForm<LinesInput, unknown, LinesValues>({ resolver: zodResolver(linesSchema), defaultValues: { lines: initial } });
  const { register, control, formState } = form;
  const { fields, append, remove } = useFieldArray({ control, name: "lines" });
  const watched = useWatch({ control, name: "lines" }) ?? [];
  const money = (m: number) => formatMoney(m, currency);
  const partById = new Map(parts.map((p) => [p.id, p]));

  const priced = watched.map((l) => {
    const q = parseQuantityMilli(l?.quantity ?? "") ?? 0;
    const typed = l?.unitPrice ? parseMoney(l.unitPrice, currency) : null;
    const unit = l?.kind === "labour" ? hourlyRateMinor : l?.kind === "part" ? (typed ?? partById.get(Number(l.partId))?.unitCostMinor ?? 0) : (typed ?? 0);
    return { quantityMilli: q, unitPriceMinor: unit };
  });
  const totals = computeTotals(priced, taxRateBp);

  // A new invoice opens its own page; anything else reads the job again here.
  const { submit: onSubmit, formError } = useSubmit<LinesInput, { id?: number } | null, LinesValues>(form, {
    url,
    method,
    refresh: false,
    onStart: () => setSaved(""),
    onDone: (created) => {
      if (afterSave === "open-invoice" && created?.id) return router.push(`/invoices/${created.id}`);
      setSaved("Saved.");
      router.refresh();
    },
  });

  const addPart = (id: number) => {
    const p = partById.get(id);
    if (!p) return;
    const what = [p.replacementValue, p.replacementRating].filter(Boolean).join(" ");
    append({ kind: "part", description: `${p.designator}${what ? ` — ${what}` : ""}`, quantity: "1", unitPrice: "", partId: p.id });
  };

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-describedby="lines-error">
      {fields.length === 0 ? (
        <p className="rounded-card border-2 border-dashed border-rule p-6 text-center text-muted">
          No lines yet. Add labour, a part from the Parts list or a fee below.
        </p>
      ) : null}
      <ol className="flex flex-col gap-3">
        {fields.map((f, i) => {
          const kind = watched[i]?.kind ?? f.kind;
          const err = formState.errors.lines?.[i];
          const part = kind === "part" ? partById.get(Number(watched[i]?.partId)) : undefined;
          return (
            // One row of six on a wide screen; two columns on a tablet (six would not fit 768 px); one on a phone.
            <li key={f.id} className="grid gap-x-3 rounded-card border border-rule bg-paper p-3 sm:grid-cols-2 lg:grid-cols-[7rem_1fr_7rem_9rem_8rem_auto]">
              <div className="font-bold sm:pt-8">{LINE_KIND_LABELS[kind]}</div>
              <Field
                id={`line-${i}-description`}
                label="Description"
                error={err?.description?.message ?? err?.partId?.message}
                {...register(`lines.${i}.description`)}
              />
              <Field
                id={`line-${i}-quantity`}
                label={kind === "labour" ? "Hours" : "Qty"}
                inputMode="decimal"
                className="font-mono"
                error={err?.quantity?.message}
                {...register(`lines.${i}.quantity`)}
              />
              {kind === "labour" ? (
                <div className="flex flex-col gap-1">
                  <span className="font-bold">Rate</span>
                  <span className="min-h-11 py-2 font-mono">{money(hourlyRateMinor)}/h</span>
                </div>
              ) : (
                <Field
                  id={`line-${i}-price`}
                  label="Unit price"
                  inputMode="decimal"
                  placeholder={part?.unitCostMinor != null ? formatMoney(part.unitCostMinor, currency) : "0.00"}
                  error={err?.unitPrice?.message}
                  {...register(`lines.${i}.unitPrice`)}
                />
              )}
              <div className="flex flex-col gap-1 lg:text-right">
                <span className="font-bold">Amount</span>
                <span className="min-h-11 py-2 font-mono">{money(totals.lines[i] ?? 0)}</span>
              </div>
              <div className="sm:pt-7">
                <Button type="button" variant="quiet" onClick={() => remove(i)} aria-label={`Remove line ${i + 1}`}>
                  Remove
                </Button>
              </div>
            </li>
          );
        })}
      </ol>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="button" variant="secondary" onClick={() => append({ kind: "labour", description: "Bench labour", quantity: "1", unitPrice: "" })}>
          Add labour
        </Button>
        <Button type="button" variant="secondary" onClick={() => append({ kind: "fee", description: "Bench diagnosis fee", quantity: "1", unitPrice: "" })}>
          Add fee
        </Button>
        {parts.length ? (
          <label className="flex min-w-0 max-w-full flex-wrap items-center gap-2">
            <span className="font-bold">Add part</span>
            <select
              className="min-h-11 min-w-0 max-w-full rounded-chip border border-edge bg-panel px-3"
              value=""
              onChange={(e) => {
                addPart(Number(e.target.value));
                e.target.value = "";
              }}
            >
              <option value="">From the Parts list…</option>
              {parts.map((p) => (
                <option key={p.id} value={p.id}>
                  {p.designator} {p.replacementValue ?? ""} {p.unitCostMinor != null ? `(${formatMoney(p.unitCostMinor, currency)})` : "(no cost yet)"}
                </option>
              ))}
            </select>
          </label>
        ) : (
          <span className="text-note text-muted">Parts appear here once they are on the job&apos;s Parts list.</span>
        )}
      </div>
      <dl className="ml-auto grid w-full max-w-xs grid-cols-2 gap-y-1 font-mono">
        <dt className="font-sans text-muted">Subtotal</dt>
        <dd className="text-right">{money(totals.subtotalMinor)}</dd>
        <dt className="font-sans text-muted">Tax at {formatTaxRate(taxRateBp)}</dt>
        <dd className="text-right">{money(totals.taxMinor)}</dd>
        <dt className="font-sans font-bold">Total</dt>
        <dd className="text-right font-bold" data-testid="editor-total">
          {money(totals.totalMinor)}
        </dd>
      </dl>
      <FormError id="lines-error" message={formError} />
      <div className="flex items-center gap-3">
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Saving…" : submitLabel}
        </Button>
        <span role="status" className="text-ok">
          {saved}
        </span>
      </div>
    </form>
  );
}
