import { KeepTheBackOn } from "@/components/customer/keep-the-back-on";

/**
 * Shown wherever a customer reads an estimate: a plain reminder about the set (not the bench's safety
 * wording, which is for whoever works on it), and that an estimate is not a promise.
 */
export function RepairDisclaimer() {
  return (
    <div className="flex flex-col gap-3">
      <KeepTheBackOn when="waiting" />
      <p className="text-note text-muted">The estimate covers the work listed. If we find more that needs doing, we will ask you before we do it.</p>
    </div>
  );
}
