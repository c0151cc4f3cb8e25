import type { ComponentProps, ReactNode } from "react";
import { FieldNotes } from "./field-notes";

/** A labelled select whose message is tied to it with aria-describedby, like Field. */
export function SelectField({
  id,
  label,
  error,
  hint,
  options,
  className = "",
  ...select
}: ComponentProps<"select"> & { id: string; label: ReactNode; error?: string; hint?: ReactNode; options: readonly { value: string; label: string }[] }) {
  const describedBy = [error ? `${id}-error` : null, hint ? `${id}-hint` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="font-bold">
        {label}
      </label>
      <select
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`min-h-11 w-full rounded-chip border bg-panel px-3 py-2 text-body text-ink ${error ? "border-flag" : "border-edge"}`}
        {...select}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <FieldNotes id={id} hint={hint} error={error} />
    </div>
  );
}
