"use client";

import { useEffect, useState } from "react";
import type { Strength } from "@/lib/auth/strength";

type Check = (password: string, context?: string[]) => Strength;

let loading: Promise<Check> | undefined;
/** The checker and its dictionaries (megabytes) load on first keystroke, in a chunk of their own. */
function loadChecker(): Promise<Check> {
  loading ??= import("@/lib/auth/strength").then((m) => m.passwordStrength);
  return loading;
}

const LABELS = ["Very easy to guess", "Easy to guess", "Could be guessed", "Good", "Strong"] as const;

/**
 * The same verdict the server gives (lib/auth/strength.ts), shown under a new-password field while typing.
 * `context` holds the person's name, e-mail and workshop: a password made of them counts as weak.
 */
export function PasswordStrength({ id, password, context = [] }: { id: string; password: string; context?: string[] }) {
  const [checked, setChecked] = useState<Strength | null>(null);
  const contextKey = context.join("\n");
  useEffect(() => {
    if (!password) return;
    let live = true;
    const timer = setTimeout(() => {
      void loadChecker().then((check) => {
        if (live) setChecked(check(password, contextKey ? contextKey.split("\n") : []));
      });
    }, 150);
    return () => {
      live = false;
      clearTimeout(timer);
    };
  }, [password, contextKey]);
  // The last verdict stays up while the next is worked out; an empty field shows none.
  const result = password ? checked : null;

  const score = result?.score ?? -1;
  const tone = score >= 3 ? "bg-ok" : score >= 0 ? "bg-caution" : "bg-sunk";
  return (
    <div id={id} aria-live="polite" data-testid="password-strength" className="flex min-h-10 flex-col gap-1">
      <div className="flex gap-1" aria-hidden="true">
        {[0, 1, 2, 3, 4].map((i) => (
          <span key={i} className={`h-1.5 flex-1 rounded-full ${i <= score ? tone : "bg-sunk"}`} />
        ))}
      </div>
      {result ? (
        <p className={`text-note ${result.ok ? "text-ok" : "text-caution"}`}>
          <span className="font-bold">{LABELS[result.score]}.</span> {result.ok ? "" : result.message}
        </p>
      ) : null}
    </div>
  );
}
