import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { samples } from "../bench/samples";
import { Client, baseUrl } from "../helpers/http";

/**
 * The calculator API through the real production server, signed out. CONTRACT is docs/PRODUCT.md's
 * table written out: slugs, input names (with the defaults it states) and output names.
 */
const CONTRACT: Record<string, { inputs: string[]; defaults?: Record<string, unknown>; outputs: string[] }> = {
  "cathode-bias": {
    inputs: ["biasVoltage", "plateCurrent", "screenCurrent", "bypassCapacitance", "amplificationFactor", "plateResistance", "plateLoad", "transconductance"],
    defaults: { screenCurrent: 0 },
    outputs: ["cathodeCurrent", "cathodeResistance", "dissipation", "suggestedRating", "nearestPreferred", "bypassCornerFrequency"],
  },
  "time-constant": {
    inputs: ["resistance", "capacitance", "initialVoltage", "targetVoltage", "elapsed"],
    outputs: ["timeConstant", "fiveTau", "timeToTarget", "voltageAtElapsed"],
  },
  bleeder: {
    // "Additions": capacitorTolerance and resistorTolerance replace tolerance (still accepted as the resistor's).
    inputs: ["capacitance", "workingVoltage", "safeVoltage", "maxTime", "capacitorTolerance", "resistorTolerance"],
    defaults: { safeVoltage: 60, maxTime: 5, capacitorTolerance: 0.5, resistorTolerance: 0.05 },
    outputs: ["maxResistance", "suggestedResistance", "bleederCurrent", "dissipation", "suggestedRating", "resistorsInSeries", "voltagePerResistor"],
  },
  "supply-ripple": {
    inputs: ["loadCurrent", "capacitance", "lineFrequency", "rectifier", "stages"],
    defaults: { lineFrequency: 60 },
    outputs: ["rippleFrequency", "ripplePeakToPeak", "rippleRms", "stages", "finalRippleRms"],
  },
  "dropping-resistor": {
    inputs: ["supplyVoltage", "loadVoltage", "loadCurrent"],
    outputs: ["resistance", "dissipation", "suggestedRating", "nearestPreferred", "loadVoltageWithPreferred"],
  },
  "heater-string": {
    inputs: ["lineVoltage", "heaters", "tubes", "pilotLamp"],
    outputs: ["stringVoltage", "stringCurrent", "currentsMatch", "droppingResistance", "dissipation", "suggestedRating", "shunts"],
  },
  "arc-clearance": {
    inputs: ["peakVoltage", "gap", "pressure", "temperature", "safetyFactor", "electrode", "altitude"],
    defaults: { pressure: 101325, temperature: 293.15, safetyFactor: 2, electrode: "non-uniform", altitude: 0 },
    outputs: ["relativeAirDensity", "breakdownVoltage", "willArc", "minimumGap", "recommendedClearance", "standardClearance"],
  },
  "resistor-drift": {
    inputs: ["nominal", "measured", "tolerance"],
    defaults: { tolerance: 0.2 },
    outputs: ["deviation", "withinTolerance", "verdict"],
  },
  "ohms-law": {
    inputs: ["voltage", "current", "resistance", "power"],
    outputs: ["voltage", "current", "resistance", "power"],
  },
  reactance: {
    inputs: ["frequency", "capacitance", "inductance"],
    outputs: ["capacitiveReactance", "inductiveReactance", "resonantFrequency"],
  },
  "triode-stage": {
    // docs/PRODUCT.md names the model parameters µ, EX, KG1, KP, KVB; the API spells them mu, ex, kg1, kp, kvb.
    inputs: ["tube", "mu", "ex", "kg1", "kp", "kvb", "supplyVoltage", "plateResistor", "cathodeResistor", "cathodeBypassed", "loadResistance"],
    defaults: { cathodeBypassed: true },
    outputs: [
      "plateVoltage",
      "plateCurrent",
      "cathodeVoltage",
      "plateDissipation",
      "amplificationFactor",
      "plateResistance",
      "transconductance",
      "gain",
      "plateToChassisVoltage",
    ],
  },
  "colour-code": {
    inputs: ["bands", "resistance", "tolerance"],
    outputs: ["resistance", "tolerance", "bands"],
  },
  "preferred-value": {
    inputs: ["value", "series"],
    defaults: { series: "E12" },
    outputs: ["nearest", "below", "above", "errorOfNearest"],
  },
  // docs/PRODUCT.md, "More calculators".
  "series-lamp": {
    inputs: ["lineVoltage", "lampPower", "setPower"],
    defaults: { lineVoltage: 120 },
    outputs: ["lampHotResistance", "lampColdResistance", "maxCurrent", "setCurrent", "setVoltage"],
  },
  reforming: {
    inputs: ["capacitance", "ratedVoltage", "seriesResistance", "leakageFactor", "leakageOffset", "leakageFloor"],
    defaults: { leakageFactor: 0.01, leakageOffset: 0, leakageFloor: 3e-6 },
    outputs: ["leakageLimit", "initialCurrent", "resistorPower", "timeConstant", "steps"],
  },
  "b-plus": {
    inputs: ["secondaryVoltage", "rectifier", "rectifierDrop", "rectifierTube", "loadCurrent", "capacitance", "lineFrequency", "windingResistance"],
    defaults: { lineFrequency: 60, windingResistance: 0 },
    outputs: ["peakVoltage", "rippleFrequency", "ripplePeakToPeak", "dcOutput", "maxReservoirCapacitance"],
  },
  "meter-loading": {
    inputs: ["trueVoltage", "sourceResistance", "ohmsPerVolt", "range", "inputResistance"],
    outputs: ["meterResistance", "indicatedVoltage", "error"],
  },
  fuse: {
    inputs: ["loadPower", "loadCurrent", "lineVoltage", "powerFactor", "kind"],
    defaults: { lineVoltage: 120, powerFactor: 1 },
    outputs: ["runningCurrent", "suggestedRating", "ratingSeries"],
  },
  "coupling-cap": {
    inputs: ["capacitance", "gridResistance", "sourceResistance", "leakageCurrent", "maxGridResistance"],
    defaults: { sourceResistance: 0 },
    outputs: ["cornerFrequency", "gridShift"],
  },
  "plate-dissipation": {
    inputs: ["plateVoltage", "cathodeVoltage", "plateCurrent", "tube", "maxDissipation"],
    defaults: { cathodeVoltage: 0 },
    outputs: ["dissipation", "fractionOfMax"],
  },
  "output-transformer": {
    inputs: ["primaryImpedance", "secondaryImpedance", "newLoad"],
    outputs: ["turnsRatio", "reflectedImpedance"],
  },
  "vr-tube": {
    inputs: ["supplyVoltage", "tube", "regulatedVoltage", "minCurrent", "maxCurrent", "loadCurrentMin", "loadCurrentMax"],
    defaults: { loadCurrentMin: 0 },
    outputs: ["seriesResistance", "tubeCurrentAtMinLoad", "resistorPower"],
  },
  superhet: {
    inputs: ["signalFrequency", "intermediateFrequency", "oscillatorAbove"],
    defaults: { intermediateFrequency: 455000, oscillatorAbove: true },
    outputs: ["oscillatorFrequency", "imageFrequency"],
  },
  "series-parallel": {
    inputs: ["target", "series", "mode"],
    defaults: { series: "E12" },
    outputs: ["first", "second", "mode", "combined", "error"],
  },
  "vintage-markings": {
    inputs: ["scheme", "body", "end", "dot"],
    defaults: { scheme: "body-end-dot" },
    outputs: ["resistance"],
  },
};

