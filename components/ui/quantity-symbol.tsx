import type { InputMeta } from "@/lib/calc/types";

/**
 * A quantity's symbol typeset with sub- and superscripts (K_{G1} → K with G1 below), light enough for
 * every form label: no KaTeX, which the Bench loads only for the working. The base letter is italic, as a
 * variable is in print; subscripts that name something (G1, VB, P) stay upright.
 */

const GREEK: Record<string, string> = { mu: "μ", alpha: "α", beta: "β", tau: "τ", omega: "ω", rho: "ρ" };

export interface SymbolParts {
  base: string;
  sub?: string;
  sup?: string;
}

/** Reads `base`, `\name`, then `_x`, `_{..}`, `^x`, `^{..}` in either order; anything else stays as text. */
export function parseSymbol(tex: string): SymbolParts {
  const m = /^(\\[a-zA-Z]+|.)((?:[_^](?:\{[^{}]*\}|.))*)$/u.exec(tex.trim());
  if (!m) return { base: tex };
  const base = m[1].startsWith("\\") ? (GREEK[m[1].slice(1)] ?? m[1].slice(1)) : m[1];
  const parts: SymbolParts = { base };
  for (const [, kind, braced, single] of m[2].matchAll(/([_^])(?:\{([^{}]*)\}|(.))/gu)) {
    parts[kind === "_" ? "sub" : "sup"] = braced ?? single;
  }
  return parts;
}

export function QuantitySymbol({ tex }: { tex: string }) {
  const { base, sub, sup } = parseSymbol(tex);
  return (
    <span className="whitespace-nowrap font-normal" data-symbol={tex}>
      <i>{base}</i>
      {sub ? <sub className="text-[0.72em]">{sub}</sub> : null}
      {sup ? <sup className="text-[0.72em]">{sup}</sup> : null}
    </span>
  );
}

/** An input's plain-words label followed by its typeset symbol, where it has one. */
export function InputLabel({ meta }: { meta: Pick<InputMeta, "label" | "symbol"> }) {
  return (
    <>
      {meta.label}
      {meta.symbol ? (
        <>
          {" "}
          <QuantitySymbol tex={meta.symbol} />
        </>
      ) : null}
    </>
  );
}
