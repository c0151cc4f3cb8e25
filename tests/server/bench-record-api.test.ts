import { beforeAll, describe, expect, test } from "vitest";
import { JOB_STATUSES } from "@/lib/vocabulary";
import { mailTo, waitForMail } from "../helpers/mail";
import { makeTeam, type Team } from "../helpers/team";
import { address } from "../helpers/workshops";

/** The bench record through the real server: shapes, field messages for bad input, and the rules with teeth. */

/** At the counter: the step before the set goes home. */
const READY = JOB_STATUSES[JOB_STATUSES.indexOf("returned") - 1];

let team: Team;
const tech = () => team.technician;

async function newJob(extra: Record<string, unknown> = {}): Promise<number> {
  const res = await tech().post("/api/jobs", { title: "Table television, early 1950s", equipmentKind: "television", ...extra });
  if (res.status !== 201) throw new Error(`job: ${res.status} ${await res.text()}`);
  return (await res.json()).job.id;
}
const fields = async (res: Response) => (await res.json()).error.fields as Record<string, string>;
const logText = async (id: number) => JSON.stringify(await (await tech().get(`/api/jobs/${id}/log`)).json());

beforeAll(async () => {
  team = await makeTeam("bench-record");
});

describe("tubes", () => {
  test("a pasted line-up and a substitute's differences, in the shape the contract names", async () => {
    const id = await newJob();
    const lineup = await team.apprentice.post(`/api/jobs/${id}/tubes/lineup`, { types: "6sn7gt 6S4, 17BP4A" });
    expect(lineup.status).toBe(201);
    const { tubes } = await lineup.json();
    expect(tubes.map((t: { position: string }) => t.position)).toEqual(["V1", "V2", "CRT"]);
    const res = await team.apprentice.patch(`/api/jobs/${id}/tubes/${tubes[2].id}`, {
      substitute: "17hp4",
      test: { reading: "30", minimum: 50 },
      verdict: "weak",
    });
    expect(res.status).toBe(200);
    const { tube } = await res.json();
    expect(Object.keys(tube).sort()).toEqual(["createdAt", "differences", "function", "id", "position", "substitute", "test", "type", "updatedAt", "verdict"]);
    expect(tube).toMatchObject({ type: "17BP4A", substitute: "17HP4", test: { reading: 30, minimum: 50 }, verdict: "weak" });
    // RCA picture tube data (from memory): the same 6.3 V 0.6 A heater; magnetic against electrostatic focus.
    expect(tube.differences.slice(0, 2).map((d: { what: string; level: string }) => [d.what, d.level])).toEqual([
      ["Heater voltage", "info"],
      ["Heater current", "info"],
    ]);
    expect(tube.differences.find((d: { what: string }) => d.what === "Focus").level).toBe("caution");
    expect(await logText(id)).toContain("Tube CRT (17BP4A, picture tube): tested 30 against its minimum of 50, verdict weak, substitute 17HP4.");
  });

  test("bad input names each field, never a 500", async () => {
    const id = await newJob();
    const bad = await tech().post(`/api/jobs/${id}/tubes`, { position: "", type: "6SN7<", verdict: "fine", test: { reading: -2 } });
    expect(bad.status).toBe(400);
    expect(Object.keys(await fields(bad)).sort()).toEqual(["position", "test.minimum", "test.reading", "type", "verdict"]);
    const lineup = await tech().post(`/api/jobs/${id}/tubes/lineup`, { types: 42 });
    expect(lineup.status).toBe(400);
    expect(await fields(lineup)).toHaveProperty("types");
    const notJson = await tech().request("POST", `/api/jobs/${id}/tubes`, "position=V1", { "content-type": "application/x-www-form-urlencoded" });
    expect(notJson.status).toBe(415);
  });
});

