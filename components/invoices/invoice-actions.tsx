"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button, buttonClass } from "@/components/ui/button";
import { sendJson } from "@/lib/client/fetch-json";
import type { InvoiceStatus } from "@/lib/vocabulary";

/** Pay by card (the payment service's checkout page), the PDF, and voiding an unpaid invoice. */
export function InvoiceActions({ invoiceId, status }: { invoiceId: number; status: InvoiceStatus }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState("");

  async function pay() {
    setBusy(true);
    setError("");
    const res = await sendJson<{ url: string }>(`/api/invoices/${invoiceId}/checkout`, {});
    if (res.ok) {
      window.location.assign(res.data.url);
      return;
    }
    setBusy(false);
    setError(res.message);
  }

  async function voidIt() {
    if (!window.confirm("Void this invoice? Its number stays used, and a new invoice can then be issued.")) return;
    setBusy(true);
    const res = await sendJson(`/api/invoices/${invoiceId}/void`, {});
    setBusy(false);
    if (res.ok) router.refresh();
    else setError(res.message);
  }

  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap gap-3">
        {status === "issued" ? (
          <Button type="button" onClick={pay} disabled={busy}>
            {busy ? "Opening the payment page…" : "Pay by card"}
          </Button>
        ) : null}
        <a className={buttonClass("secondary")} href={`/api/invoices/${invoiceId}/pdf`} target="_blank" rel="noopener">
          Invoice PDF
        </a>
        {status === "issued" ? (
          <Button type="button" variant="quiet" onClick={voidIt} disabled={busy}>
            Void
          </Button>
        ) : null}
      </div>
      <p role="alert" className="min-h-6 font-bold text-flag">
        {error}
      </p>
    </div>
  );
}
