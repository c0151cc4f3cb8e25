import { renderToBuffer } from "@react-pdf/renderer";
import { cloneElement, type ReactElement } from "react";
import { beforeAll, describe, expect, test } from "vitest";
import type { Member } from "@/lib/auth/can";
import { demoDatabase } from "../helpers/temp-db";

// The bench sheet reads the job through the query functions: point the one client at a fresh migrated file first.
const demo = await demoDatabase("bench-sheet");
const { DEMO_TELEVISION_TITLE } = await import("@/db/seed-bench-record");
const jobsQ = await import("@/db/queries/jobs");
const partsQ = await import("@/db/queries/parts");
const calcQ = await import("@/db/queries/calculations");
const { partSchema } = await import("@/lib/jobs/part-schemas");
const { benchSheetData } = await import("@/server/bench-sheet/data");
const { BenchSheetDocument } = await import("@/server/bench-sheet/document");
const { HEADING_AHEAD } = await import("@/server/bench-sheet/styles");

let tech: Member;
let big: number;
let tv: number;

beforeAll(async () => {
  ({ tech } = await demo.seed());
  tv = jobsQ.searchJobs(tech, { q: DEMO_TELEVISION_TITLE, page: 1, pageSize: 5, sort: "updatedAt", dir: "desc" } as never).jobs[0].id;
  big = jobsQ.createJob(tech, { title: "Console radio with everything saved", equipmentKind: "console-radio" } as never).id;
  const saved: [string, Record<string, unknown>][] = [
    ["time-constant", { resistance: "470k", capacitance: "50 uF", initialVoltage: 300, targetVoltage: 30 }],
    ["cathode-bias", { biasVoltage: 12.5, plateCurrent: "45 mA", screenCurrent: "4.5 mA", bypassCapacitance: "25 uF" }],
    ["heater-string", { lineVoltage: 117, tubes: ["12BE6", "12BA6", "12AV6", "50C5", "35W4"] }],
    ["supply-ripple", { loadCurrent: "60 mA", capacitance: "40 uF", lineFrequency: 60, rectifier: "full-wave" }],
  ];
  for (let i = 0; i < 100; i++) {
    const [slug, inputs] = saved[i % saved.length];
    calcQ.saveCalculation(tech, big, { slug, inputs, note: i % 3 ? null : `Saved calculation ${i + 1}: checked against the schematic's figures.` });
  }
  for (let i = 0; i < 150; i++) {
    partsQ.createPart(
      tech,
      big,
      partSchema.parse({
        designator: `C${i + 1}`,
        kind: i % 2 ? "paper" : "electrolytic",
        originalValue: "0.05 µF",
        originalRating: "400 V",
        replacementValue: "47 nF",
        replacementRating: "630 V",
        state: i % 4 ? "fitted" : "to-order",
      }),
    );
  }
}, 120_000);

interface Node {
  type: string;
  props?: Record<string, unknown>;
  box?: { top: number; height: number };
  children?: Node[];
}

/** Renders through react-pdf and keeps its page layout (the Document's onRender hands it over). */
async function renderWithLayout(member: Member, jobId: number): Promise<{ pdf: Buffer; pages: Node[] }> {
  let layout: { children: Node[] } | undefined;
  const doc = BenchSheetDocument({ data: benchSheetData(member, jobId) }) as ReactElement<{ onRender?: (r: { _INTERNAL__LAYOUT__DATA_?: unknown }) => void }>;
  const withHook = cloneElement(doc, { onRender: (r) => void (layout = r._INTERNAL__LAYOUT__DATA_ as typeof layout) });
  const pdf = await renderToBuffer(withHook as Parameters<typeof renderToBuffer>[0]);
  return { pdf, pages: layout?.children ?? [] };
}

/** A heading is stranded when nothing but fixed header and footer comes after it on its page. */
function strandedHeadings(pages: Node[]): number[] {
  const stranded: number[] = [];
  pages.forEach((page, i) => {
    const flow = (page.children ?? []).filter((n) => !n.props?.fixed);
    const last = flow[flow.length - 1];
    if (last?.props?.minPresenceAhead === HEADING_AHEAD) stranded.push(i + 1);
  });
  return stranded;
}

const baseFonts = (pdf: Buffer) => [...new Set([...pdf.toString("latin1").matchAll(/\/BaseFont\s*\/([\w+-]+)/g)].map((m) => m[1].replace(/^[A-Z]{6}\+/, "")))];

describe("bench sheet", () => {
  test("100 saved calculations and a 150-part list: it renders page after page, no heading left at a page foot", async () => {
    const { pdf, pages } = await renderWithLayout(tech, big);
    expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
    expect(pages.length).toBeGreaterThan(10);
    expect(strandedHeadings(pages)).toEqual([]);
    // Each heading was found: the check above looked at real headings.
    const headings = pages.flatMap((p) => (p.children ?? []).filter((n) => n.props?.minPresenceAhead === HEADING_AHEAD));
    expect(headings.length).toBe(7);
  }, 180_000);

  test("the television: tubes and verdicts, each power-up's steps, faults with their causes, Ω and Greek as themselves", async () => {
    const data = benchSheetData(tech, tv);
    expect(data.tubes.rows.find((r) => r.position === "V9")).toMatchObject({ type: "6S4", verdict: "Weak", test: "38 (min. 60)" });
    expect(data.tubes.substitutions.find((x) => x.title.startsWith("CRT"))!.lines.map((l) => l.text)).toContainEqual(
      expect.stringMatching(/^Focus: magnetic \(original\), electrostatic \(substitute\)/),
    );
    expect(data.powerUps[0].steps).toHaveLength(5);
    expect(data.powerUps[0].steps.filter((st) => st.overStop)).toHaveLength(1);
    expect(data.powerUps[0].outcome).toMatch(/^Came up well: The 1.35 A/);
    const hunt = data.faults[0];
    expect(hunt.state).toBe("Cause found");
    expect(hunt.candidates.find((c) => c.cause)!.evidence).toContain("reading V9 cathode: 1.6 V");
    expect(data.resistors[0].nominal).toBe("60 Ω");
    const text = JSON.stringify(data);
    expect(text).not.toMatch(/kohm|\btau\b|\bohm\b/);
    const { pdf, pages } = await renderWithLayout(tech, tv);
    expect(strandedHeadings(pages)).toEqual([]);
    const fonts = baseFonts(pdf);
    expect(fonts.some((f) => /AtkinsonHyperlegible/i.test(f))).toBe(true);
    expect(fonts.filter((f) => /Helvetica|Courier|Times/i.test(f))).toEqual([]);
  }, 120_000);

  test("a Greek letter in a saved note is set in the Greek face, not dropped", async () => {
    calcQ.saveCalculation(tech, tv, {
      slug: "time-constant",
      inputs: { resistance: "220k", capacitance: "40 uF", initialVoltage: 300 },
      note: "τ = RC, so 5τ ≈ 44 s; 220 kΩ across C101",
    });
    const data = benchSheetData(tech, tv);
    expect(data.calculations[0].note).toBe("τ = RC, so 5τ ~ 44 s; 220 kΩ across C101");
    const { pdf } = await renderWithLayout(tech, tv);
    expect(baseFonts(pdf).some((f) => /JetBrainsMono/i.test(f))).toBe(true);
  }, 120_000);
});