describe("power-ups", () => {
  test("a step over the stop current is danger, and passing then needs a reason (400 naming reason)", async () => {
    const id = await newJob();
    const start = await team.apprentice.post(`/api/jobs/${id}/power-ups`, {
      limiter: "series-lamp",
      lampPower: "150 W",
      stopCurrent: "1.2 A",
      checklist: { "filters-replaced": true, "caps-discharged": true },
    });
    expect(start.status).toBe(201);
    const { session } = await start.json();
    expect(session).toMatchObject({ limiter: "series-lamp", lampPower: 150, currentLimit: null, stopCurrent: 1.2, outcome: null, steps: [] });
    expect(session.checklistWarnings.map((w: { id: string }) => w.id)).toEqual([
      "fuse-rating",
      "hv-lead-dressed",
      "no-bplus-short",
      "tubes-seated",
      "output-loaded",
    ]);
    const ok = await (
      await team.apprentice.post(`/api/jobs/${id}/power-ups/${session.id}/steps`, { supplyVoltage: "60 V", currentDrawn: "0.5 A", minutes: 5 })
    ).json();
    expect(ok.step).toMatchObject({ supplyVoltage: 60, currentDrawn: 0.5, minutes: 5, bPlus: null, overStop: false, warnings: [] });
    const over = await (
      await team.apprentice.post(`/api/jobs/${id}/power-ups/${session.id}/steps`, {
        supplyVoltage: 90,
        currentDrawn: "1.35 A",
        minutes: 1,
        bPlus: "180 V",
        note: "Lamp flared",
      })
    ).json();
    expect(over.step.overStop).toBe(true);
    expect(over.step.warnings[0].level).toBe("danger");

    const refused = await team.apprentice.patch(`/api/jobs/${id}/power-ups/${session.id}`, { outcome: "passed" });
    expect(refused.status).toBe(400);
    expect(Object.keys(await fields(refused))).toEqual(["reason"]);
    const passed = await team.apprentice.patch(`/api/jobs/${id}/power-ups/${session.id}`, {
      outcome: "passed",
      reason: "Filter charging surge; settled at 1.05 A.",
    });
    expect(passed.status).toBe(200);
    expect((await passed.json()).session).toMatchObject({ outcome: "passed", reason: "Filter charging surge; settled at 1.05 A." });
    expect((await tech().post(`/api/jobs/${id}/power-ups/${session.id}/steps`, { supplyVoltage: 100, currentDrawn: 1, minutes: 1 })).status).toBe(409);
    const { sessions } = await (await tech().get(`/api/jobs/${id}/power-ups`)).json();
    expect(sessions[0].steps.map((st: { overStop: boolean }) => st.overStop)).toEqual([false, true]);
    expect(await logText(id)).toContain("Power-up session passed: Filter charging surge");
  });

  test("bad input names each field", async () => {
    const id = await newJob();
    const bad = await tech().post(`/api/jobs/${id}/power-ups`, { limiter: "series-lamp", stopCurrent: "lots", checklist: { "warm-up": true } });
    expect(bad.status).toBe(400);
    expect(Object.keys(await fields(bad)).sort()).toEqual(["checklist", "stopCurrent"]);
    const lamp = await tech().post(`/api/jobs/${id}/power-ups`, { limiter: "series-lamp", stopCurrent: "1 A" });
    expect(await fields(lamp)).toEqual({ lampPower: "Give the series lamp's power, like 100 W." });
    const { session } = await (await tech().post(`/api/jobs/${id}/power-ups`, { limiter: "variac", stopCurrent: "1 A" })).json();
    const step = await tech().post(`/api/jobs/${id}/power-ups/${session.id}/steps`, { supplyVoltage: "abc", currentDrawn: -1 });
    expect(Object.keys(await fields(step)).sort()).toEqual(["currentDrawn", "minutes", "supplyVoltage"]);
    const outcome = await tech().patch(`/api/jobs/${id}/power-ups/${session.id}`, { outcome: "fine" });
    expect(await fields(outcome)).toHaveProperty("outcome");
  });
});

