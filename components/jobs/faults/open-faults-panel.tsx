import { Link } from "@/components/ui/link";
import { Card } from "@/components/ui/card";
import type { FaultState } from "@/lib/vocabulary";
import { FaultStateBadge } from "./fault-state-badge";

/** The Overview's short list of faults not yet fixed, each linking to the Faults tab. Nothing shows when all are fixed. */
export function OpenFaultsPanel({
  jobId,
  faults,
}: {
  jobId: number;
  faults: readonly { id: number; symptom: string; state: FaultState; candidates: readonly { status: string }[] }[];
}) {
  const open = faults.filter((f) => f.state !== "fixed");
  return (
    <Card>
      <h2 className="mb-3 text-lead font-bold">Open faults</h2>
      {open.length ? (
        <ul className="flex flex-col gap-2" data-testid="open-faults">
          {open.map((f) => {
            const left = f.candidates.filter((c) => c.status === "open").length;
            return (
              <li key={f.id}>
                <Link href={`/jobs/${jobId}/faults`} className="flex flex-wrap items-baseline justify-between gap-2 rounded-chip py-1 hover:underline">
                  <span className="min-w-0 font-bold">{f.symptom}</span>
                  <FaultStateBadge state={f.state} />
                </Link>
                {f.state === "open" ? (
                  <p className="text-note text-muted">
                    {left ? `${left} ${left === 1 ? "candidate" : "candidates"} still to test` : "No candidates listed yet"}
                  </p>
                ) : null}
              </li>
            );
          })}
        </ul>
      ) : (
        <p className="text-muted" data-testid="no-open-faults">
          {faults.length ? "Every fault noted is fixed." : "No faults noted."}{" "}
          <Link href={`/jobs/${jobId}/faults`} className="font-bold text-signal underline-offset-4 hover:underline">
            Faults
          </Link>
        </p>
      )}
    </Card>
  );
}
