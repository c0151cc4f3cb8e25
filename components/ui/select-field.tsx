import type { ComponentProps, ReactNode } from "react";

/** A labelled select with its message tied by aria-describedby, like Field. */
export function SelectField({
  id,
  label,
  error,
  options,
  className = "",
  ...select
}: ComponentProps<"select"> & { id: string; label: ReactNode; error?: string; options: readonly { value: string; label: string }[] }) {
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="font-bold">
        {label}
      </label>
      <select
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={`min-h-11 w-full rounded-chip border bg-panel px-3 py-2 text-body text-ink ${error ? "border-hazard" : "border-rule"}`}
        {...select}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <p id={`${id}-error`} role="alert" className="min-h-5 text-note font-bold text-hazard">
        {error ?? ""}
      </p>
    </div>
  );
}
