import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { DoItYourself } from "@/components/drills/do-it-yourself";
import { RemoveButton } from "@/components/jobs/remove-button";
import { loadJobPage, type JobPageProps } from "@/components/jobs/load-job";
import { ButtonLink } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/card";
import { InputLabel } from "@/components/ui/quantity-symbol";
import { listCalculations } from "@/db/queries/calculations";
import { listMembers } from "@/db/queries/members";
import { can } from "@/lib/auth/can";
import { formatQuantity } from "@/lib/calc/format";
import { getCalculator } from "@/lib/calc/registry";
import { benchHref } from "@/lib/calc/share";
import { reopenInputs } from "@/lib/bench/reopen-inputs";
import { formatDateTime } from "@/lib/jobs/dates";

export const metadata: Metadata = { title: "Calculations" };

function show(value: unknown, unit: string): string {
  if (typeof value === "number") return formatQuantity(value, unit);
  if (typeof value === "boolean") return value ? "yes" : "no";
  if (value === null || value === undefined) return "—";
  return typeof value === "string" ? value : Array.isArray(value) ? `${value.length} items` : "…";
}

export default async function CalculationsPage({ params }: JobPageProps) {
  const { member, job } = await loadJobPage((await params).id, "calculations");
  const calcs = listCalculations(member, job.id);
  // "Do this one yourself": mentors set it for an apprentice; an apprentice makes one at once (null).
  const apprentices = can.assignDrills(member)
    ? listMembers(member)
        .filter((m) => m.role === "apprentice")
        .map((m) => ({ userId: m.userId, name: m.name }))
    : null;
  if (calcs.length === 0) {
    return (
      <EmptyState title="No calculations saved to this job" action={<ButtonLink href="/bench">Open the Bench</ButtonLink>}>
        Work something out on the Bench — a cathode resistor, a bleeder, a dropping resistor — and save it to this job with a note.
      </EmptyState>
    );
  }
  return (
    <ul className="grid gap-4 md:grid-cols-2" data-testid="calculations">
      {calcs.map((c) => {
        const calc = getCalculator(c.slug);
        const inputs = calc?.inputs.filter((i) => c.inputs[i.name] !== undefined) ?? [];
        const outputs = calc?.outputs.filter((o) => c.outputs[o.name] !== undefined && typeof c.outputs[o.name] !== "object") ?? [];
        return (
          <li key={c.id} className="flex flex-col rounded-card border border-rule bg-panel p-5 shadow-card">
            <div className="flex items-start justify-between gap-3">
              <h2 className="text-lead font-bold">{calc?.title ?? c.slug}</h2>
              {can.editJobs(member) ? (
                <RemoveButton
                  url={`/api/jobs/${job.id}/calculations/${c.id}`}
                  confirm="Remove this saved calculation?"
                  label={`Remove ${calc?.title ?? c.slug}`}
                />
              ) : null}
            </div>
            <p className="text-note text-muted">
              {c.author?.name ?? "A former member"} · {formatDateTime(c.createdAt)}
            </p>
            {c.note ? <p className="mt-2 border-l-4 border-glow pl-3 italic">{c.note}</p> : null}
            <dl className="mt-3 grid grid-cols-2 gap-x-4 gap-y-1 text-note">
              {inputs.map((i) => (
                <div key={i.name} className="contents">
                  <dt className="text-muted">
                    <InputLabel meta={i} />
                  </dt>
                  <dd className="font-mono">{show(c.inputs[i.name], i.unit)}</dd>
                </div>
              ))}
            </dl>
            <dl className="mt-3 grid grid-cols-2 gap-x-4 gap-y-1 border-t border-rule pt-3">
              {outputs.map((o) => (
                <div key={o.name} className="contents">
                  <dt className="text-muted">{o.label}</dt>
                  <dd className="font-mono font-bold">{show(c.outputs[o.name], o.unit)}</dd>
                </div>
              ))}
            </dl>
            <Link
              href={benchHref(c.slug, calc ? reopenInputs(calc.inputs, c.inputs) : c.inputs)}
              className="mt-4 w-fit font-bold text-signal underline underline-offset-4"
            >
              Reopen in the Bench
            </Link>
            <DoItYourself calculationId={c.id} apprentices={apprentices} />
          </li>
        );
      })}
    </ul>
  );
}
