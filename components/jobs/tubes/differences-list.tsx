import type { TubeDifference } from "@/lib/jobs/tube-differences";
import { LEVEL_TONE, LEVEL_WORD } from "./tube-verdict";

const RANK = { danger: 0, caution: 1, info: 2 } as const;

/** What changes with the substitute, most serious first: a short list, each line with its level in words. */
export function DifferencesList({ original, substitute, differences }: { original: string; substitute: string; differences: readonly TubeDifference[] }) {
  const sorted = [...differences].sort((a, b) => RANK[a.level] - RANK[b.level]);
  return (
    <div data-testid="tube-differences">
      <p className="text-note text-muted">
        <span className="font-mono font-bold text-ink">{substitute}</span> in place of <span className="font-mono">{original}</span>, from the built-in tube
        data:
      </p>
      {sorted.length === 0 ? (
        <p className="mt-1 text-note text-muted">Neither type is in the built-in table: compare the data sheets.</p>
      ) : (
        <ul className="mt-1 flex flex-col gap-1">
          {sorted.map((d, i) => {
            // An unchanged figure (the heater is always listed) reads "Same", not as a finding.
            const word = d.level === "info" && d.original === d.substitute ? "Same" : LEVEL_WORD[d.level].word;
            return (
              <li key={`${d.what}-${i}`} className={`rounded-chip border px-3 py-1.5 text-note ${LEVEL_TONE[d.level]}`} data-level={d.level}>
                <span className={`mr-2 font-bold uppercase tracking-wide ${LEVEL_WORD[d.level].tone}`}>{word}</span>
                <span className="font-bold">{d.what}:</span> <span className="font-mono">{d.original}</span> <span aria-label="becomes">→</span>{" "}
                <span className="font-mono">{d.substitute}</span>
                {d.note ? <span className="block text-ink">{d.note}</span> : null}
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}
