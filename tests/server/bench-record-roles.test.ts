import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { JOB_STATUSES } from "@/lib/vocabulary";
import { Client } from "../helpers/http";
import { makeTeam, type Team } from "../helpers/team";

/**
 * The bench record's routes (tubes, power-ups, faults, checks before ready, fitting parts) against every
 * kind of caller, through the real server. PRODUCT.md: apprentices add and record, never delete; only
 * technicians and owners change a job's status; another workshop sees nothing (404).
 */

const CALLERS = ["signedOut", "apprentice", "technician", "owner", "outsider"] as const;
type Caller = (typeof CALLERS)[number];
/** At the counter: the step before the set goes home. */
const READY = JOB_STATUSES[JOB_STATUSES.indexOf("returned") - 1];

let team: Team;
let job: number, tube: number, session: number, fault: number, candidate: number, part: number;
const client = (c: Caller): Client => (c === "signedOut" ? new Client() : team[c]);
const tech = () => team.technician;

async function created(res: Response, key: string): Promise<number> {
  if (res.status !== 201) throw new Error(`fixture failed: ${res.status} ${await res.text()}`);
  return (await res.json())[key].id;
}
const freshTube = async () => created(await tech().post(`/api/jobs/${job}/tubes`, { position: "V9", type: "6AU6" }), "tube");
const freshSession = async () => created(await tech().post(`/api/jobs/${job}/power-ups`, { limiter: "variac", stopCurrent: "1 A" }), "session");
const freshJob = async () => created(await tech().post("/api/jobs", { title: "Throwaway television", equipmentKind: "television" }), "job");
const freshPart = async () => created(await tech().post(`/api/jobs/${job}/parts`, { designator: "C77", kind: "paper", state: "ordered" }), "part");

interface Case {
  route: string;
  call: (c: Client, target: number) => Promise<Response>;
  fresh?: () => Promise<number>;
  expect: [number, number, number, number, number];
}

const CASES: Case[] = [
  { route: "GET tubes", call: (c) => c.get(`/api/jobs/${job}/tubes`), expect: [401, 200, 200, 200, 404] },
  { route: "POST tubes", call: (c) => c.post(`/api/jobs/${job}/tubes`, { position: "V2", type: "6J6", verdict: "strong" }), expect: [401, 201, 201, 201, 404] },
  { route: "POST tubes/lineup", call: (c) => c.post(`/api/jobs/${job}/tubes/lineup`, { types: "6CB6 6AL5" }), expect: [401, 201, 201, 201, 404] },
  {
    route: "PATCH tubes/[tubeId]",
    call: (c) => c.patch(`/api/jobs/${job}/tubes/${tube}`, { test: { reading: 70, minimum: 60 }, verdict: "serviceable" }),
    expect: [401, 200, 200, 200, 404],
  },
  { route: "DELETE tubes/[tubeId]", call: (c, id) => c.delete(`/api/jobs/${job}/tubes/${id}`), fresh: freshTube, expect: [401, 403, 200, 200, 404] },
  { route: "GET power-ups", call: (c) => c.get(`/api/jobs/${job}/power-ups`), expect: [401, 200, 200, 200, 404] },
  {
    route: "POST power-ups",
    call: (c) => c.post(`/api/jobs/${job}/power-ups`, { limiter: "series-lamp", lampPower: "100 W", stopCurrent: "0.8 A" }),
    expect: [401, 201, 201, 201, 404],
  },
  {
    route: "POST power-ups/[pid]/steps",
    call: (c) => c.post(`/api/jobs/${job}/power-ups/${session}/steps`, { supplyVoltage: 60, currentDrawn: "0.3 A", minutes: 5 }),
    expect: [401, 201, 201, 201, 404],
  },
  {
    route: "PATCH power-ups/[pid]",
    call: (c, id) => c.patch(`/api/jobs/${job}/power-ups/${id}`, { outcome: "stopped", reason: "Hum too loud" }),
    fresh: freshSession,
    expect: [401, 200, 200, 200, 404],
  },
  { route: "GET faults", call: (c) => c.get(`/api/jobs/${job}/faults`), expect: [401, 200, 200, 200, 404] },
  {
    route: "POST faults",
    call: (c) => c.post(`/api/jobs/${job}/faults`, { symptom: "Picture rolls", section: "vertical sync" }),
    expect: [401, 201, 201, 201, 404],
  },
  {
    route: "PATCH faults/[fid]",
    call: (c) => c.patch(`/api/jobs/${job}/faults/${fault}`, { section: "vertical deflection" }),
    expect: [401, 200, 200, 200, 404],
  },
  {
    route: "POST faults/[fid]/candidates",
    call: (c) => c.post(`/api/jobs/${job}/faults/${fault}/candidates`, { description: "Yoke" }),
    expect: [401, 201, 201, 201, 404],
  },
  {
    route: "PATCH faults/[fid]/candidates/[cid]",
    call: (c) => c.patch(`/api/jobs/${job}/faults/${fault}/candidates/${candidate}`, { status: "ruled-out", evidence: "Windings measure alike." }),
    expect: [401, 200, 200, 200, 404],
  },
  { route: "GET ready-checks", call: (c) => c.get(`/api/jobs/${job}/ready-checks`), expect: [401, 200, 200, 200, 404] },
  {
    route: "PATCH parts/[partId] fitted",
    call: (c, id) => c.patch(`/api/jobs/${job}/parts/${id}`, { state: "fitted" }),
    fresh: freshPart,
    expect: [401, 200, 200, 200, 404],
  },
  { route: "PATCH parts/[partId] checked", call: (c) => c.patch(`/api/jobs/${job}/parts/${part}`, { checked: true }), expect: [401, 403, 200, 200, 404] },
  {
    route: "POST status ready, with a reason",
    call: (c, id) => c.post(`/api/jobs/${id}/status`, { status: READY, override: true, reason: "Customer collects today" }),
    fresh: freshJob,
    expect: [401, 403, 200, 200, 404],
  },
];