const SLUGS = Object.keys(CONTRACT);
const visitor = new Client(); // never signs in

async function calc(slug: string, body: unknown, headers?: Record<string, string>) {
  const res = await visitor.post(`/api/calculators/${slug}`, body, headers);
  const text = await res.text();
  let json: any;
  try {
    json = JSON.parse(text);
  } catch {
    throw new Error(`POST ${slug} answered ${res.status} with non-JSON: ${text.slice(0, 200)}`);
  }
  return { status: res.status, body: json, type: res.headers.get("content-type") ?? "" };
}

function expectFieldError(r: { status: number; body: any }, field: string, pattern?: RegExp) {
  expect(r.status, JSON.stringify(r.body)).toBe(400);
  expect(typeof r.body.error.message).toBe("string");
  expect(r.body.error.message.length).toBeGreaterThan(0);
  expect(typeof r.body.error.fields[field], `a message under ${field}: ${JSON.stringify(r.body.error.fields)}`).toBe("string");
  if (pattern) expect(r.body.error.fields[field]).toMatch(pattern);
}

const dangers = (body: any) => (body.warnings as { level: string }[]).filter((w) => w.level === "danger");

describe("GET /api/calculators", () => {
  test("lists exactly docs/PRODUCT.md's calculators, each with every input and output name it gives (additions allowed, nothing renamed)", async () => {
    const res = await visitor.get("/api/calculators");
    expect(res.status).toBe(200);
    const list = (await res.json()) as { slug: string; title: string; inputs: any[]; outputs: any[] }[];
    expect(list.map((c) => c.slug).sort()).toEqual([...SLUGS].sort());
    for (const c of list) {
      const want = CONTRACT[c.slug];
      expect(typeof c.title).toBe("string");
      expect(
        c.inputs.map((i) => i.name),
        c.slug,
      ).toEqual(expect.arrayContaining(want.inputs));
      expect(
        c.outputs.map((o) => o.name),
        c.slug,
      ).toEqual(expect.arrayContaining(want.outputs));
      for (const i of c.inputs) {
        expect(Object.keys(i).sort()).toEqual(["default", "name", "required", "unit"]);
        expect(typeof i.unit).toBe("string");
        expect(typeof i.required).toBe("boolean");
      }
      for (const o of c.outputs) expect(Object.keys(o).sort()).toEqual(["name", "unit"]);
      for (const [name, value] of Object.entries(want.defaults ?? {})) {
        const input = c.inputs.find((i) => i.name === name);
        expect(input.default, `${c.slug}.${name} default`).toEqual(value);
        expect(input.required, `${c.slug}.${name} has a default, so it is optional`).toBe(false);
      }
    }
  });

  test("inputs and outputs carry docs/PRODUCT.md's SI units", async () => {
    const list = (await (await visitor.get("/api/calculators")).json()) as any[];
    const unitOf = (slug: string, side: "inputs" | "outputs", name: string) => list.find((c) => c.slug === slug)[side].find((x: any) => x.name === name).unit;
    expect(unitOf("cathode-bias", "inputs", "biasVoltage")).toBe("V");
    expect(unitOf("cathode-bias", "outputs", "cathodeResistance")).toBe("Ω");
    expect(unitOf("time-constant", "inputs", "capacitance")).toBe("F");
    expect(unitOf("time-constant", "outputs", "timeConstant")).toBe("s");
    expect(unitOf("supply-ripple", "outputs", "rippleFrequency")).toBe("Hz");
    expect(unitOf("arc-clearance", "inputs", "pressure")).toBe("Pa");
    expect(unitOf("arc-clearance", "inputs", "temperature")).toBe("K");
    expect(unitOf("arc-clearance", "outputs", "minimumGap")).toBe("m");
    expect(unitOf("reactance", "inputs", "inductance")).toBe("H");
    expect(unitOf("bleeder", "outputs", "dissipation")).toBe("W");
  });
});

