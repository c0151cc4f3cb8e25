import type { WarningLevel } from "@/lib/calc/types";
import { TUBE_VERDICT_LABELS, type TubeVerdict } from "@/lib/vocabulary";

/**
 * Calm colours for a tester's verdict: green for good, teal for usable, amber for what needs a look or a
 * replacement, grey for untested. Hazard red is kept for danger alone: a shorted tube can take a
 * transformer or a rectifier with it when the set is switched on.
 */
export const VERDICT_TONE: Record<TubeVerdict, string> = {
  strong: "border-ok/40 bg-ok-bg text-ok",
  serviceable: "border-signal/40 bg-sunk text-signal",
  weak: "border-caution/40 bg-caution-bg text-caution",
  gassy: "border-caution/40 bg-caution-bg text-caution",
  "open-heater": "border-caution/40 bg-caution-bg text-caution",
  short: "border-hazard/60 bg-hazard-bg text-hazard",
  "not-tested": "border-rule bg-sunk text-muted",
};

/** What each verdict means for the set, in a few words. */
export const VERDICT_HINTS: Record<TubeVerdict, string> = {
  strong: "Tests well above its minimum.",
  serviceable: "Above its minimum; fine to keep in.",
  weak: "Below its minimum: low emission. Replace it or try a substitute.",
  gassy: "Grid current from gas: it can run away in an output stage. Replace it.",
  "open-heater": "The heater does not light. In a series string nothing lights.",
  short: "Elements touching: keep it out of the set. It can take a rectifier or transformer with it.",
  "not-tested": "No tester result recorded yet.",
};

export function VerdictBadge({ verdict }: { verdict: TubeVerdict }) {
  return (
    <span
      className={`inline-flex items-center whitespace-nowrap rounded-full border px-2.5 py-0.5 text-note font-bold ${VERDICT_TONE[verdict]}`}
      data-verdict={verdict}
    >
      {verdict === "short" ? (
        <span aria-hidden="true" className="mr-1">
          ⚠
        </span>
      ) : null}
      {TUBE_VERDICT_LABELS[verdict]}
    </span>
  );
}

/** Tones of a difference between a tube and its substitute, by warning level. */
export const LEVEL_TONE: Record<WarningLevel, string> = {
  danger: "border-hazard/60 bg-hazard-bg",
  caution: "border-caution/50 bg-caution-bg",
  info: "border-rule bg-panel",
};

export const LEVEL_WORD: Record<WarningLevel, { word: string; tone: string }> = {
  danger: { word: "Danger", tone: "text-hazard" },
  caution: { word: "Check", tone: "text-caution" },
  info: { word: "Note", tone: "text-muted" },
};
