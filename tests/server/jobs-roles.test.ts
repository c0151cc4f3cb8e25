import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { Client } from "../helpers/http";
import { fileForm, makeTeam, samplePng, type Team } from "../helpers/team";

/**
 * Every jobs route against every kind of caller, through the real server, with the exact status
 * each must get. Roles follow docs/PRODUCT.md: apprentices read everything and add readings,
 * calculations and log notes; technicians edit; only owners delete jobs; another workshop's
 * owner sees nothing (404, never a hint that the job exists).
 */

const CALLERS = ["signedOut", "apprentice", "technician", "owner", "outsider"] as const;
type Caller = (typeof CALLERS)[number];

let team: Team;
let png: Buffer;
let job: number, part: number, reading: number, file: number;
const client = (c: Caller): Client => (c === "signedOut" ? new Client() : team[c]);

async function created(res: Response, key: string): Promise<number> {
  if (res.status !== 201) throw new Error(`fixture failed: ${res.status} ${await res.text()}`);
  return (await res.json())[key].id;
}
const tech = () => team.technician;
const freshJob = async () => created(await tech().post("/api/jobs", { title: "Throwaway set", equipmentKind: "other" }), "job");
const freshPart = async () => created(await tech().post(`/api/jobs/${job}/parts`, { designator: "C99", kind: "film" }), "part");
const freshReading = async () =>
  created(await tech().post(`/api/jobs/${job}/readings`, { kind: "resistor", designator: "R99", nominal: "1k", measured: "1.1k" }), "reading");
const freshCalc = async () =>
  created(await tech().post(`/api/jobs/${job}/calculations`, { slug: "ohms-law", inputs: { voltage: 10, current: 0.01 } }), "calculation");
const freshFile = async () => created(await tech().request("POST", `/api/jobs/${job}/files`, fileForm(png, "chassis.png", "image/png")), "file");

interface Case {
  route: string;
  call: (c: Client, target: number) => Promise<Response>;
  /** A fresh record per caller for destructive calls; otherwise the shared fixture. */
  fresh?: () => Promise<number>;
  expect: [number, number, number, number, number];
}

const csv = "designator,kind,original_value,original_rating,replacement_value,replacement_rating,state\r\nC7,paper,0.1 µF,400 V,0.1 µF,630 V,to-order\r\n";