describe("POST /api/calculators/{slug}: valid input, signed out", () => {
  test.each(SLUGS)("%s answers 200 with the contract's shape and every output", async (slug) => {
    const r = await calc(slug, samples[slug]);
    expect(r.status, JSON.stringify(r.body)).toBe(200);
    expect(r.type).toMatch(/application\/json/);
    expect(Object.keys(r.body).sort()).toEqual(["inputs", "outputs", "references", "slug", "steps", "warnings"]);
    expect(r.body.slug).toBe(slug);
    for (const name of CONTRACT[slug].outputs) expect(r.body.outputs, `${slug}.${name}`).toHaveProperty(name);
    for (const v of Object.values(r.body.outputs)) {
      if (typeof v === "number") expect(Number.isFinite(v)).toBe(true);
    }
    expect(r.body.steps.length).toBeGreaterThan(0);
    for (const s of r.body.steps) {
      expect(typeof s.label).toBe("string");
      expect(typeof s.latex).toBe("string");
    }
    for (const w of r.body.warnings) expect(["danger", "caution", "info"]).toContain(w.level);
    expect(r.body.references.length).toBeGreaterThan(0);
    for (const ref of r.body.references) {
      expect(typeof ref.title).toBe("string");
      expect(typeof ref.detail).toBe("string");
    }
  });

  test('engineering strings ("4.7k", "47 uF", "250 V") come back as SI numbers', async () => {
    const r = await calc("time-constant", { resistance: "4.7k", capacitance: "47 uF", initialVoltage: "250 V" });
    expect(r.status).toBe(200);
    expect(r.body.inputs).toMatchObject({ resistance: 4700, capacitance: 47e-6, initialVoltage: 250 });
    // τ = RC: 4.7 kΩ × 47 µF = 0.2209 s
    expect(r.body.outputs.timeConstant).toBeCloseTo(4700 * 47e-6, 12);
    expect(r.body.outputs.fiveTau).toBeCloseTo(5 * 4700 * 47e-6, 12);
    const rkm = await calc("ohms-law", { voltage: "12 V", resistance: "4k7" });
    expect(rkm.status).toBe(200);
    expect(rkm.body.inputs.resistance).toBe(4700);
    expect(rkm.body.outputs.current).toBeCloseTo(12 / 4700, 15);
  });

  test("defaults fill absent inputs", async () => {
    const r = await calc("bleeder", { capacitance: "40 uF", workingVoltage: "450 V" });
    expect(r.status).toBe(200);
    expect(r.body.inputs).toMatchObject({ safeVoltage: 60, maxTime: 5, capacitorTolerance: 0.5, resistorTolerance: 0.05 });
  });

  test("mismatched heater currents are a caution, not an error", async () => {
    const r = await calc("heater-string", {
      lineVoltage: "120 V",
      heaters: [
        { voltage: 12.6, current: "150 mA" },
        { voltage: 12.6, current: 0.15 },
        { voltage: "50 V", current: 0.15 },
        { voltage: 6.3, current: "300 mA" },
      ],
    });
    expect(r.status, JSON.stringify(r.body)).toBe(200);
    expect(r.body.outputs.currentsMatch).toBe(false);
    expect(r.body.warnings.some((w: any) => w.level === "caution" && /different currents/.test(w.message))).toBe(true);
  });

  test("every result involving more than 50 V carries a danger warning; a 12 V one does not", async () => {
    const hot: [string, Record<string, unknown>][] = [
      ["time-constant", { resistance: "220k", capacitance: "47 uF", initialVoltage: "350 V" }],
      ["dropping-resistor", { supplyVoltage: "300 V", loadVoltage: "250 V", loadCurrent: "10 mA" }],
      ["heater-string", { lineVoltage: "120 V", tubes: ["12BE6", "12BA6", "12AV6", "50C5", "35W4"] }],
      ["triode-stage", { tube: "12AX7", supplyVoltage: "250 V", plateResistor: "100k", cathodeResistor: "1.5k" }],
      ["bleeder", { capacitance: "40 uF", workingVoltage: "450 V" }],
      ["arc-clearance", { peakVoltage: "15 kV", gap: "5 mm" }],
      ["ohms-law", { voltage: "250 V", resistance: "100k" }],
      ["ohms-law", { current: "10 mA", resistance: "10k" }], // 100 V, computed rather than entered
      ["supply-ripple", { loadCurrent: "80 mA", capacitance: "40 uF", rectifier: "full-wave" }],
      ["cathode-bias", { biasVoltage: "12.5 V", plateCurrent: "48 mA", screenCurrent: "5 mA" }],
    ];
    for (const [slug, body] of hot) {
      const r = await calc(slug, body);
      expect(r.status, `${slug} ${JSON.stringify(r.body)}`).toBe(200);
      expect(dangers(r.body).length, `${slug} ${JSON.stringify(body)} has a danger warning`).toBeGreaterThan(0);
      expect(dangers(r.body).some((w: any) => /local electrical codes/.test(w.message))).toBe(true);
    }
    const cold = await calc("ohms-law", { voltage: "12 V", resistance: "1k" });
    expect(dangers(cold.body)).toEqual([]);
    const coldTau = await calc("time-constant", { resistance: "1k", capacitance: "1 uF", initialVoltage: "9 V" });
    expect(dangers(coldTau.body)).toEqual([]);
  });
});

