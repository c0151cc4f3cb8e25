"use client";

import { useState } from "react";
import { SubmitButton } from "@/components/ui/submit-button";
import { TextareaField } from "@/components/ui/textarea-field";
import { useSchemaForm } from "@/components/ui/use-schema-form";
import { sendInvoiceSchema } from "@/lib/invoices/schemas";

/** E-mails the invoice with its PDF and a fresh link to pay by card; sending again retires the older link. */
export function SendInvoice({ invoiceId, to, again }: { invoiceId: number; to: string | null; again: boolean }) {
  const [noteRefused, setNoteRefused] = useState(false);
  const { form, register, errors, submit, formError, pending, success } = useSchemaForm(
    sendInvoiceSchema,
    { note: "" },
    {
      url: `/api/invoices/${invoiceId}/send`,
      fields: ["note"],
      onFail: (f) => setNoteRefused(Boolean(f.fields.note)),
      onDone: (): void => form.reset({ note: "" }),
      success: (data: { sentTo: string }) => `Sent to ${data.sentTo} with the PDF and a link to pay.`,
    },
  );

  if (!to) return <p className="text-muted">Add the customer&apos;s e-mail to the job to send this invoice with a link to pay by card.</p>;

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3" aria-label="Send the invoice">
      <TextareaField
        id="invoice-note"
        label="A note at the top of the e-mail (optional)"
        rows={2}
        maxLength={1000}
        error={errors.note?.message}
        {...register("note")}
      />
      <div className="flex flex-wrap items-center gap-3">
        <SubmitButton pending={pending} busy="Sending…">
          {again ? `Send again to ${to}` : `E-mail it to ${to}`}
        </SubmitButton>
        <p role="status" aria-live="polite" className={formError ? "font-bold text-flag" : "text-ok"}>
          {formError ? (noteRefused ? "Check the note." : formError) : (success ?? "")}
        </p>
      </div>
      {again ? <p className="text-note text-muted">Sending again makes a new link; the one in the earlier e-mail stops working.</p> : null}
    </form>
  );
}
