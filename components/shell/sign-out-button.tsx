"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { sendJson } from "@/lib/client/fetch-json";

export function SignOutButton() {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  return (
    <button
      type="button"
      disabled={busy}
      className="rounded-chip px-3 py-2 font-bold text-ink hover:bg-sunk min-h-11"
      onClick={async () => {
        setBusy(true);
        await sendJson("/api/auth/sign-out", {});
        router.push("/sign-in");
        router.refresh();
      }}
    >
      Sign out
    </button>
  );
}
