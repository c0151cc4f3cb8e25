import type { ComponentProps, ReactNode } from "react";
import { FieldNotes } from "./field-notes";

/** A labelled input whose message is tied to it with aria-describedby and announced when it appears. */
export function Field({
  id,
  label,
  error,
  hint,
  suffix,
  className = "",
  ...input
}: ComponentProps<"input"> & { id: string; label: ReactNode; error?: string; hint?: ReactNode; suffix?: ReactNode }) {
  const describedBy = [error ? `${id}-error` : null, hint ? `${id}-hint` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="font-bold">
        {label}
      </label>
      <div className="flex items-stretch">
        <input
          id={id}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          className={`min-h-11 w-full rounded-chip border bg-panel px-3 py-2 text-body text-ink placeholder:text-muted ${
            error ? "border-flag" : "border-edge"
          } ${suffix ? "rounded-r-none" : ""}`}
          {...input}
        />
        {suffix ? (
          <span className="inline-flex items-center rounded-r-chip border border-l-0 border-edge bg-sunk px-3 font-mono text-muted">{suffix}</span>
        ) : null}
      </div>
      <FieldNotes id={id} hint={hint} error={error} />
    </div>
  );
}
