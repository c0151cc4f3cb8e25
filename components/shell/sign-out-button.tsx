"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { useAction } from "@/components/ui/use-submit";

export function SignOutButton() {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  // Whatever the answer, the page goes to sign-in: the session is gone or the server will ask again.
  const { run } = useAction({ url: "/api/auth/sign-out", refresh: false });
  return (
    <button
      type="button"
      disabled={busy}
      className="rounded-chip px-3 py-2 font-bold text-ink hover:bg-sunk min-h-11"
      onClick={async () => {
        setBusy(true);
        await run({});
        router.push("/sign-in");
        router.refresh();
      }}
    >
      Sign out
    </button>
  );
}
