import type { Charges } from "@/db/queries/workshop";
import { formatMoney, formatTaxRate } from "@/lib/money";

/** The workshop's charges as figures, for technicians (and above the owner's form). */
export function ChargesSummary({ charges }: { charges: Charges }) {
  return (
    <dl className="grid grid-cols-[7rem_1fr] gap-y-2" aria-label="Current charges">
      <dt className="font-bold">Hourly rate</dt>
      <dd className="font-mono" data-testid="charges-rate">
        {charges.hourlyRateMinor > 0 ? `${formatMoney(charges.hourlyRateMinor, charges.currency)} an hour` : "Not set yet"}
      </dd>
      <dt className="font-bold">Tax</dt>
      <dd className="font-mono" data-testid="charges-tax">
        {formatTaxRate(charges.taxRateBp)}
      </dd>
      <dt className="font-bold">Currency</dt>
      <dd className="font-mono">{charges.currency}</dd>
    </dl>
  );
}

/** One line above the owner's form: the figures as customers will see them. */
export function ChargesLine({ charges }: { charges: Charges }) {
  return (
    <p className="mb-4 rounded-chip bg-sunk px-3 py-2">
      Labour at{" "}
      <span className="font-mono font-bold" data-testid="charges-rate">
        {formatMoney(charges.hourlyRateMinor, charges.currency)} an hour
      </span>
      , plus{" "}
      <span className="font-mono font-bold" data-testid="charges-tax">
        {formatTaxRate(charges.taxRateBp)}
      </span>{" "}
      tax.
    </p>
  );
}

/** Labour lines are refused at a rate of 0, so say so where the rate is set (or who can set it). */
export function NoRateNote({ owner }: { owner: boolean }) {
  return (
    <p className="mb-4 rounded-chip border border-caution bg-caution-bg px-3 py-2 text-note text-caution" data-testid="no-rate-note">
      {owner
        ? "No hourly rate yet: estimates can't price labour until you set one here."
        : "No hourly rate yet: labour lines can't be priced until the owner sets one."}
    </p>
  );
}