describe("faults", () => {
  test("open → found → fixed as candidates change, with a reading as evidence; back to open when the cause is reopened", async () => {
    const id = await newJob();
    const { fault } = await (
      await team.apprentice.post(`/api/jobs/${id}/faults`, { symptom: "No vertical deflection", section: "vertical deflection" })
    ).json();
    expect(fault).toMatchObject({ state: "open", candidates: [], resolution: null });
    const ids: number[] = [];
    for (const description of ["Yoke", "Vertical output transformer", "Vertical output tube", "Vertical oscillator"]) {
      ids.push((await (await team.apprentice.post(`/api/jobs/${id}/faults/${fault.id}/candidates`, { description })).json()).candidate.id);
    }
    const { reading } = await (
      await team.apprentice.post(`/api/jobs/${id}/readings`, { kind: "voltage", designator: "V9 cathode", nominal: 18, measured: 1.6 })
    ).json();
    const early = await team.apprentice.patch(`/api/jobs/${id}/faults/${fault.id}`, { resolution: "New tube" });
    expect(early.status).toBe(400);
    expect(await fields(early)).toHaveProperty("resolution");
    const found = await (
      await team.apprentice.patch(`/api/jobs/${id}/faults/${fault.id}/candidates/${ids[2]}`, {
        status: "cause",
        readingId: reading.id,
        evidence: "Cathode at 1.6 V",
      })
    ).json();
    expect(found.fault.state).toBe("found");
    expect(found.candidate).toMatchObject({
      position: 3,
      status: "cause",
      evidence: "Cathode at 1.6 V",
      readingId: reading.id,
      reading: { designator: "V9 cathode", measured: 1.6, unit: "V" },
    });
    const fixed = await (await team.apprentice.patch(`/api/jobs/${id}/faults/${fault.id}`, { resolution: "Fitted a new vertical output tube" })).json();
    expect(fixed.fault.state).toBe("fixed");
    const reopened = await (await tech().patch(`/api/jobs/${id}/faults/${fault.id}/candidates/${ids[2]}`, { status: "open" })).json();
    expect(reopened.fault.state).toBe("open");
    const log = await logText(id);
    expect(log).toContain("Fault found: “No vertical deflection” (points to the vertical deflection).");
    expect(log).toContain("The fault is open again.");
  });

  test("bad input and another job's reading name their fields", async () => {
    const id = await newJob();
    const other = await newJob();
    const { reading } = await (await tech().post(`/api/jobs/${other}/readings`, { kind: "resistor", designator: "R1", nominal: "1k", measured: "1k" })).json();
    expect(await fields(await tech().post(`/api/jobs/${id}/faults`, { symptom: "  " }))).toHaveProperty("symptom");
    const { fault } = await (await tech().post(`/api/jobs/${id}/faults`, { symptom: "Weak sound" })).json();
    expect(await fields(await tech().post(`/api/jobs/${id}/faults/${fault.id}/candidates`, {}))).toHaveProperty("description");
    const { candidate } = await (await tech().post(`/api/jobs/${id}/faults/${fault.id}/candidates`, { description: "Output tube" })).json();
    expect(await fields(await tech().patch(`/api/jobs/${id}/faults/${fault.id}/candidates/${candidate.id}`, { status: "maybe" }))).toHaveProperty("status");
    const foreign = await tech().patch(`/api/jobs/${id}/faults/${fault.id}/candidates/${candidate.id}`, { readingId: reading.id });
    expect(foreign.status).toBe(400);
    expect(await fields(foreign)).toHaveProperty("readingId");
  });
});

