import type { Metadata } from "next";
import { BenchIndex, type IndexEntry } from "@/components/bench/bench-index";
import { calculators } from "@/lib/calc/registry";

export const metadata: Metadata = {
  title: "Bench",
  description: "Bench calculators for tube-era sets that show their working: first power, supplies and heaters, stages, radio alignment, parts and measuring.",
};

export default function BenchPage() {
  const entries: IndexEntry[] = calculators.map((c) => ({
    slug: c.slug,
    title: c.title,
    purpose: c.purpose,
    group: c.bench.group,
    words: c.inputs.map((i) => i.label).join(" "),
  }));
  return (
    <>
      <p className="font-bold uppercase tracking-widest text-glow">The Bench</p>
      <h1 className="mt-2 text-display font-bold">Calculators that show their working</h1>
      <p className="mb-8 mt-3 max-w-3xl text-lead text-muted">
        Type values the way you think of them (4k7, 47 µF, 250 V). Each answer comes with its formula, your numbers substituted, and the handbook it comes from.
        No account needed to calculate.
      </p>
      <BenchIndex entries={entries} />
    </>
  );
}
