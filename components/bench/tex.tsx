"use client";

import { useEffect, useState } from "react";

/**
 * Live LaTeX for the substituted steps. KaTeX is loaded only after the page is interactive, so it
 * never weighs on first load; until then the server's rendering of the same LaTeX is shown.
 */

type Katex = typeof import("katex").default;
let katexModule: Katex | null = null;
let loading: Promise<Katex> | null = null;
const cache = new Map<string, string>();

function loadKatex(): Promise<Katex> {
  loading ??= import("katex").then((m) => (katexModule = m.default));
  return loading;
}

/** KaTeX once `wanted` has been true (after the first interaction), else null and nothing loaded. */
export function useKatex(wanted: boolean): Katex | null {
  const [k, setK] = useState<Katex | null>(katexModule);
  useEffect(() => {
    if (!wanted || k) return;
    let alive = true;
    loadKatex().then((m) => alive && setK(() => m));
    return () => {
      alive = false;
    };
  }, [wanted, k]);
  return k;
}

function render(katex: Katex, latex: string): string {
  let html = cache.get(latex);
  if (html === undefined) {
    html = katex.renderToString(latex, { throwOnError: false, displayMode: true, output: "htmlAndMathml" });
    if (cache.size > 400) cache.clear();
    cache.set(latex, html);
  }
  return html;
}

/** One formula: from KaTeX when loaded, from the server's HTML when it has it, else the LaTeX as text. */
export function Tex({ latex, katex, serverHtml }: { latex: string; katex: Katex | null; serverHtml?: Record<string, string> }) {
  const html = katex ? render(katex, latex) : serverHtml?.[latex];
  if (html === undefined) return <code className="font-mono text-note text-muted break-all">{latex}</code>;
  return <span className="gb-tex" dangerouslySetInnerHTML={{ __html: html }} />;
}
