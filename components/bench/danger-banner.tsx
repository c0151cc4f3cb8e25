import { HIGH_VOLTAGE_CAUTION } from "@/lib/calc/safety";

const POINTS = [
  "The voltages here can kill. Filter capacitors hold their charge long after the plug is pulled.",
  "Discharge every capacitor through a resistor, then verify with a meter before you touch.",
  "Bring a set up slowly on a current-limited supply (a series lamp or a variable transformer).",
  "Work with one hand; keep the other away from the chassis.",
  "Follow local electrical codes and licensed practice. These figures are estimates, never a guarantee of safety.",
];

/** Glowbench's danger banner: a hazard-striped edge, a bolt in a triangle of our own drawing, and the rules in plain words. */
export function DangerBanner({ extra = [] }: { extra?: string[] }) {
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
        <svg viewBox="0 0 40 40" className="h-8 w-8 shrink-0 text-hazard md:h-10 md:w-10" aria-hidden="true">
          <path d="M20 3 38 35H2Z" fill="none" stroke="currentColor" strokeWidth="3" strokeLinejoin="round" />
          <path d="M22 12 14 24h6l-2 8 8-12h-6z" fill="currentColor" />
        </svg>
        <div>
          <h2 id="danger-title" className="text-lead font-bold text-hazard">
            Danger: lethal voltage
          </h2>
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
