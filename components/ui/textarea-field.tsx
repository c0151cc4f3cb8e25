import type { ComponentProps, ReactNode } from "react";
import { FieldNotes } from "./field-notes";

export function TextareaField({
  id,
  label,
  error,
  hint,
  className = "",
  ...area
}: ComponentProps<"textarea"> & { id: string; label: ReactNode; error?: string; hint?: ReactNode }) {
  const describedBy = [error ? `${id}-error` : null, hint ? `${id}-hint` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="font-bold">
        {label}
      </label>
      <textarea
        id={id}
        rows={3}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`w-full rounded-chip border bg-panel px-3 py-2 text-body text-ink placeholder:text-muted ${error ? "border-flag" : "border-edge"}`}
        {...area}
      />
      <FieldNotes id={id} hint={hint} error={error} />
    </div>
  );
}