describe("checks before ready", () => {
  test("moving to ready answers 409 with the checks; with a reason it goes on, and the reason is in the Log", async () => {
    const id = await newJob();
    await tech().post(`/api/jobs/${id}/parts`, { designator: "C7", kind: "paper", state: "ordered" });
    await tech().post(`/api/jobs/${id}/faults`, { symptom: "Picture rolls" });
    const refused = await tech().post(`/api/jobs/${id}/status`, { status: READY });
    expect(refused.status).toBe(409);
    const { error } = await refused.json();
    expect(error.fields).toEqual({});
    expect(error.checks.map((c: { id: string }) => c.id)).toEqual(["parts-not-fitted", "open-faults", "no-passed-power-up"]);
    expect(error.message).toContain("C7");
    expect((await (await tech().get(`/api/jobs/${id}`)).json()).job.status).not.toBe(READY);
    expect((await (await tech().get(`/api/jobs/${id}/ready-checks`)).json()).checks).toHaveLength(3);

    const noReason = await tech().post(`/api/jobs/${id}/status`, { status: READY, override: true });
    expect(noReason.status).toBe(400);
    expect(Object.keys(await fields(noReason))).toEqual(["reason"]);
    const moved = await tech().post(`/api/jobs/${id}/status`, { status: READY, override: true, reason: "Customer collects today; C7 goes in later" });
    expect(moved.status).toBe(200);
    expect((await moved.json()).job.status).toBe(READY);
    expect(await logText(id)).toContain("Reason: Customer collects today; C7 goes in later");
  });

  test("a finished record moves to ready without a word; the ready message checks too, and goes with a reason", async () => {
    const customer = address("bench-record-customer");
    const id = await newJob({ customerName: "Ansel Quarrie", customerEmail: customer });
    const { part } = await (await tech().post(`/api/jobs/${id}/parts`, { designator: "C1", kind: "electrolytic", state: "ordered" })).json();
    // An apprentice records the fitting; the technician's check is shown beside it.
    const fitted = await (await team.apprentice.patch(`/api/jobs/${id}/parts/${part.id}`, { state: "fitted" })).json();
    expect(fitted.part.checkedBy).toBeNull();
    expect((await team.apprentice.patch(`/api/jobs/${id}/parts/${part.id}`, { checked: true })).status).toBe(403);
    expect((await team.apprentice.patch(`/api/jobs/${id}/parts/${part.id}`, { state: "ordered" })).status).toBe(403);
    const checked = await (await tech().patch(`/api/jobs/${id}/parts/${part.id}`, { checked: true })).json();
    expect(checked.part.checkedBy.name).toMatch(/technician/);
    const { session } = await (await tech().post(`/api/jobs/${id}/power-ups`, { limiter: "variac", stopCurrent: "1 A" })).json();
    await tech().post(`/api/jobs/${id}/power-ups/${session.id}/steps`, { supplyVoltage: 117, currentDrawn: 0.6, minutes: 30 });
    await tech().patch(`/api/jobs/${id}/power-ups/${session.id}`, { outcome: "passed" });
    expect((await tech().post(`/api/jobs/${id}/status`, { status: READY })).status).toBe(200);

    // A fault turns up after "ready": the message now checks the record again.
    await tech().post(`/api/jobs/${id}/faults`, { symptom: "Intermittent sound" });
    const refused = await tech().post(`/api/jobs/${id}/ready-message`, { subject: "Ready", text: "Your set is ready." });
    expect(refused.status).toBe(409);
    expect((await refused.json()).error.checks.map((c: { id: string }) => c.id)).toEqual(["open-faults"]);
    expect(mailTo(customer)).toEqual([]);
    const sent = await tech().post(`/api/jobs/${id}/ready-message`, {
      subject: "Ready",
      text: "Your set is ready.",
      override: true,
      reason: "Customer knows; will bring it back if it recurs",
    });
    expect(sent.status).toBe(200);
    expect((await waitForMail(customer)).attachments[0].content.subarray(0, 5).toString()).toBe("%PDF-");
    expect(await logText(id)).toContain("Ready message sent with checks still open");
  });

  test("the bench sheet of a job with 25 saved calculations is a PDF, not a 500", async () => {
    const id = await newJob();
    for (let i = 0; i < 25; i++) {
      const res = await tech().post(`/api/jobs/${id}/calculations`, {
        slug: "time-constant",
        inputs: { resistance: "470k", capacitance: "50 uF", initialVoltage: 300, targetVoltage: 30 },
        note: `Check ${i + 1}: τ of the filter with its bleeder`,
      });
      expect(res.status).toBe(201);
    }
    const pdf = await tech().get(`/api/jobs/${id}/bench-sheet`);
    expect(pdf.status).toBe(200);
    expect(pdf.headers.get("content-type")).toBe("application/pdf");
    expect(
      Buffer.from(await pdf.arrayBuffer())
        .subarray(0, 5)
        .toString(),
    ).toBe("%PDF-");
  }, 120_000);
});