const CASES: Case[] = [
  { route: "GET /api/jobs", call: (c) => c.get("/api/jobs"), expect: [401, 200, 200, 200, 200] },
  { route: "POST /api/jobs", call: (c) => c.post("/api/jobs", { title: "Matrix set", equipmentKind: "tuner" }), expect: [401, 403, 201, 201, 201] },
  { route: "GET /api/jobs/[id]", call: (c) => c.get(`/api/jobs/${job}`), expect: [401, 200, 200, 200, 404] },
  { route: "PATCH /api/jobs/[id]", call: (c) => c.patch(`/api/jobs/${job}`, { notes: "Chassis cleaned." }), expect: [401, 403, 200, 200, 404] },
  { route: "DELETE /api/jobs/[id]", call: (c, id) => c.delete(`/api/jobs/${id}`), fresh: freshJob, expect: [401, 403, 403, 200, 404] },
  { route: "POST /api/jobs/[id]/status", call: (c) => c.post(`/api/jobs/${job}/status`, { status: "inspecting" }), expect: [401, 403, 200, 200, 404] },
  { route: "GET /api/jobs/[id]/parts", call: (c) => c.get(`/api/jobs/${job}/parts`), expect: [401, 200, 200, 200, 404] },
  { route: "POST /api/jobs/[id]/parts", call: (c) => c.post(`/api/jobs/${job}/parts`, { designator: "C3", kind: "paper" }), expect: [401, 403, 201, 201, 404] },
  {
    route: "PATCH /api/jobs/[id]/parts/[partId]",
    call: (c) => c.patch(`/api/jobs/${job}/parts/${part}`, { state: "ordered" }),
    expect: [401, 403, 200, 200, 404],
  },
  {
    route: "DELETE /api/jobs/[id]/parts/[partId]",
    call: (c, id) => c.delete(`/api/jobs/${job}/parts/${id}`),
    fresh: freshPart,
    expect: [401, 403, 200, 200, 404],
  },
  { route: "GET /api/jobs/[id]/parts/csv", call: (c) => c.get(`/api/jobs/${job}/parts/csv`), expect: [401, 200, 200, 200, 404] },
  { route: "POST /api/jobs/[id]/parts/import", call: (c) => c.post(`/api/jobs/${job}/parts/import`, { csv }), expect: [401, 403, 201, 201, 404] },
  { route: "GET /api/jobs/[id]/readings", call: (c) => c.get(`/api/jobs/${job}/readings`), expect: [401, 200, 200, 200, 404] },
  {
    route: "POST /api/jobs/[id]/readings",
    call: (c) => c.post(`/api/jobs/${job}/readings`, { kind: "resistor", designator: "R2", nominal: "100k", measured: "131k" }),
    expect: [401, 201, 201, 201, 404],
  },
  {
    route: "PATCH /api/jobs/[id]/readings/[readingId]",
    call: (c) => c.patch(`/api/jobs/${job}/readings/${reading}`, { kind: "resistor", designator: "R1", nominal: "22k", measured: "23k" }),
    expect: [401, 403, 200, 200, 404],
  },
  {
    route: "DELETE /api/jobs/[id]/readings/[readingId]",
    call: (c, id) => c.delete(`/api/jobs/${job}/readings/${id}`),
    fresh: freshReading,
    expect: [401, 403, 200, 200, 404],
  },
  { route: "GET /api/jobs/[id]/calculations", call: (c) => c.get(`/api/jobs/${job}/calculations`), expect: [401, 200, 200, 200, 404] },
  {
    route: "POST /api/jobs/[id]/calculations",
    call: (c) => c.post(`/api/jobs/${job}/calculations`, { slug: "dropping-resistor", inputs: { supplyVoltage: 250, loadVoltage: 150, loadCurrent: 0.002 } }),
    expect: [401, 201, 201, 201, 404],
  },
  {
    route: "DELETE /api/jobs/[id]/calculations/[calculationId]",
    call: (c, id) => c.delete(`/api/jobs/${job}/calculations/${id}`),
    fresh: freshCalc,
    expect: [401, 403, 200, 200, 404],
  },
  { route: "GET /api/jobs/[id]/files", call: (c) => c.get(`/api/jobs/${job}/files`), expect: [401, 200, 200, 200, 404] },
  {
    route: "POST /api/jobs/[id]/files",
    call: (c) => c.request("POST", `/api/jobs/${job}/files`, fileForm(png, "front.png", "image/png")),
    expect: [401, 403, 201, 201, 404],
  },
  { route: "GET /api/jobs/[id]/files/[fileId]", call: (c) => c.get(`/api/jobs/${job}/files/${file}`), expect: [401, 200, 200, 200, 404] },
  {
    route: "DELETE /api/jobs/[id]/files/[fileId]",
    call: (c, id) => c.delete(`/api/jobs/${job}/files/${id}`),
    fresh: freshFile,
    expect: [401, 403, 200, 200, 404],
  },
  { route: "GET /api/jobs/[id]/log", call: (c) => c.get(`/api/jobs/${job}/log`), expect: [401, 200, 200, 200, 404] },
  {
    route: "POST /api/jobs/[id]/log",
    call: (c) => c.post(`/api/jobs/${job}/log`, { kind: "note", text: "Dial cord restrung." }),
    expect: [401, 201, 201, 201, 404],
  },
  { route: "GET /api/jobs/[id]/bench-sheet", call: (c) => c.get(`/api/jobs/${job}/bench-sheet`), expect: [401, 200, 200, 200, 404] },
];

beforeAll(async () => {
  team = await makeTeam("roles");
  png = await samplePng();
  job = await created(await tech().post("/api/jobs", { title: "Role matrix radio", equipmentKind: "table-radio" }), "job");
  part = await freshPart();
  reading = await freshReading();
  file = await freshFile();
});

afterAll(async () => {
  // Leave the team's workshop tidy: the owner removes every job the matrix made.
  const list = await (await team.owner.get("/api/jobs?pageSize=100")).json();
  for (const j of list.jobs ?? []) await team.owner.delete(`/api/jobs/${j.id}`);
});

describe("jobs role matrix", () => {
  test("the callers are who we think they are", async () => {
    expect((await (await team.apprentice.get("/api/me")).json()).role).toBe("apprentice");
    expect((await (await team.technician.get("/api/me")).json()).role).toBe("technician");
    expect((await (await team.owner.get("/api/me")).json()).role).toBe("owner");
    expect((await (await team.outsider.get("/api/me")).json()).workshop.id).not.toBe(team.workshopId);
  });

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
      // A refused delete leaves the record in place.
      if (c.fresh && res.status >= 400 && c.route.startsWith("DELETE /api/jobs/[id]") && !c.route.includes("/api/jobs/[id]/")) {
        expect((await tech().get(`/api/jobs/${target}`)).status).toBe(200);
      }
    }
    expect(got).toEqual(want);
  });

  test("the outsider's list never shows this workshop's jobs", async () => {
    const body = await (await team.outsider.get("/api/jobs?q=Role%20matrix")).json();
    expect(body.total).toBe(0);
    expect(body.jobs).toEqual([]);
  });

  test("ids that are not numbers are a JSON 404, never a 500", async () => {
    for (const path of ["/api/jobs/abc", "/api/jobs/0/parts", "/api/jobs/1e3/readings", `/api/jobs/${job}/files/..%2F..%2Fetc`]) {
      const res = await team.owner.get(path);
      expect(res.status).toBe(404);
      expect((await res.json()).error.message).toBeTruthy();
    }
  });
});
