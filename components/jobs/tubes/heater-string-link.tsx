import { ButtonLink } from "@/components/ui/button";
import { findHeater } from "@/lib/calc/tables/heaters";
import { benchHref } from "@/lib/calc/share";
import { heaterOf } from "@/lib/jobs/tube-differences";

/**
 * The set's heater string on the Bench in one click. Each socket counts with what is (or will be) in it:
 * the substitute where one is chosen. When every type is in the heater table the calculator gets the type
 * numbers; otherwise each heater's voltage and current, from the tube table where the heater table lacks it.
 */
export function heaterStringHref(types: readonly string[]): { href: string; left: string[] } {
  if (types.every((t) => findHeater(t))) return { href: benchHref("heater-string", { tubes: types }), left: [] };
  const heaters: { voltage: number; current: number }[] = [];
  const left: string[] = [];
  for (const t of types) {
    const h = heaterOf(t);
    if (h) heaters.push({ voltage: h.voltage, current: h.current });
    else left.push(t);
  }
  return { href: benchHref("heater-string", { heaters }), left };
}

export function HeaterStringLink({ tubes, seriesString }: { tubes: readonly { type: string; substitute: string | null }[]; seriesString: boolean }) {
  if (!tubes.length) return null;
  const types = tubes.map((t) => t.substitute ?? t.type);
  const { href, left } = heaterStringHref(types);
  const subs = tubes.some((t) => t.substitute);
  return (
    <div className="flex flex-col gap-1">
      <ButtonLink href={href} variant="secondary" data-testid="heater-string-link" className="self-start">
        Check the heater string ↗
      </ButtonLink>
      <p className="text-note text-muted">
        Opens the heater-string calculator with {types.length === 1 ? "this tube" : `these ${types.length} tubes`}
        {subs ? ", substitutes in place of the tubes they replace" : ""}; set the line voltage there.
        {left.length ? ` Left out, with no heater data: ${left.join(", ")}.` : ""}
      </p>
      {seriesString ? null : (
        <p className="text-note text-muted">
          No heater here is above 6.3 V, so these heaters probably run in parallel from a transformer winding, not in a series string.
        </p>
      )}
    </div>
  );
}
