import type { ReactNode } from "react";
import { Button } from "./button";
import { FormError } from "./form-error";
import { SubmitButton } from "./submit-button";

/** The foot of a two-column add-or-edit form: its message, the submit button, and Cancel when the form edits in place. */
export function FormActions({
  errorId,
  formError,
  pending,
  busy,
  children,
  onCancel,
}: {
  errorId?: string;
  formError: string | null;
  pending: boolean;
  busy: ReactNode;
  children: ReactNode;
  onCancel?: () => void;
}) {
  return (
    <>
      <FormError id={errorId} message={formError} className="min-h-6 font-bold text-flag sm:col-span-2" />
      <div className="flex flex-wrap gap-3 sm:col-span-2">
        <SubmitButton pending={pending} busy={busy}>
          {children}
        </SubmitButton>
        {onCancel ? (
          <Button type="button" variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </>
  );
}
