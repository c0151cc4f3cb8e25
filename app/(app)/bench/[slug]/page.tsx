import katex from "katex";
import "katex/dist/katex.min.css";
import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { notFound } from "next/navigation";
import { CalculatorView } from "@/components/bench/calculator-view";
import { initialMode, initialValues, toRaw } from "@/lib/bench/form-values";
import { GROUP_TITLES } from "@/lib/bench/groups";
import { can } from "@/lib/auth/can";
import { getMember } from "@/server/auth/member";
import { getCalculator } from "@/lib/calc/registry";
import { runCalculator } from "@/lib/calc/run";
import { decodeInputs } from "@/lib/calc/share";

type Params = { params: Promise<{ slug: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

export async function generateMetadata({ params }: Params): Promise<Metadata> {
  const calc = getCalculator((await params).slug);
  return calc ? { title: `${calc.title} · Bench`, description: calc.purpose } : { title: "Bench" };
}

const tex = (latex: string, displayMode: boolean) => katex.renderToString(latex, { throwOnError: false, displayMode, output: "htmlAndMathml" });

export default async function CalculatorPage({ params, searchParams }: Params) {
  const { slug } = await params;
  const calc = getCalculator(slug);
  if (!calc) notFound();
  const fromUrl = decodeInputs(await searchParams);
  const hasInputs = calc.inputs.some((i) => fromUrl[i.name] !== undefined);
  const example = initialValues(calc.inputs, calc.bench.example);
  const initial = hasInputs ? initialValues(calc.inputs, fromUrl) : example;
  const initialRun = runCalculator(calc, toRaw(calc, initial, initialMode(calc.bench.modes, initial)));
  const serverHtml = initialRun.ok ? Object.fromEntries(initialRun.result.steps.map((s) => [s.latex, tex(s.latex, true)])) : {};
  const member = await getMember();

  const formulas = (
    <ul className="flex flex-col gap-3" data-testid="formulas">
      {calc.formulas.map((f) => (
        <li key={f.label} className="rounded-chip border border-rule px-4 py-2">
          <p className="text-note font-bold text-muted">{f.label}</p>
          <div className="overflow-x-auto" dangerouslySetInnerHTML={{ __html: tex(f.latex, true) }} />
        </li>
      ))}
    </ul>
  );
  const sources = (
    <ul className="flex flex-col gap-2" data-testid="references">
      {calc.references.map((r) => (
        <li key={r.title} className="border-l-4 border-signal pl-3">
          <p className="font-bold">{r.title}</p>
          <p className="text-note text-muted">{r.detail}</p>
        </li>
      ))}
    </ul>
  );
  const why = (
    <p className="max-w-prose" data-testid="why-it-matters">
      {calc.whyItMatters}
    </p>
  );

  return (
    <article className="gb-sheet">
      <nav aria-label="Breadcrumb" className="gb-no-print mb-2 text-note">
        <Link href="/bench" className="font-bold text-signal underline underline-offset-4">
          Bench
        </Link>
        <span className="px-2 text-muted" aria-hidden="true">
          /
        </span>
        <span className="text-muted">{GROUP_TITLES[calc.bench.group]}</span>
      </nav>
      <h1 className="text-display font-bold">{calc.title}</h1>
      <p className="mb-6 mt-2 max-w-3xl text-lead text-muted">{calc.purpose}</p>
      <CalculatorView
        slug={slug}
        inputs={[...calc.inputs]}
        outputs={[...calc.outputs]}
        bench={calc.bench}
        initial={initial}
        example={example}
        initialRun={initialRun}
        serverHtml={serverHtml}
        workingOpen={member?.role === "apprentice"}
        signedIn={!!member}
        canCreateJob={!!member && can.editJobs(member)}
        formulas={formulas}
        sources={sources}
        why={why}
      />
      <p className="gb-print-only mt-6 text-note">Printed from Glowbench. Figures are estimates to think with, never a guarantee of safety.</p>
    </article>
  );
}
