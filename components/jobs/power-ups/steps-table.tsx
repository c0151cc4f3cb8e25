import { formatQuantity } from "@/lib/calc/format";
import type { PowerUpStep } from "@/db/queries/power-ups";

type StepView = Pick<PowerUpStep, "id" | "supplyVoltage" | "currentDrawn" | "minutes" | "bPlus" | "note" | "overStop" | "warnings">;

const th = "px-2 py-2 text-note font-bold uppercase tracking-wide text-muted sm:px-3";
const td = "px-2 py-2 align-top font-mono sm:px-3";
const mins = (m: number) => `${Number(m.toPrecision(3))} min`;

/**
 * The steps in the order taken. The four figures stay side by side even at phone width; what was seen
 * goes on its own line beneath. A step over the stop current is hazard red, with the danger wording.
 */
export function StepsTable({ steps }: { steps: readonly StepView[] }) {
  return (
    <table className="w-full border-collapse text-left" data-testid="power-up-steps">
      <thead className="border-b border-rule bg-sunk/60">
        <tr>
          <th scope="col" className={th}>
            Supply
          </th>
          <th scope="col" className={th}>
            Drawn
          </th>
          <th scope="col" className={th}>
            Held
          </th>
          <th scope="col" className={th}>
            B+
          </th>
        </tr>
      </thead>
      {steps.map((s, i) => {
        const danger = s.warnings?.find((w) => w.level === "danger");
        const caution = s.warnings?.find((w) => w.level === "caution");
        return (
          <tbody
            key={s.id}
            className={`border-b border-rule ${s.overStop ? "bg-hazard-bg text-hazard" : ""}`}
            data-testid={`step-${i + 1}`}
            data-over-stop={s.overStop ? "true" : "false"}
          >
            <tr>
              <td className={td}>{formatQuantity(s.supplyVoltage, "V")}</td>
              <td className={`${td} ${s.overStop ? "font-bold" : ""}`}>
                {s.overStop ? <span aria-hidden="true">⚠ </span> : null}
                {formatQuantity(s.currentDrawn, "A")}
              </td>
              <td className={td}>{s.minutes === null ? "—" : mins(s.minutes)}</td>
              <td className={td}>{s.bPlus === null ? "—" : formatQuantity(s.bPlus, "V")}</td>
            </tr>
            {s.note || danger || caution ? (
              <tr>
                <td colSpan={4} className="px-2 pb-2 sm:px-3">
                  {danger ? <p className="font-bold text-hazard">Over the stop current. {danger.message}</p> : null}
                  {!danger && caution ? <p className="text-note font-bold text-caution">{caution.message}</p> : null}
                  {s.note ? <p className={`text-note ${s.overStop ? "text-ink" : "text-muted"}`}>{s.note}</p> : null}
                </td>
              </tr>
            ) : null}
          </tbody>
        );
      })}
    </table>
  );
}
