import { describe, expect, test } from "vitest";
import { parseSymbol } from "@/components/ui/quantity-symbol";
import { calculator } from "@/lib/calc/triode-stage";

// N. L. Koren, "Improved vacuum tube models for SPICE simulations", Glass Audio 8(5), 1996, revised online
// 20 March 2003: the triode's parameters µ, x (EX), K_G1, K_P and K_VB. The API names stay mu, ex, kg1, kp, kvb.
const MODEL = ["mu", "ex", "kg1", "kp", "kvb"];

describe("triode model parameters are named in words and typeset, not listed as bare tokens", () => {
  const inputs = calculator.inputs.filter((i) => MODEL.includes(i.name));
  test("the five API names are unchanged", () => {
    expect(inputs.map((i) => i.name)).toEqual(MODEL);
  });
  test.each(inputs.map((i) => [i.name, i] as const))("%s has a plain-words label and a symbol", (_, i) => {
    expect(i.label).toMatch(/^[A-Z][a-z]+ [a-z]+$|^Exponent$/);
    expect(i.label).not.toMatch(/\b(?:MU|EX|KG1|KP|KVB|Model)\b/);
    expect(i.symbol).toBeTruthy();
  });
  test("symbols are written as Koren's article sets them", () => {
    expect(Object.fromEntries(inputs.map((i) => [i.name, parseSymbol(i.symbol!)]))).toEqual({
      mu: { base: "μ" },
      ex: { base: "x" },
      kg1: { base: "K", sub: "G1" },
      kp: { base: "K", sub: "P" },
      kvb: { base: "K", sub: "VB" },
    });
  });
  test("the reference cites the published model with both dates", () => {
    const koren = calculator.references.find((r) => /Koren/.test(r.title));
    expect(koren?.title).toMatch(/1996/);
    expect(koren?.title).toMatch(/2003/);
  });
  test("a message about a missing parameter names it in words", () => {
    const r = calculator.schema.safeParse({ mu: 100, supplyVoltage: 250, plateResistor: 100e3, cathodeResistor: 1500 });
    expect(r.success).toBe(false);
    const messages = r.success ? [] : r.error.issues.map((x) => x.message);
    expect(messages).toContain("Grid constant is required when no tube type is chosen");
  });
});

describe("parseSymbol", () => {
  test.each([
    ["K_{G1}", { base: "K", sub: "G1" }],
    ["R_k", { base: "R", sub: "k" }],
    ["E_p^2", { base: "E", sub: "p", sup: "2" }],
    ["\\mu", { base: "μ" }],
    ["V^{2}_{rms}", { base: "V", sub: "rms", sup: "2" }],
  ])("%s", (tex, parts) => {
    expect(parseSymbol(tex)).toEqual(parts);
  });
  test("text outside the small grammar is kept as it is", () => {
    expect(parseSymbol("two words")).toEqual({ base: "two words" });
  });
});
