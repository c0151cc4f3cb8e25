"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { DrillResult, PublicDrill } from "@/db/queries/drills";
import { DangerBanner } from "@/components/bench/danger-banner";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { useSubmit } from "@/components/ui/use-submit";
import { drillAnswerSchema } from "@/lib/drills/schemas";
import { z } from "zod";
import { DrillWorking } from "./drill-working";
import { StartDrillButton } from "./start-drill-button";

/** The answer box reads text; the server reads "1.5k", "250 mW" and the rest with the Bench's parser. */
const formSchema = z.object({ answer: drillAnswerSchema.shape.answer.pipe(z.string()) });
type FormValues = z.input<typeof formSchema>;

const VERDICT: Record<DrillResult["verdict"], { title: string; tone: string }> = {
  correct: { title: "Right", tone: "border-ok bg-ok-bg" },
  "wrong-number": { title: "Not quite", tone: "border-flag bg-flag-bg" },
  "wrong-unit": { title: "Wrong unit", tone: "border-flag bg-flag-bg" },
  unreadable: { title: "Could not read that", tone: "border-flag bg-flag-bg" },
};

export function DrillPanel({
  drill,
  initial,
  mine,
  serverHtml,
}: {
  drill: PublicDrill;
  initial: DrillResult | null;
  mine: boolean;
  serverHtml?: Record<string, string>;
}) {
  const router = useRouter();
  const [result, setResult] = useState<DrillResult | null>(initial);
  const form = useForm<FormValues>({ resolver: zodResolver(formSchema), defaultValues: { answer: "" } });
  const {
    register,
    formState: { errors, isSubmitting },
  } = form;

  const {
    submit: onSubmit,
    formError,
    setFormError,
  } = useSubmit<FormValues, DrillResult>(form, {
    url: `/api/drills/${drill.id}/answer`,
    body: ({ answer }) => ({ answer }),
    fields: ["answer"],
    refresh: false,
    onDone: (data) => setResult(data),
    onFail: (f) => {
      // A message about the answer goes beside it, not under the form as well.
      if (f.fields.answer) setFormError(null);
      // Answered meanwhile (another tab): show the drill as the server has it.
      if (f.status === 409) router.refresh();
    },
  });

  return (
    <div className="flex min-w-0 flex-col gap-6" data-testid="drill">
      {drill.danger ? <DangerBanner /> : null}
      <section className="rounded-card border border-rule bg-panel p-5 shadow-card sm:p-6" aria-labelledby="drill-prompt-title">
        <h2 id="drill-prompt-title" className="sr-only">
          The problem
        </h2>
        <p className="text-lead" data-testid="drill-prompt">
          {drill.prompt}
        </p>
        {Object.keys(drill.given).length ? (
          <dl className="mt-4 grid grid-cols-[auto_minmax(0,1fr)] gap-x-4 gap-y-1 border-t border-rule pt-3" data-testid="drill-given">
            {Object.entries(drill.given).map(([label, value]) => (
              <div key={label} className="contents">
                <dt className="text-muted">{label}</dt>
                <dd className="break-words font-mono font-bold">{value}</dd>
              </div>
            ))}
          </dl>
        ) : null}
      </section>

      {result === null && mine ? (
        <form onSubmit={onSubmit} noValidate aria-label="Answer the drill" className="grid gap-x-3 sm:grid-cols-[minmax(0,1fr)_auto] sm:items-start">
          <Field
            id="drill-answer"
            label={`Your answer: ${drill.asked.label}`}
            hint={drill.asked.help}
            autoComplete="off"
            spellCheck={false}
            className="min-w-0"
            error={errors.answer?.message}
            {...register("answer")}
          />
          <Button type="submit" disabled={isSubmitting} className="sm:mt-7">
            {isSubmitting ? "Checking…" : "Check my answer"}
          </Button>
          <p role="status" aria-live="polite" className="min-h-5 text-note font-bold text-flag sm:col-span-2">
            {formError ?? ""}
          </p>
        </form>
      ) : null}
      {result === null && !mine ? <p className="text-muted">Not answered yet. The working shows here once the apprentice has answered.</p> : null}

      {result ? <Verdict result={result} /> : null}
      {result ? <DrillWorking result={result} serverHtml={serverHtml} /> : null}
      {result && mine ? (
        <div className="flex flex-wrap items-center gap-3">
          <StartDrillButton body={{ kind: result.similar.kind }} label="Try a similar one" variant="primary" />
          <span className="text-note text-muted">Another problem of the same kind ({result.similar.title}), with new figures.</span>
        </div>
      ) : null}
    </div>
  );
}

function Verdict({ result }: { result: DrillResult }) {
  const v = VERDICT[result.verdict];
  return (
    <section aria-live="polite" data-testid="drill-verdict" data-verdict={result.verdict} className={`rounded-card border-2 p-5 ${v.tone}`}>
      <h2 className="text-title font-bold">{v.title}</h2>
      <p className="mt-1">{result.message}</p>
      <dl className="mt-3 grid grid-cols-[auto_minmax(0,1fr)] gap-x-4 gap-y-1 text-note">
        <dt className="text-muted">Your answer</dt>
        <dd className="break-words font-mono font-bold">{String(result.answer)}</dd>
        <dt className="text-muted">Expected</dt>
        <dd className="break-words font-mono font-bold" data-testid="drill-expected">
          {result.expectedText}
        </dd>
        <dt className="text-muted">Accepted</dt>
        <dd>{result.toleranceText}</dd>
      </dl>
    </section>
  );
}
