"use client";

import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { useAction } from "@/components/ui/use-submit";
import { firstMessage } from "@/lib/client/submit-errors";
import { drillAssignmentSchema } from "@/lib/drills/schemas";
import { fieldErrors } from "@/lib/field-errors";
import { StartDrillButton } from "./start-drill-button";

const inThreeDays = () => new Date(Date.now() + 3 * 86_400_000).toISOString().slice(0, 10);

/**
 * "Do this one yourself" on a saved calculation. Owners and technicians set it as a drill for an apprentice,
 * due on a date; an apprentice makes one for themselves at once.
 */
export function DoItYourself({ calculationId, apprentices }: { calculationId: number; apprentices: { userId: number; name: string }[] | null }) {
  const id = useId();
  const [apprentice, setApprentice] = useState(String(apprentices?.[0]?.userId ?? ""));
  const [due, setDue] = useState(inThreeDays);
  const [done, setDone] = useState<string | null>(null);
  // One status line: the first field message of a refusal, else its message; or what was set.
  const { run, error, setError } = useAction<{ assignment: { apprentice: { name: string }; dueDate: string } }>({
    url: "/api/drills/assignments",
    onFail: (f) => setError(firstMessage(f)),
    onDone: (data) => setDone(`Set for ${data.assignment.apprentice.name}, due ${data.assignment.dueDate}.`),
  });
  const status = error ? { ok: false, message: error } : done ? { ok: true, message: done } : null;
  if (apprentices === null) return <StartDrillButton body={{ calculationId }} label="Do this one yourself" className="mt-3 w-fit" />;
  if (apprentices.length === 0) return null;

  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    const parsed = drillAssignmentSchema.safeParse({ apprentice, calculationId, due });
    setDone(null);
    if (!parsed.success) return setError(Object.values(fieldErrors(parsed.error))[0]);
    await run(parsed.data);
  };
  return (
    <details className="mt-3 rounded-chip border border-rule">
      <summary className="flex min-h-11 cursor-pointer items-center px-3 font-bold text-signal">Do this one yourself: set it as a drill</summary>
      <form onSubmit={submit} noValidate className="grid gap-2 px-3 pb-3 sm:grid-cols-2" aria-label="Set this calculation as a drill">
        <label className="flex flex-col gap-1 text-note font-bold" htmlFor={`${id}-who`}>
          For
          <select
            id={`${id}-who`}
            value={apprentice}
            onChange={(e) => setApprentice(e.target.value)}
            className="min-h-11 rounded-chip border border-edge bg-panel px-2 font-normal"
          >
            {apprentices.map((a) => (
              <option key={a.userId} value={a.userId}>
                {a.name}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-note font-bold" htmlFor={`${id}-due`}>
          Due
          <input
            id={`${id}-due`}
            type="date"
            value={due}
            onChange={(e) => setDue(e.target.value)}
            className="min-h-11 rounded-chip border border-edge bg-panel px-2 font-normal"
          />
        </label>
        <Button type="submit" variant="secondary" className="sm:col-span-2">
          Set the drill
        </Button>
        <p role="status" aria-live="polite" className={`text-note font-bold sm:col-span-2 ${status?.ok ? "text-ok" : "text-flag"}`}>
          {status?.message ?? ""}
        </p>
      </form>
    </details>
  );
}
