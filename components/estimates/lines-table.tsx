import { LINE_KIND_LABELS, type LineKind } from "@/lib/vocabulary";
import { formatMoney, formatQuantity, formatTaxRate } from "@/lib/money";

/** The priced lines and totals of an estimate or invoice, read-only; figures in the mono face. */

export interface PricedLineView {
  id: number;
  kind: LineKind;
  description: string;
  quantityMilli: number;
  unitPriceMinor: number;
  amountMinor: number;
}

export function LinesTable({
  lines,
  currency,
  taxRateBp,
  subtotalMinor,
  taxMinor,
  totalMinor,
}: {
  lines: PricedLineView[];
  currency: string;
  taxRateBp: number;
  subtotalMinor: number;
  taxMinor: number;
  totalMinor: number;
}) {
  const money = (m: number) => formatMoney(m, currency);
  return (
    <table className="w-full border-collapse text-left">
      <caption className="sr-only">Lines and totals</caption>
      <thead>
        <tr className="border-b-2 border-ink text-note uppercase tracking-wide text-muted">
          <th scope="col" className="py-2 pr-3 font-bold">
            Description
          </th>
          <th scope="col" className="py-2 pr-3 text-right font-bold">
            Qty
          </th>
          <th scope="col" className="py-2 pr-3 text-right font-bold">
            Unit
          </th>
          <th scope="col" className="py-2 text-right font-bold">
            Amount
          </th>
        </tr>
      </thead>
      <tbody>
        {lines.map((l) => (
          <tr key={l.id} className="border-b border-rule align-baseline">
            <td className="py-2 pr-3">
              <span className="mr-2 rounded-full bg-sunk px-2 py-0.5 text-note font-bold text-muted">{LINE_KIND_LABELS[l.kind]}</span>
              {l.description}
            </td>
            <td className="py-2 pr-3 text-right font-mono">
              {formatQuantity(l.quantityMilli)}
              {l.kind === "labour" ? " h" : ""}
            </td>
            <td className="py-2 pr-3 text-right font-mono">{money(l.unitPriceMinor)}</td>
            <td className="py-2 text-right font-mono">{money(l.amountMinor)}</td>
          </tr>
        ))}
      </tbody>
      <tfoot>
        <tr>
          <th scope="row" colSpan={3} className="pt-3 pr-3 text-right font-normal text-muted">
            Subtotal
          </th>
          <td className="pt-3 text-right font-mono">{money(subtotalMinor)}</td>
        </tr>
        <tr>
          <th scope="row" colSpan={3} className="py-1 pr-3 text-right font-normal text-muted">
            Tax at {formatTaxRate(taxRateBp)}
          </th>
          <td className="py-1 text-right font-mono">{money(taxMinor)}</td>
        </tr>
        <tr className="text-lead">
          <th scope="row" colSpan={3} className="pt-2 pr-3 text-right font-bold">
            Total
          </th>
          <td className="pt-2 text-right font-mono font-bold" data-testid="total">
            {money(totalMinor)}
          </td>
        </tr>
      </tfoot>
    </table>
  );
}
