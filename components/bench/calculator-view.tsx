"use client";

import { toNestErrors } from "@hookform/resolvers";
import dynamic from "next/dynamic";
import { useCallback, useDeferredValue, useEffect, useMemo, useRef, useState, type ReactNode } from "react";
import { FormProvider, useForm, useWatch, type Resolver } from "react-hook-form";
import { Link } from "@/components/ui/link";
import { useNearView } from "@/components/ui/use-near-view";
import { runCalculator, type RunResult } from "@/lib/calc/run";
import { encodeInputs } from "@/lib/calc/share";
import type { BenchDescriptor, Calculator, InputMeta, OutputMeta } from "@/lib/calc/types";
import { plain, runFieldErrors } from "@/lib/bench/errors";
import { hiddenFields, initialMode, toRaw, type FormValues } from "@/lib/bench/form-values";
import { loadCalculator } from "@/lib/bench/load-calculator";
import { highestTypedVoltage, quickParse, typedHazard, type Parse } from "@/lib/bench/typed-volts";
import { ChartSlot } from "./chart-slot";
import { DangerBanner } from "./danger-banner";
import { InputControl } from "./input-fields";
import { PrintInputs } from "./print-inputs";
import { ResultsPanel } from "./results-panel";
import { ShareActions } from "./share-actions";
import { Working } from "./working";

const SaveToJob = dynamic(() => import("./save-to-job"), { ssr: false, loading: () => <p className="text-muted">Loading…</p> });

export interface CalculatorViewProps {
  slug: string;
  inputs: InputMeta[];
  outputs: OutputMeta[];
  /** The calculator's descriptor (lib/calc/<slug>.ts), handed over by the server page, so no registry reaches the browser. */
  bench: BenchDescriptor;
  initial: FormValues;
  example: FormValues;
  initialRun: RunResult;
  serverHtml: Record<string, string>;
  workingOpen: boolean;
  signedIn: boolean;
  /** Owners and technicians may book in a new job from here; apprentices save to existing ones. */
  canCreateJob: boolean;
  formulas: ReactNode;
  sources: ReactNode;
  why: ReactNode;
}

/**
 * A calculator page's live part: the form (react-hook-form with the calculator's own zod schema), the
 * result recomputed in the browser on every keystroke, the working, the picture, saving and sharing.
 * The calculator module is loaded on its own; until it arrives the server's result is shown.
 */
