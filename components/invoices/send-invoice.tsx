"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { TextareaField } from "@/components/ui/textarea-field";
import { sendJson } from "@/lib/client/fetch-json";
import { sendInvoiceSchema, type SendInvoiceInput } from "@/lib/invoices/schemas";

/** E-mails the invoice with its PDF and a fresh link to pay by card; sending again retires the older link. */
export function SendInvoice({ invoiceId, to, again }: { invoiceId: number; to: string | null; again: boolean }) {
  const router = useRouter();
  const [result, setResult] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, setError, reset, formState: { errors, isSubmitting } } = useForm<SendInvoiceInput>({
    resolver: zodResolver(sendInvoiceSchema),
    defaultValues: { note: "" },
  });

  if (!to) return <p className="text-muted">Add the customer&apos;s e-mail to the job to send this invoice with a link to pay by card.</p>;

  const onSubmit = handleSubmit(async (values) => {
    setResult(null);
    const res = await sendJson<{ sentTo: string }>(`/api/invoices/${invoiceId}/send`, values);
    if (!res.ok) {
      if (res.fields.note) setError("note", { message: res.fields.note });
      setResult({ ok: false, text: res.fields.note ? "Check the note." : res.message });
      return;
    }
    reset({ note: "" });
    setResult({ ok: true, text: `Sent to ${res.data.sentTo} with the PDF and a link to pay.` });
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3" aria-label="Send the invoice">
      <TextareaField id="invoice-note" label="A note at the top of the e-mail (optional)" rows={2} maxLength={1000} error={errors.note?.message} {...register("note")} />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? "Sending…" : again ? `Send again to ${to}` : `E-mail it to ${to}`}
        </Button>
        <p role="status" aria-live="polite" className={result?.ok ? "text-ok" : "font-bold text-flag"}>
          {result?.text ?? ""}
        </p>
      </div>
      {again ? <p className="text-note text-muted">Sending again makes a new link; the one in the earlier e-mail stops working.</p> : null}
    </form>
  );
}