describe("POST /api/calculators/{slug}: bad input is a 400 naming the field", () => {
  test("missing required inputs", async () => {
    const r = await calc("cathode-bias", {});
    expectFieldError(r, "biasVoltage", /required/);
    expectFieldError(r, "plateCurrent", /required/);
  });

  test("wrong types", async () => {
    const r = await calc("time-constant", { resistance: true, capacitance: [1], initialVoltage: { v: 1 } });
    expectFieldError(r, "resistance");
    expectFieldError(r, "capacitance");
    expectFieldError(r, "initialVoltage");
    const rect = await calc("supply-ripple", { loadCurrent: 0.08, capacitance: 40e-6, rectifier: "three-phase" });
    expectFieldError(rect, "rectifier");
  });

  test.each(["NaN", "Infinity", "-Infinity", "1e400", "abc"])("NaN-like %s", async (v) => {
    expectFieldError(await calc("dropping-resistor", { supplyVoltage: v, loadVoltage: 250, loadCurrent: 0.01 }), "supplyVoltage");
  });

  test("null for a required input", async () => {
    expectFieldError(await calc("dropping-resistor", { supplyVoltage: null, loadVoltage: 250, loadCurrent: 0.01 }), "supplyVoltage", /required/);
  });

  test("negative where impossible", async () => {
    expectFieldError(await calc("time-constant", { resistance: -1000, capacitance: "47 uF", initialVoltage: 350 }), "resistance");
    expectFieldError(await calc("bleeder", { capacitance: "-40 uF", workingVoltage: 450 }), "capacitance");
    expectFieldError(await calc("triode-stage", { tube: "12AX7", supplyVoltage: 250, plateResistor: "100k", cathodeResistor: -1500 }), "cathodeResistor");
    expectFieldError(await calc("ohms-law", { resistance: "1k", power: -1 }), "power");
  });

  test("wrong unit", async () => {
    expectFieldError(
      await calc("time-constant", { resistance: "220k", capacitance: "5 V", initialVoltage: 350 }),
      "capacitance",
      /expected a capacitance, got volts/,
    );
    expectFieldError(await calc("cathode-bias", { biasVoltage: "1.5 A", plateCurrent: "1 mA" }), "biasVoltage", /expected a voltage, got amperes/);
  });

  test("target above the initial voltage for time-constant", async () => {
    const r = await calc("time-constant", { resistance: "220k", capacitance: "47 uF", initialVoltage: "350 V", targetVoltage: "400 V" });
    expectFieldError(r, "targetVoltage", /below the initial voltage/);
  });

  test("an unknown tube names its list position", async () => {
    const r = await calc("heater-string", { lineVoltage: 120, tubes: ["12BE6", "99ZZ9"] });
    expect(r.status).toBe(400);
    expect(Object.keys(r.body.error.fields).join(" ")).toMatch(/tubes/);
  });

  test("a body that is not an object, or not JSON at all", async () => {
    for (const body of ["[1,2]", '"text"', "42", "null"]) {
      const r = await calc("ohms-law", body, { "content-type": "application/json" });
      expect(r.status, body).toBe(400);
      expect(typeof r.body.error.message).toBe("string");
      expect(r.body.error.fields).toEqual({});
    }
    const broken = await calc("ohms-law", "{ voltage: ", { "content-type": "application/json" });
    expect(broken.status).toBe(400);
    expect(broken.body.error.message).toMatch(/not valid JSON/);
  });

  test("property: random invalid bodies always get a 400 with a message under the bad field", async () => {
    // Required fields whose bad value is unambiguous, with the unit of another kind for a wrong-unit case.
    const required: [string, string, string][] = [
      ["cathode-bias", "plateCurrent", "1.5 V"],
      ["time-constant", "resistance", "47 uF"],
      ["time-constant", "initialVoltage", "10 mA"],
      ["bleeder", "workingVoltage", "40 uF"],
      ["supply-ripple", "loadCurrent", "40 uF"],
      ["dropping-resistor", "loadCurrent", "250 V"],
      ["heater-string", "lineVoltage", "0.15 A"],
      ["arc-clearance", "peakVoltage", "5 mm"],
      ["resistor-drift", "nominal", "100 V"],
      ["triode-stage", "plateResistor", "250 V"],
      ["preferred-value", "value", "250 V"],
    ];
    const bad = fc.oneof(
      fc.constantFrom<unknown>(true, false, null, "", "NaN", "Infinity", "1e999", "volts", {}, [], [1, 2], "-"),
      fc.double({ max: -1e-6, noNaN: true, noDefaultInfinity: true }), // negative: impossible for all of these
      fc.constant("WRONG_UNIT"),
      fc.constant("DELETE"),
    );
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...required), bad, async ([slug, field, wrongUnit], value) => {
        const body: Record<string, unknown> = { ...samples[slug] };
        if (value === "DELETE") delete body[field];
        else body[field] = value === "WRONG_UNIT" ? wrongUnit : value;
        const r = await calc(slug, body);
        expect(r.status, `${slug} ${JSON.stringify(body)} → ${JSON.stringify(r.body)}`).toBe(400);
        expect(Object.keys(r.body.error.fields).length).toBeGreaterThan(0);
        expect(typeof r.body.error.fields[field]).toBe("string");
      }),
      { numRuns: 30 },
    );
  });
});