export function CalculatorView(p: CalculatorViewProps) {
  const { slug, inputs, bench } = p;
  const shape = useMemo(() => ({ inputs, bench }), [inputs, bench]);
  const [calc, setCalc] = useState<Calculator | null>(null);
  const [mode, setMode] = useState(() => initialMode(bench.modes, p.initial));
  const [moreOpen, setMoreOpen] = useState(() =>
    (bench.advanced?.fields ?? []).some((f) => {
      const v = p.initial[f];
      const d = p.inputs.find((i) => i.name === f)?.default;
      return typeof v === "string" && v.trim() !== "" && v !== String(d ?? "");
    }),
  );
  // Each keystroke is parsed once: the calculator's own schema, through runCalculator, gives the result
  // below, and the resolver hands that same run's field messages to the form instead of parsing again.
  const latest = useRef<RunResult | null>(null);
  const resolver = useCallback<Resolver<FormValues>>((values, _context, options) => {
    const errors = runFieldErrors(latest.current);
    return Object.keys(errors).length ? { values: {}, errors: toNestErrors(errors, options) } : { values, errors: {} };
  }, []);
  const form = useForm<FormValues>({ defaultValues: p.initial, resolver, mode: "onSubmit", reValidateMode: "onSubmit" });
  const values = useWatch({ control: form.control }) as FormValues;
  const raw = useMemo(() => toRaw(shape, values, mode), [shape, values, mode]);
  const run = useMemo(() => (calc ? runCalculator(calc, raw) : p.initialRun), [calc, raw, p.initialRun]);
  const later = useDeferredValue(run);
  // "Save to a job" lists the workshop's jobs: its code and that request wait until it is near the screen.
  const [saveRef, saveNear] = useNearView<HTMLElement>();
  // The danger banner follows each typed voltage on its own, valid form or not. The full unit parser
  // (mathjs) shares the calculator module's chunk; until it arrives the quick reader serves.
  const [parse, setParse] = useState<Parse>(() => quickParse);
  const typed = useMemo(() => highestTypedVoltage(inputs, raw, parse), [inputs, raw, parse]);

  // The calculator module loads on the first sign of use (pointer over or into the form, focus, a key):
  // the server's result is already on the page, so nothing else waits for it.
  const [wanted, setWanted] = useState(false);
  const want = useCallback(() => setWanted(true), []);
  useEffect(() => {
    if (!wanted) return;
    let alive = true;
    import("@/lib/calc/units").then((m) => alive && setParse(() => m.parseQuantity));
    loadCalculator(slug).then((c) => {
      if (!alive) return;
      setCalc(c);
      // Lets tests and the speed bench know results now follow keystrokes in the browser.
      document.documentElement.dataset.benchReady = "1";
    });
    return () => {
      alive = false;
      delete document.documentElement.dataset.benchReady;
    };
  }, [slug, wanted]);

  // Re-check every field from the latest run, so a message that depends on another field (target below initial) stays current.
  const { trigger } = form;
  useEffect(() => {
    // The resolver reads this run; it is set here, before the re-check, never during render.
    latest.current = calc ? run : null;
    if (calc) void trigger();
  }, [calc, run, trigger]);

  // The address carries the inputs, so the page can be sent to a colleague or reopened later. A bare
  // address already means the opening values, so it is left alone until they change: rewriting it on
  // arrival made the router render the page a second time.
  const [opening] = useState(() => encodeInputs(raw));
  useEffect(() => {
    const t = setTimeout(() => {
      const q = encodeInputs(raw);
      if (q === opening && !window.location.search) return;
      const url = q ? `${window.location.pathname}?${q}` : window.location.pathname;
      if (url !== window.location.pathname + window.location.search) window.history.replaceState(null, "", url);
    }, 300);
    return () => clearTimeout(t);
  }, [raw, opening]);

  const hidden = hiddenFields(bench.modes, mode);
  const shown = inputs.filter((i) => !hidden.has(i.name));
  const visibleNames = new Set(shown.map((i) => i.name));
  const orphanErrors = run.ok ? [] : Object.entries(run.error.fields).filter(([k]) => !visibleNames.has(k.split(".")[0]));
  const dangers = run.ok ? run.result.warnings.filter((w) => w.level === "danger").map((w) => w.message) : [];
  const hazardTyped = typedHazard(typed);
  const showDanger = bench.alwaysDanger || dangers.length > 0 || hazardTyped;
  const modes = bench.modes;
  const advanced = bench.advanced;
  const isAdvanced = (name: string) => advanced?.fields.includes(name) ?? false;
  const advancedError = !run.ok && Object.keys(run.error.fields).some((k) => isAdvanced(k.split(".")[0]));

  return (
    <FormProvider {...form}>
      {showDanger ? (
        <div className="mb-6">
          <DangerBanner extra={dangers} typed={hazardTyped ? typed : null} />
        </div>
      ) : null}
      <div className="gb-calc-grid grid grid-cols-1 items-start gap-8 lg:grid-cols-[minmax(0,5fr)_minmax(0,7fr)]">
        <form
          onSubmit={(e) => e.preventDefault()}
          onPointerEnter={want}
          onPointerDownCapture={want}
          onFocusCapture={want}
          onKeyDownCapture={want}
          noValidate
          aria-labelledby="inputs-title"
          className="gb-no-print min-w-0 rounded-card border border-rule bg-panel p-6 shadow-card"
        >
          <div className="mb-4 flex items-baseline justify-between gap-3">
            <h2 id="inputs-title" className="text-lead font-bold">
              Your values
            </h2>
            <p className="text-note text-muted">4k7 · 47 µF · 250 V · 1.5m</p>
          </div>
          {modes ? (
            <fieldset className="mb-4">
              <legend className="mb-1 font-bold">How to enter it</legend>
              <div className="inline-flex rounded-chip border border-rule bg-sunk p-1">
                {modes.map((m) => (
                  <label
                    key={m.id}
                    className={`min-h-11 cursor-pointer rounded-chip px-3 py-2 font-bold has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-glow ${mode === m.id ? "bg-panel text-ink shadow-sm" : "text-muted"}`}
                  >
                    <input type="radio" name="gb-mode" value={m.id} checked={mode === m.id} onChange={() => setMode(m.id)} className="sr-only" />
                    {m.label}
                  </label>
                ))}
              </div>
            </fieldset>
          ) : null}
          <div className="flex flex-col gap-2">
            {shown
              .filter((m) => !isAdvanced(m.name))
              .map((meta) => (
                <InputControl key={meta.name} meta={meta} slug={slug} />
              ))}
          </div>
          {advanced ? (
            <details
              open={moreOpen || advancedError}
              onToggle={(e) => setMoreOpen(e.currentTarget.open)}
              className="mt-2 rounded-card border border-rule bg-sunk/40"
            >
              <summary className="flex min-h-11 cursor-pointer items-center px-4 py-2 font-bold">{advanced.title}</summary>
              <div className="flex flex-col gap-2 px-4 pb-2">
                {shown
                  .filter((m) => isAdvanced(m.name))
                  .map((meta) => (
                    <InputControl key={meta.name} meta={meta} slug={slug} />
                  ))}
              </div>
            </details>
          ) : null}
          {orphanErrors.length ? (
            <ul role="alert" className="mt-2 text-note font-bold text-flag">
              {orphanErrors.map(([k, m]) => (
                <li key={k}>{plain(m)}</li>
              ))}
            </ul>
          ) : null}
        </form>
        <div className="flex min-w-0 flex-col gap-6 lg:sticky lg:top-4" aria-labelledby="result-title">
          <h2 id="result-title" className="sr-only">
            Result
          </h2>
          <PrintInputs inputs={shown} raw={raw} />
          <ResultsPanel view={bench} outputs={p.outputs} run={run} />
          {later.ok ? <ChartSlot kind={bench.chart} inputs={later.result.inputs} outputs={later.result.outputs} /> : null}
        </div>
      </div>
      <div className="mt-8">
        <Working
          view={bench}
          live={calc !== null}
          open={p.workingOpen}
          run={later}
          outputs={p.outputs}
          serverHtml={p.serverHtml}
          formulas={p.formulas}
          sources={p.sources}
          why={p.why}
        />
      </div>
      <section ref={saveRef} aria-labelledby="save-title" className="gb-no-print mt-8 rounded-card border border-rule bg-panel p-6 shadow-card">
        <h2 id="save-title" className="mb-3 text-lead font-bold">
          Save to a job
        </h2>
        {p.signedIn ? (
          saveNear ? (
            <SaveToJob slug={slug} inputs={raw} disabled={!run.ok} canCreateJob={p.canCreateJob} />
          ) : (
            <p className="text-muted">Loading…</p>
          )
        ) : (
          <p className="text-muted" data-testid="sign-in-invitation">
            Keep this calculation with the set’s record, with a note for whoever picks the job up next.{" "}
            <Link href={`/sign-in?next=/bench/${slug}`} className="font-bold text-signal underline underline-offset-4">
              Sign in to save it to a job
            </Link>{" "}
            or{" "}
            <Link href="/sign-up" className="font-bold text-signal underline underline-offset-4">
              open a workshop
            </Link>
            .
          </p>
        )}
      </section>
      <div className="mt-6">
        <ShareActions
          onReset={() => {
            want();
            form.reset(p.example);
            setMode(initialMode(bench.modes, p.example));
          }}
        />
      </div>
    </FormProvider>
  );
}
