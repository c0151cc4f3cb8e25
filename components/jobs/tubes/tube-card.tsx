"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { tubeUpdateSchema } from "@/lib/jobs/tube-schemas";
import type { Tube } from "@/db/queries/tubes";
import { RemoveButton } from "../remove-button";
import { useRecordForm } from "../record-form";
import { DifferencesList } from "./differences-list";
import { TubeFields, tubeBody, type TubeForm } from "./tube-fields";
import { VERDICT_HINTS, VerdictBadge } from "./tube-verdict";

type TubeView = Pick<Tube, "id" | "position" | "type" | "function" | "test" | "verdict" | "substitute" | "differences">;

const num = (n: number) => String(Number(n.toPrecision(4)));

/** The tester's reading against its own minimum, as a short bar: the minimum is the mark, the bar the reading. */
function TestMeter({ test }: { test: { reading: number; minimum: number } }) {
  const top = Math.max(test.reading, test.minimum) * 1.25 || 1;
  const below = test.reading < test.minimum;
  return (
    <div className="flex flex-col gap-1" data-testid="tube-test">
      <p className="text-note">
        <span className="text-muted">Tester </span>
        <span className="font-mono font-bold">{num(test.reading)}</span>
        <span className="text-muted"> against its minimum </span>
        <span className="font-mono">{num(test.minimum)}</span>
        {below ? <span className="ml-1 font-bold text-caution">below</span> : null}
      </p>
      <div className="relative h-2 w-full max-w-56 rounded-full bg-sunk" aria-hidden="true">
        <div className={`h-2 rounded-full ${below ? "bg-caution" : "bg-ok"}`} style={{ width: `${(test.reading / top) * 100}%` }} />
        <div className="absolute -top-1 h-4 w-0.5 bg-ink" style={{ left: `${(test.minimum / top) * 100}%` }} />
      </div>
    </div>
  );
}

function EditTube({ jobId, tube, onClose }: { jobId: number; tube: TubeView; onClose: () => void }) {
  const defaults: TubeForm = {
    position: tube.position,
    type: tube.type,
    function: tube.function ?? "",
    test: { reading: tube.test ? num(tube.test.reading) : "", minimum: tube.test ? num(tube.test.minimum) : "" },
    verdict: tube.verdict,
    substitute: tube.substitute ?? "",
  };
  const { form, onSubmit, formError } = useRecordForm<TubeForm, typeof tubeUpdateSchema>(tubeUpdateSchema, {
    url: `/api/jobs/${jobId}/tubes/${tube.id}`,
    method: "PATCH",
    defaults,
    prepare: (v) => tubeBody(v, null),
    onDone: onClose,
  });
  const { errors, isSubmitting } = form.formState;
  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Edit ${tube.position}`} className="mt-3 grid gap-x-3 border-t border-rule pt-3 sm:grid-cols-2">
      <TubeFields idPrefix={`tube-${tube.id}`} register={form.register} errors={errors} />
      <div className="flex flex-wrap items-center gap-3 sm:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          Save
        </Button>
        <Button type="button" variant="secondary" onClick={onClose}>
          Cancel
        </Button>
        <p role="alert" aria-live="polite" className="font-bold text-flag">
          {formError ?? ""}
        </p>
      </div>
    </form>
  );
}

/** One socket: where it is, what is in it, how it tested, and what a substitute changes. */
export function TubeCard({ jobId, tube, canDelete }: { jobId: number; tube: TubeView; canDelete: boolean }) {
  const [editing, setEditing] = useState(false);
  const danger = tube.differences.some((d) => d.level === "danger");
  const action = tube.test || tube.verdict !== "not-tested" ? "Edit result" : "Record result";
  return (
    <li
      className={`rounded-card border bg-panel p-4 shadow-card ${tube.verdict === "short" || danger ? "border-hazard/60" : "border-rule"}`}
      data-testid={`tube-${tube.position}`}
    >
      <div className="flex items-start justify-between gap-3">
        <div className="min-w-0 flex-1">
          <p className="flex flex-wrap items-baseline gap-x-3">
            <span className="font-mono text-lead font-bold">{tube.position}</span>
            <span className="font-mono text-lead">{tube.type}</span>
          </p>
          {tube.function ? <p className="text-muted">{tube.function}</p> : null}
        </div>
        <div className="shrink-0">
          <VerdictBadge verdict={tube.verdict} />
        </div>
      </div>
      <div className="mt-2 flex flex-col gap-2">
        {tube.test ? <TestMeter test={tube.test} /> : null}
        {tube.verdict !== "not-tested" && tube.verdict !== "strong" && tube.verdict !== "serviceable" ? (
          <p className={`text-note ${tube.verdict === "short" ? "font-bold text-hazard" : "text-muted"}`}>{VERDICT_HINTS[tube.verdict]}</p>
        ) : null}
        {tube.substitute ? <DifferencesList original={tube.type} substitute={tube.substitute} differences={tube.differences} /> : null}
      </div>
      {editing ? (
        <EditTube jobId={jobId} tube={tube} onClose={() => setEditing(false)} />
      ) : (
        <div className="mt-3 flex flex-wrap items-center gap-2">
          <Button type="button" variant="secondary" onClick={() => setEditing(true)} aria-label={`${action} of ${tube.position} ${tube.type}`}>
            {action}
          </Button>
          {canDelete ? (
            <RemoveButton
              url={`/api/jobs/${jobId}/tubes/${tube.id}`}
              confirm={`Remove ${tube.position} (${tube.type}) from the tubes?`}
              label={`Remove ${tube.position}`}
            />
          ) : null}
        </div>
      )}
    </li>
  );
}
