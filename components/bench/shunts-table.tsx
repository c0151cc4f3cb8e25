import { formatPlain } from "@/lib/bench/display";
import type { OutputValue } from "@/lib/calc/types";

/**
 * The heater string's shunt resistors as a compact table: five narrow columns that fit a 390 px phone
 * without scrolling sideways (the heater's type sits under its number rather than in a column of its own).
 */
export function ShuntsTable({ value }: { value: OutputValue[] }) {
  if (value.length === 0) return <span className="font-sans font-normal text-muted">None: every heater is rated for the string current</span>;
  return (
    <table className="mt-1 w-full text-right text-note" data-testid="shunts-table">
      <caption className="sr-only">One shunt resistor across each heater rated below the string current</caption>
      <thead className="font-sans text-muted">
        <tr>
          <th scope="col" className="pr-2 text-left align-bottom font-normal">
            Across heater
          </th>
          <th scope="col" className="pr-2 align-bottom font-normal">
            Shunt
          </th>
          <th scope="col" className="pr-2 align-bottom font-normal">
            E12
          </th>
          <th scope="col" className="pr-2 align-bottom font-normal">
            Dissipation
          </th>
          <th scope="col" className="align-bottom font-normal">
            Rating
          </th>
        </tr>
      </thead>
      <tbody>
        {value.map((s, i) => {
          const row = s as Record<string, OutputValue>;
          const n = typeof row.index === "number" ? row.index + 1 : i + 1;
          return (
            <tr key={i} className="border-t border-rule/60 align-top">
              <th scope="row" className="py-1 pr-2 text-left">
                {n}
                {typeof row.type === "string" ? <span className="block font-sans font-normal text-muted">{row.type}</span> : null}
              </th>
              <td className="py-1 pr-2">{formatPlain(row.resistance, "Ω", 4)}</td>
              <td className="py-1 pr-2">{formatPlain(row.nearestPreferred, "Ω")}</td>
              <td className="py-1 pr-2">{formatPlain(row.dissipation, "W")}</td>
              <td className="py-1">
                {row.suggestedRating === null ? (
                  <span title="Above the largest standard rating: see the caution">over 100 W</span>
                ) : (
                  formatPlain(row.suggestedRating, "W")
                )}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
