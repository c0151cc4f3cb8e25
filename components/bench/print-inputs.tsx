import { InputLabel } from "@/components/ui/quantity-symbol";
import type { InputMeta } from "@/lib/calc/types";

function show(value: unknown, unit: string): string {
  if (Array.isArray(value)) {
    return value
      .map((v) =>
        typeof v === "object" && v
          ? Object.entries(v)
              .map(([k, x]) => `${k} ${x}`)
              .join(" ")
          : String(v),
      )
      .join("; ");
  }
  if (typeof value === "boolean") return value ? "yes" : "no";
  if (typeof value === "object" && value)
    return Object.entries(value)
      .map(([k, x]) => `${k} ${String(x)}`)
      .join(", ");
  const text = String(value);
  // A bare number is in the field's unit; text that carries its own unit is shown as typed.
  return unit && /[\d.]$/.test(text) && !/[a-zA-ZµΩ°]/.test(text.replace(/[eE][+-]?\d+$/, ""))
    ? `${text} ${unit}`
    : /[kmuµnpMG]$/.test(text) && unit
      ? `${text}${unit}`
      : text;
}

/** The inputs as a table, only on the printed sheet (the form itself is not printed). */
export function PrintInputs({ inputs, raw }: { inputs: readonly InputMeta[]; raw: Record<string, unknown> }) {
  const rows = inputs.filter((i) => raw[i.name] !== undefined);
  return (
    <section className="gb-print-only" aria-hidden="true">
      <h2 className="mb-1 font-bold">Values used</h2>
      <table className="w-full text-left">
        <tbody>
          {rows.map((i) => (
            <tr key={i.name} className="border-b border-rule">
              <th scope="row" className="py-1 pr-4 font-normal">
                <InputLabel meta={i} />
              </th>
              <td className="py-1 font-mono">{show(raw[i.name], i.unit)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
