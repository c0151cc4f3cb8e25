"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { sendJson } from "@/lib/client/fetch-json";

/** "Pay by card": asks the server for the payment page of the link's invoice and goes there. The server re-checks the token. */
export function PayButton({ token, total }: { token: string; total: string }) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState("");

  async function pay() {
    setBusy(true);
    setError("");
    const res = await sendJson<{ url: string }>("/api/pay/checkout", { token });
    if (res.ok) {
      window.location.assign(res.data.url);
      return;
    }
    setBusy(false);
    // A link paid or withdrawn meanwhile: reload to show what it now says.
    if (res.status === 410) window.location.reload();
    setError(res.message);
  }

  return (
    <div className="flex flex-col gap-2">
      <Button type="button" onClick={pay} disabled={busy} aria-describedby="pay-error" className="w-full sm:w-fit">
        {busy ? "Opening the card payment page…" : `Pay ${total} by card`}
      </Button>
      <p id="pay-error" role="alert" className="min-h-6 font-bold text-flag">
        {error}
      </p>
    </div>
  );
}
