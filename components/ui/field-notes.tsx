import type { ReactNode } from "react";

/** The hint and the announced error message under a form control, with the ids its aria-describedby names. */
export function FieldNotes({ id, hint, error }: { id: string; hint?: ReactNode; error?: string }) {
  return (
    <>
      {hint ? (
        <p id={`${id}-hint`} className="text-note text-muted">
          {hint}
        </p>
      ) : null}
      <p id={`${id}-error`} role="alert" className="min-h-5 text-note font-bold text-flag">
        {error ?? ""}
      </p>
    </>
  );
}
