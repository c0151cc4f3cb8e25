"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button, buttonClass } from "@/components/ui/button";
import { useAction } from "@/components/ui/use-submit";
import type { InvoiceStatus } from "@/lib/vocabulary";

/** Pay by card (the payment service's checkout page), the PDF, and voiding an unpaid invoice. */
export function InvoiceActions({ invoiceId, status }: { invoiceId: number; status: InvoiceStatus }) {
  const router = useRouter();
  // Once the payment page is opening, the buttons stay off until the browser leaves.
  const [leaving, setLeaving] = useState(false);
  const { run, error, pending } = useAction({ refresh: false });
  const busy = pending || leaving;

  async function pay() {
    const res = await run({}, { url: `/api/invoices/${invoiceId}/checkout` });
    if (res.ok) {
      setLeaving(true);
      window.location.assign((res.data as { url: string }).url);
    }
  }

  async function voidIt() {
    if (!window.confirm("Void this invoice? Its number stays used, and a new invoice can then be issued.")) return;
    const res = await run({}, { url: `/api/invoices/${invoiceId}/void` });
    if (res.ok) router.refresh();
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
        {error ?? ""}
      </p>
    </div>
  );
}
