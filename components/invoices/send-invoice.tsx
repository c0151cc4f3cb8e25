"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { TextareaField } from "@/components/ui/textarea-field";
import { useSubmit } from "@/components/ui/use-submit";
import { sendInvoiceSchema, type SendInvoiceInput } from "@/lib/invoices/schemas";

/** E-mails the invoice with its PDF and a fresh link to pay by card; sending again retires the older link. */
export function SendInvoice({ invoiceId, to, again }: { invoiceId: number; to: string | null; again: boolean }) {
  const [sent, setSent] = useState<string | null>(null);
  const [noteRefused, setNoteRefused] = useState(false);
  const form = useForm<SendInvoiceInput>({ resolver: zodResolver(sendInvoiceSchema), defaultValues: { note: "" } });
  const {
    register,
    reset,
    formState: { errors },
  } = form;
  const {
    submit: onSubmit,
    formError,
    pending: isSubmitting,
  } = useSubmit<SendInvoiceInput, { sentTo: string }>(form, {
    url: `/api/invoices/${invoiceId}/send`,
    fields: ["note"],
    onStart: () => setSent(null),
    onFail: (f) => setNoteRefused(Boolean(f.fields.note)),
    onDone: (data) => {
      reset({ note: "" });
      setSent(`Sent to ${data.sentTo} with the PDF and a link to pay.`);
    },
  });

  if (!to) return <p className="text-muted">Add the customer&apos;s e-mail to the job to send this invoice with a link to pay by card.</p>;

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3" aria-label="Send the invoice">
      <TextareaField
        id="invoice-note"
        label="A note at the top of the e-mail (optional)"
        rows={2}
        maxLength={1000}
        error={errors.note?.message}
        {...register("note")}
      />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? "Sending…" : again ? `Send again to ${to}` : `E-mail it to ${to}`}
        </Button>
        <p role="status" aria-live="polite" className={formError ? "font-bold text-flag" : "text-ok"}>
          {formError ? (noteRefused ? "Check the note." : formError) : (sent ?? "")}
        </p>
      </div>
      {again ? <p className="text-note text-muted">Sending again makes a new link; the one in the earlier e-mail stops working.</p> : null}
    </form>
  );
}
