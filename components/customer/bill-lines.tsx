import { LINE_KIND_LABELS, type LineKind } from "@/lib/vocabulary";
import { formatMoney, formatQuantity, formatTaxRate } from "@/lib/money";

/**
 * The lines and totals as a customer reads them on a phone: each line's description on its own row, what
 * it is and how it was counted beneath, the amount on the right. No columns to scroll sideways at 390 px.
 */

export interface BillLine {
  id: number;
  kind: LineKind;
  description: string;
  quantityMilli: number;
  unitPriceMinor: number;
  amountMinor: number;
}

export function BillLines({
  lines,
  currency,
  taxRateBp,
  subtotalMinor,
  taxMinor,
  totalMinor,
  totalLabel = "Total",
}: {
  lines: BillLine[];
  currency: string;
  taxRateBp: number;
  subtotalMinor: number;
  taxMinor: number;
  totalMinor: number;
  totalLabel?: string;
}) {
  const money = (m: number) => formatMoney(m, currency);
  const counted = (l: BillLine) => `${formatQuantity(l.quantityMilli)}${l.kind === "labour" ? " h" : ""} × ${money(l.unitPriceMinor)}`;
  return (
    <div>
      <ul className="divide-y divide-rule" aria-label="Lines">
        {lines.map((l) => (
          <li key={l.id} className="flex items-baseline justify-between gap-4 py-3">
            <div className="min-w-0">
              <p className="break-words">{l.description}</p>
              <p className="text-note text-muted">
                {LINE_KIND_LABELS[l.kind]} · <span className="font-mono">{counted(l)}</span>
              </p>
            </div>
            <p className="shrink-0 font-mono">{money(l.amountMinor)}</p>
          </li>
        ))}
      </ul>
      <dl className="mt-2 border-t-2 border-ink pt-3">
        <div className="flex justify-between gap-4 py-0.5 text-muted">
          <dt>Subtotal</dt>
          <dd className="font-mono">{money(subtotalMinor)}</dd>
        </div>
        <div className="flex justify-between gap-4 py-0.5 text-muted">
          <dt>Tax at {formatTaxRate(taxRateBp)}</dt>
          <dd className="font-mono">{money(taxMinor)}</dd>
        </div>
        <div className="mt-1 flex justify-between gap-4 text-lead font-bold">
          <dt>{totalLabel}</dt>
          <dd className="font-mono" data-testid="total">
            {money(totalMinor)}
          </dd>
        </div>
      </dl>
    </div>
  );
}
