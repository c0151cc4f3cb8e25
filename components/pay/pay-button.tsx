"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { useAction } from "@/components/ui/use-submit";

/** "Pay by card": asks the server for the payment page of the link's invoice and goes there. The server re-checks the token. */
export function PayButton({ token, total }: { token: string; total: string }) {
  // Set once the payment page is on its way, so the button stays busy while the browser leaves.
  const [leaving, setLeaving] = useState(false);
  const { run, error, pending } = useAction<{ url: string }>({
    url: "/api/pay/checkout",
    refresh: false,
    onDone: (data) => {
      setLeaving(true);
      window.location.assign(data.url);
    },
    // A link paid or withdrawn meanwhile: reload to show what it now says.
    onFail: (f) => {
      if (f.status === 410) window.location.reload();
    },
  });
  const busy = pending || leaving;

  async function pay() {
    await run({ token });
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
