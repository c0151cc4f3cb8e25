import { formatQuantity } from "@/lib/calc/format";
import { HAZARD_VOLTS, HIGH_VOLTAGE_CAUTION } from "@/lib/calc/safety";

// The points of lib/calc/safety.ts's HIGH_VOLTAGE_CAUTION, in plain words.
const POINTS = [
  "The voltages here can kill. Filter capacitors hold their charge long after the plug is pulled.",
  "Discharge every capacitor through a resistor, then verify with a meter before you touch.",
  "Bring a set up slowly on a current-limited supply (a series lamp or a variable transformer).",
  "Work with one hand; keep the other away from the chassis.",
  "Follow local electrical codes and licensed practice. These figures are estimates, never a guarantee of safety.",
];

function Bolt({ className }: { className: string }) {
  return (
    <svg viewBox="0 0 40 40" className={className} aria-hidden="true">
      <path d="M20 3 38 35H2Z" fill="none" stroke="currentColor" strokeWidth="3" strokeLinejoin="round" />
      <path d="M22 12 14 24h6l-2 8 8-12h-6z" fill="currentColor" />
    </svg>
  );
}

/**
 * Glowbench's danger banner: a hazard-striped edge, a bolt in a triangle of our own drawing, and the rules in plain words.
 * `typed`: the typed voltage that raised it, named so the reason shows even while the form has no result.
 */
export function DangerBanner({ extra = [], typed = null }: { extra?: string[]; typed?: { label: string; volts: number } | null }) {
  const specific = extra.filter((m) => m !== HIGH_VOLTAGE_CAUTION);
  return (
    <section
      role="region"
      aria-labelledby="danger-title"
      data-testid="danger-banner"
      className="gb-danger overflow-hidden rounded-card border-2 border-hazard bg-hazard-bg text-ink"
    >
      <div className="gb-hazard-stripe h-3" aria-hidden="true" />
      <div className="flex gap-3 p-4 md:gap-4 md:p-5">
        <Bolt className="h-8 w-8 shrink-0 text-hazard md:h-10 md:w-10" />
        <div className="min-w-0">
          <h2 id="danger-title" className="text-lead font-bold text-hazard">
            Danger: lethal voltage
          </h2>
          {typed ? (
            <p className="mt-1 font-bold" data-testid="danger-typed">
              {typed.label}: {formatQuantity(typed.volts, "V", 4)}, above {HAZARD_VOLTS} V.
            </p>
          ) : null}
          {specific.map((m) => (
            <p key={m} className="mt-1 font-bold">
              {m}
            </p>
          ))}
          <ul className="mt-2 grid list-disc gap-x-8 gap-y-0.5 pl-5 text-note md:grid-cols-2 md:text-body">
            {POINTS.map((p) => (
              <li key={p}>{p}</li>
            ))}
          </ul>
        </div>
      </div>
    </section>
  );
}

/** The short form, for pages that lead to the calculators (the Bench index, the home page). */
export function HighVoltageNote() {
  return (
    <aside aria-label="High-voltage caution" data-testid="hv-note" className="flex gap-3 rounded-card border-2 border-hazard bg-hazard-bg p-4 text-ink">
      <Bolt className="h-7 w-7 shrink-0 text-hazard" />
      <p className="min-w-0 text-note md:text-body">
        <strong className="text-hazard">Tube sets carry lethal voltages.</strong> B+ runs to hundreds of volts, and filter capacitors keep their charge after
        the plug is pulled. Discharge them and check with a meter before you touch, bring a set up on a current-limited supply, keep one hand away from the
        chassis, and follow local electrical codes and licensed practice. The figures here are estimates, never a guarantee of safety.
      </p>
    </aside>
  );
}
