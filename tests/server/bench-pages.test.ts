import { describe, expect, test } from "vitest";
import { calculators } from "../../lib/calc/registry";
import { Client } from "../helpers/http";

/** The Bench works for signed-out visitors: its pages, the calculator list and a calculation. */
describe("the Bench signed out", () => {
  const client = new Client();

  test("GET /api/calculators lists every calculator with its inputs and outputs", async () => {
    const res = await client.get("/api/calculators");
    expect(res.status).toBe(200);
    const list = (await res.json()) as { slug: string; inputs: { name: string }[]; outputs: { name: string }[] }[];
    expect(list.map((c) => c.slug).sort()).toEqual(calculators.map((c) => c.slug).sort());
    const bias = list.find((c) => c.slug === "cathode-bias");
    expect(bias?.inputs.map((i) => i.name)).toContain("plateCurrent");
    expect(bias?.outputs.map((o) => o.name)).toContain("cathodeResistance");
  });

  test("POST /api/calculators/cathode-bias computes without a session, and names a bad field", async () => {
    const ok = await client.post("/api/calculators/cathode-bias", { biasVoltage: "2.5 V", plateCurrent: "1.25m" });
    expect(ok.status).toBe(200);
    const body = await ok.json();
    expect(body.outputs.cathodeResistance).toBeCloseTo(2000, 6);
    expect(body.warnings.some((w: { level: string }) => w.level === "danger")).toBe(true);
    const bad = await client.post("/api/calculators/cathode-bias", { biasVoltage: "2.5 V", plateCurrent: "lots" });
    expect(bad.status).toBe(400);
    expect(Object.keys((await bad.json()).error.fields)).toContain("plateCurrent");
  });

  test("/bench lists every calculator under its bench task, and each page opens with a worked example", async () => {
    const index = await (await client.get("/bench")).text();
    for (const group of ["First power and safety", "Supplies and heaters", "Stages and tubes", "Radio and alignment", "Parts and measuring"])
      expect(index).toContain(group);
    for (const c of calculators) expect(index).toContain(`/bench/${c.slug}`);
    const page = await client.get("/bench/cathode-bias");
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain("Cathode bias resistor");
    expect(html).toContain('data-testid="result"');
    expect(html).toContain('class="katex'); // formulas rendered on the server
    expect(html).toContain("Sign in to save it to a job");
  });

  test("inputs in the address are read on load; an unknown calculator is a 404 page", async () => {
    const html = await (await client.get("/bench/dropping-resistor?supplyVoltage=300&loadVoltage=200&loadCurrent=20m")).text();
    expect(html).toMatch(/data-testid="output-resistance"[^>]*>5 kΩ</);
    const missing = await client.get("/bench/flux-capacitor");
    expect(missing.status).toBe(404);
    expect(await missing.text()).toContain("No such calculator");
  });
});
