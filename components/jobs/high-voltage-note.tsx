import { HIGH_VOLTAGE_CAUTION } from "@/lib/calc/safety";

/** The danger caution every screen about a tube set carries (B+ and mains are well over 50 V). */
export function HighVoltageNote({ compact = false }: { compact?: boolean }) {
  return (
    <aside role="note" aria-label="High voltage" className="flex overflow-hidden rounded-card border border-hazard/60 bg-hazard-bg text-ink">
      <div className="gb-hazard-stripe w-2 shrink-0" aria-hidden="true" />
      <p className={`px-4 ${compact ? "py-2 text-note" : "py-3"}`}>
        <strong className="text-hazard">High voltage. </strong>
        {HIGH_VOLTAGE_CAUTION}
      </p>
    </aside>
  );
}