describe("POST /api/calculators/{slug}: statuses", () => {
  test("404 for an unknown slug, as JSON", async () => {
    const r = await calc("flux-capacitor", { voltage: 1 });
    expect(r.status).toBe(404);
    expect(r.body.error.message).toMatch(/flux-capacitor/);
  });

  test("413 for a body over 64 KiB", async () => {
    const big = JSON.stringify({ voltage: 12, resistance: 1000, padding: "x".repeat(70 * 1024) });
    const r = await calc("ohms-law", big, { "content-type": "application/json" });
    expect(r.status).toBe(413);
    expect(r.body.error.message).toMatch(/64 KiB/);
  });

  test("a body just under 64 KiB is still read", async () => {
    const r = await calc("ohms-law", JSON.stringify({ voltage: 12, resistance: 1000, padding: "x".repeat(60 * 1024) }), {
      "content-type": "application/json",
    });
    expect(r.status).toBe(200);
  });

  test("415 for a body that is not JSON", async () => {
    const text = await calc("ohms-law", "voltage=12&resistance=1000", { "content-type": "application/x-www-form-urlencoded" });
    expect(text.status).toBe(415);
    const plain = await calc("ohms-law", '{"voltage":12,"resistance":1000}', { "content-type": "text/plain" });
    expect(plain.status).toBe(415);
    expect(plain.body.error.message).toMatch(/application\/json/);
  });

  test("signed out is enough: no cookie is set or needed", async () => {
    const res = await fetch(`${baseUrl()}/api/calculators/ohms-law`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ voltage: 12, resistance: 1000 }),
    });
    expect(res.status).toBe(200);
    expect(res.headers.getSetCookie()).toEqual([]);
  });
});
