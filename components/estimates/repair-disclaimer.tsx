import { HIGH_VOLTAGE_CAUTION } from "@/lib/calc/safety";

/** Shown wherever a customer reads an estimate: the work involves lethal voltages, and an estimate is not a promise. */
export function RepairDisclaimer() {
  return (
    <aside className="rounded-card border-2 border-hazard bg-hazard-bg p-4 text-ink" aria-label="High-voltage notice">
      <p className="font-bold text-hazard">High voltage inside</p>
      <p className="mt-1">
        Tube-era sets work at lethal voltages and hold a charge after they are unplugged. Please do not open or power the set yourself
        while it waits for repair. The workshop follows local electrical codes and licensed practice; this estimate covers the work listed,
        and we will ask you again before doing more.
      </p>
      <p className="mt-2 text-note text-muted">{HIGH_VOLTAGE_CAUTION}</p>
    </aside>
  );
}