beforeAll(async () => {
  team = await makeTeam("bench-record-roles");
  job = await freshJob();
  tube = await freshTube();
  session = await freshSession();
  fault = await created(await tech().post(`/api/jobs/${job}/faults`, { symptom: "No vertical deflection" }), "fault");
  candidate = await created(await tech().post(`/api/jobs/${job}/faults/${fault}/candidates`, { description: "Vertical output tube" }), "candidate");
  part = await created(await tech().post(`/api/jobs/${job}/parts`, { designator: "C12", kind: "paper", state: "fitted" }), "part");
});

afterAll(async () => {
  const list = await (await team.owner.get("/api/jobs?pageSize=100")).json();
  for (const j of list.jobs ?? []) await team.owner.delete(`/api/jobs/${j.id}`);
});

describe("bench record role matrix", () => {
  test.each(CASES.map((c) => [c.route, c] as const))("%s", async (_route, c) => {
    const got: Record<string, number> = {};
    const want: Record<string, number> = {};
    for (const [i, caller] of CALLERS.entries()) {
      const target = c.fresh ? await c.fresh() : 0;
      const res = await c.call(client(caller), target);
      got[caller] = res.status;
      want[caller] = c.expect[i];
      if (res.status >= 400) {
        expect(res.headers.get("content-type")).toMatch(/application\/json/);
        expect((await res.json()).error.message).toBeTruthy();
      }
    }
    expect(got).toEqual(want);
  });

  test("a tube an apprentice could not remove is still there", async () => {
    const id = await freshTube();
    expect((await team.apprentice.delete(`/api/jobs/${job}/tubes/${id}`)).status).toBe(403);
    const { tubes } = await (await tech().get(`/api/jobs/${job}/tubes`)).json();
    expect(tubes.some((t: { id: number }) => t.id === id)).toBe(true);
  });

  test("ids that are not numbers, or not this job's, are a JSON 404", async () => {
    for (const path of [
      `/api/jobs/${job}/tubes/abc`,
      `/api/jobs/${job}/power-ups/0/steps`,
      `/api/jobs/${job}/faults/1e3/candidates`,
      `/api/jobs/${job}/faults/${fault}/candidates/999999999`,
    ]) {
      const res =
        path.endsWith("steps") || path.endsWith("candidates")
          ? await tech().post(path, { description: "x", supplyVoltage: 1, currentDrawn: 0, minutes: 0 })
          : await tech().patch(path, { status: "open", verdict: "weak" });
      expect(res.status, path).toBe(404);
      expect((await res.json()).error.message).toBeTruthy();
    }
  });
});
