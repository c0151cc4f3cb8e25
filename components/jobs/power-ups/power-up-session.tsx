import { ButtonLink } from "@/components/ui/button";
import { formatQuantity } from "@/lib/calc/format";
import { benchHref } from "@/lib/calc/share";
import { formatDateTime } from "@/lib/jobs/dates";
import type { PowerUp } from "@/db/queries/power-ups";
import { POWER_UP_CHECKLIST, POWER_UP_LIMITER_LABELS, POWER_UP_OUTCOME_LABELS, type PowerUpOutcome } from "@/lib/vocabulary";
import { CurrentChartSlot } from "./current-chart-slot";
import { OutcomeForm } from "./outcome-form";
import { StepAddForm } from "./step-add-form";
import { StepsTable } from "./steps-table";

type PowerUpView = PowerUp;

const CHECK_LABEL = new Map<string, string>(POWER_UP_CHECKLIST.map((c) => [c.id, c.label]));
const A = (a: number) => formatQuantity(a, "A");

function limiterText(s: PowerUpView): string {
  if (s.limiter === null) return "from the Log, limiter not recorded";
  if (s.limiter === "series-lamp" && s.lampPower !== null) return `${POWER_UP_LIMITER_LABELS[s.limiter]}, ${formatQuantity(s.lampPower, "W")}`;
  if (s.limiter === "limited-supply" && s.currentLimit !== null) return `${POWER_UP_LIMITER_LABELS[s.limiter]}, limit ${A(s.currentLimit)}`;
  return POWER_UP_LIMITER_LABELS[s.limiter];
}

/**
 * The series-lamp calculator for this lamp. The line voltage is the highest supply the steps record (the
 * lamp sees the mains, or the variac ahead of it); with no steps yet the calculator's own 120 V default.
 */
function seriesLampHref(s: PowerUpView): string {
  const line = s.steps.reduce((m, st) => Math.max(m, st.supplyVoltage), 0);
  return benchHref("series-lamp", { lampPower: s.lampPower, ...(line > 0 ? { lineVoltage: line } : {}) });
}

function OutcomeBadge({ outcome }: { outcome: PowerUpOutcome | null }) {
  const tone =
    outcome === "passed"
      ? "border-ok/40 bg-ok-bg text-ok"
      : outcome === "stopped"
        ? "border-caution/40 bg-caution-bg text-caution"
        : "border-glow/40 bg-glow-bg text-glow";
  return (
    <span className={`whitespace-nowrap rounded-full border px-2.5 py-0.5 text-note font-bold ${tone}`} data-testid="power-up-outcome">
      {outcome ? POWER_UP_OUTCOME_LABELS[outcome] : "Under way"}
    </span>
  );
}

/** One bring-up: limiter and stop current, what was not done first, the steps, the plot and how it ended. */
export function PowerUpSession({ jobId, session, number, canAdd }: { jobId: number; session: PowerUpView; number: number; canAdd: boolean }) {
  const author = session.author?.name;
  const figures = session.steps.map((s) => ({ supplyVoltage: s.supplyVoltage, currentDrawn: s.currentDrawn }));
  const open = session.outcome === null;
  return (
    <article
      className="rounded-card border border-rule bg-panel p-4 shadow-card sm:p-6"
      data-testid={`power-up-${session.id}`}
      aria-labelledby={`pu-${session.id}-h`}
    >
      <header className="flex flex-wrap items-start justify-between gap-x-4 gap-y-2">
        <div className="min-w-0">
          <h3 id={`pu-${session.id}-h`} className="text-lead font-bold">
            Session {number}: {limiterText(session)}
          </h3>
          <p className="text-note text-muted">
            Started {formatDateTime(session.startedAt)}
            {author ? ` by ${author}` : ""}
            {session.stopCurrent !== null ? (
              <>
                {" "}
                · stop at <span className="font-mono font-bold text-ink">{A(session.stopCurrent)}</span>
              </>
            ) : null}
          </p>
        </div>
        <OutcomeBadge outcome={session.outcome} />
      </header>

      {session.checklistWarnings.length ? (
        <div className="mt-3 rounded-chip border border-caution/50 bg-caution-bg px-3 py-2" data-testid="checklist-warnings">
          <p className="font-bold text-caution">Not done before first power</p>
          <ul className="mt-1 list-disc pl-5 text-note">
            {session.checklistWarnings.map((w) => (
              <li key={w.id}>{CHECK_LABEL.get(w.id) ?? w.message}</li>
            ))}
          </ul>
        </div>
      ) : null}

      {session.reason || session.outcome ? (
        <p className="mt-3 text-note">
          <span className="font-bold">{session.outcome ? POWER_UP_OUTCOME_LABELS[session.outcome] : ""}</span>
          {session.reason ? <span>: {session.reason}</span> : null}
        </p>
      ) : null}

      <div className="mt-4 flex flex-col gap-4">
        {session.steps.length ? <StepsTable steps={session.steps} /> : <p className="text-muted">No steps yet. Start low and note each one.</p>}
        <CurrentChartSlot steps={figures} stopCurrent={session.stopCurrent} />
        {session.limiter === "series-lamp" && session.lampPower !== null ? (
          <div className="flex flex-col gap-1">
            <ButtonLink href={seriesLampHref(session)} variant="secondary" className="self-start" data-testid="series-lamp-link">
              Series lamp on the Bench ↗
            </ButtonLink>
            <p className="text-note text-muted">
              What a {formatQuantity(session.lampPower, "W")} lamp lets through, with this session&rsquo;s figures filled in.
            </p>
          </div>
        ) : null}
        {open && canAdd ? (
          <>
            <section aria-label="Add a step" className="border-t border-rule pt-4">
              <h4 className="mb-2 font-bold">Next step</h4>
              <StepAddForm jobId={jobId} sessionId={session.id} />
            </section>
            <section aria-label="End the session" className="border-t border-rule pt-4">
              <h4 className="mb-2 font-bold">How did it end?</h4>
              <OutcomeForm jobId={jobId} sessionId={session.id} steps={figures} stopCurrent={session.stopCurrent} />
            </section>
          </>
        ) : null}
      </div>
    </article>
  );
}
