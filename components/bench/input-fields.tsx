"use client";

import dynamic from "next/dynamic";
import { useFormContext } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { InputLabel } from "@/components/ui/quantity-symbol";
import type { InputMeta } from "@/lib/calc/types";
import { errorAt } from "@/lib/bench/errors";

/** The row-by-row list editors (filter stages, heaters, bands, pilot lamps) serve a few calculators; the rest never fetch them. */
const ListInput = dynamic(() => import("./list-inputs").then((m) => m.ListInput));

/** Shown beside a field: the unit a bare number is read in. */
export function unitSuffix(unit: string) {
  return unit ? <span title={`A bare number is read in ${unit}; add a prefix such as k, m or µ`}>{unit}</span> : undefined;
}

const inputClass = "min-h-11 w-full rounded-chip border bg-panel px-3 py-2 text-body text-ink";

function Message({ id, error }: { id: string; error?: string }) {
  return (
    <p id={`${id}-error`} role="alert" className="min-h-5 text-note font-bold text-flag">
      {error ?? ""}
    </p>
  );
}

function Hint({ id, help }: { id: string; help?: string }) {
  return help ? (
    <p id={`${id}-hint`} className="text-note text-muted">
      {help}
    </p>
  ) : null;
}

const describedBy = (id: string, error?: string, help?: string) =>
  [error ? `${id}-error` : null, help ? `${id}-hint` : null].filter(Boolean).join(" ") || undefined;

/** One input of a calculator, rendered as its metadata asks. */
export function InputControl({ meta, slug }: { meta: InputMeta; slug: string }) {
  const { register, formState, getValues } = useFormContext();
  const id = `in-${meta.name}`;
  // Also rendered into the server's HTML, so the page shows the figures before the script arrives.
  const initial: unknown = getValues(meta.name);
  const error = errorAt(formState.errors, meta.name);
  const label = (
    <>
      <InputLabel meta={meta} />
      {!meta.required ? <span className="ml-1 font-normal text-muted">(optional)</span> : null}
    </>
  );

  if (meta.control === "list") return <ListInput meta={meta} slug={slug} />;

  if (meta.control === "boolean") {
    return (
      <div className="flex flex-col gap-1">
        <label htmlFor={id} className="flex min-h-11 cursor-pointer items-center gap-3 font-bold">
          <input
            id={id}
            type="checkbox"
            className="h-5 w-5 accent-[rgb(var(--gb-glow))]"
            aria-describedby={describedBy(id, error, meta.help)}
            defaultChecked={initial === true}
            {...register(meta.name)}
          />
          <InputLabel meta={meta} />
        </label>
        <Hint id={id} help={meta.help} />
        <Message id={id} error={error} />
      </div>
    );
  }

  if (meta.control === "select") {
    return (
      <div className="flex flex-col gap-1">
        <label htmlFor={id} className="font-bold">
          {label}
        </label>
        <select
          id={id}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(id, error, meta.help)}
          className={`${inputClass} ${error ? "border-flag" : "border-edge"}`}
          defaultValue={typeof initial === "string" ? initial : undefined}
          {...register(meta.name)}
        >
          {!meta.required && meta.default === undefined ? <option value="">{meta.blankLabel ?? "None"}</option> : null}
          {(meta.options ?? []).map((o) => (
            <option key={o} value={o}>
              {o.charAt(0).toUpperCase() + o.slice(1)}
            </option>
          ))}
        </select>
        <Hint id={id} help={meta.help} />
        <Message id={id} error={error} />
      </div>
    );
  }

  return (
    <Field
      id={id}
      label={label}
      error={error}
      hint={meta.help}
      suffix={unitSuffix(meta.unit)}
      autoComplete="off"
      spellCheck={false}
      inputMode="text"
      className="gb-field"
      defaultValue={typeof initial === "string" ? initial : undefined}
      {...register(meta.name)}
    />
  );
}
