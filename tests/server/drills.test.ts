import type Database from "better-sqlite3";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { formatAnswer, generateDrill, getDrillKind, type DrillSolution } from "@/lib/drills";
import { WRONG_UNIT } from "../helpers/drills";
import { Client } from "../helpers/http";
import { makeTeam, type Team } from "../helpers/team";
import { testDb } from "../helpers/workshops";

/**
 * The Drills API through the real server (PRODUCT.md "Drills (API)"): the role matrix of every route,
 * answers judged right and wrong, the expected answer kept off the problem, and bad input answered with a
 * clear 4xx. Every kind is answered 100 times through the query layer in tests/unit/drills-queries.test.ts;
 * here 100 per kind for a handful of kinds, one of each answer unit, over HTTP (all 61 kinds over HTTP would
 * be over 12,000 requests).
 */

const CALLERS = ["signedOut", "apprentice", "technician", "owner", "outsider"] as const;
type Caller = (typeof CALLERS)[number];

let team: Team;
let db: Database.Database;
const uid = {} as Record<Exclude<Caller, "signedOut">, number>;
let calculationId: number;
let drillId: number;
const client = (c: Caller): Client => (c === "signedOut" ? new Client() : team[c]);
const due = () => new Date(Date.now() + 5 * 86_400_000).toISOString().slice(0, 10);

async function json<T = Record<string, unknown>>(res: Response, status: number): Promise<T> {
  const text = await res.text();
  if (res.status !== status) throw new Error(`expected ${status}, got ${res.status}: ${text}`);
  return JSON.parse(text) as T;
}

/** A fresh drill of the apprentice's own, made through the API. */
async function apprenticeDrill(kind = "ohms-law/current"): Promise<number> {
  return (await json<{ id: number }>(await team.apprentice.post("/api/drills", { kind }), 201)).id;
}

/** The stored row: the test's way to the seed and the solution the server kept. */
const stored = (id: number) => {
  const row = db.prepare("select kind, seed, solution, answered_at from drills where id = ?").get(id) as {
    kind: string;
    seed: number;
    solution: string;
    answered_at: number | null;
  };
  return { ...row, solution: JSON.parse(row.solution) as DrillSolution };
};

interface Case {
  route: string;
  call: (c: Client, fresh: number) => Promise<Response>;
  fresh?: () => Promise<number>;
  expect: [number, number, number, number, number];
}

const CASES: Case[] = [
  { route: "GET /api/drills", call: (c) => c.get("/api/drills"), expect: [401, 200, 200, 200, 200] },
  { route: "POST /api/drills { slug }", call: (c) => c.post("/api/drills", { slug: "cathode-bias" }), expect: [401, 201, 201, 201, 201] },
  { route: "POST /api/drills { calculationId }", call: (c) => c.post("/api/drills", { calculationId }), expect: [401, 201, 201, 201, 404] },
  { route: "GET /api/drills/[id]", call: (c) => c.get(`/api/drills/${drillId}`), expect: [401, 200, 200, 200, 404] },
  {
    route: "POST /api/drills/[id]/answer",
    call: (c, id) => c.post(`/api/drills/${id}/answer`, { answer: "1 mA" }),
    fresh: () => apprenticeDrill(),
    expect: [401, 200, 403, 403, 404],
  },
  { route: "GET /api/drills/progress", call: (c) => c.get("/api/drills/progress"), expect: [401, 200, 200, 200, 200] },
  {
    route: "GET /api/drills/progress?member=apprentice",
    call: (c) => c.get(`/api/drills/progress?member=${uid.apprentice}`),
    expect: [401, 200, 200, 200, 404],
  },
  {
    route: "GET /api/drills/progress?member=technician",
    call: (c) => c.get(`/api/drills/progress?member=${uid.technician}`),
    expect: [401, 403, 200, 404, 404],
  },
  { route: "GET /api/drills/assignments", call: (c) => c.get("/api/drills/assignments"), expect: [401, 200, 200, 200, 200] },
  {
    route: "POST /api/drills/assignments { kinds }",
    call: (c) => c.post("/api/drills/assignments", { apprentice: uid.apprentice, kinds: ["ohms-law", "cathode-bias/resistor"], count: 3, due: due() }),
    expect: [401, 403, 201, 201, 404],
  },
  {
    route: "POST /api/drills/assignments { calculationId }",
    call: (c) => c.post("/api/drills/assignments", { apprentice: uid.apprentice, calculationId, due: due() }),
    expect: [401, 403, 201, 201, 404],
  },
];

beforeAll(async () => {
  team = await makeTeam("drills");
  db = testDb();
  for (const c of ["apprentice", "technician", "owner", "outsider"] as const)
    uid[c] = (await json<{ user: { id: number } }>(await team[c].get("/api/me"), 200)).user.id;
  const job = await json<{ job: { id: number } }>(await team.technician.post("/api/jobs", { title: "Drill source radio", equipmentKind: "table-radio" }), 201);
  const calc = await team.technician.post(`/api/jobs/${job.job.id}/calculations`, {
    slug: "dropping-resistor",
    inputs: { supplyVoltage: 250, loadVoltage: 150, loadCurrent: 0.002 },
  });
  calculationId = (await json<{ calculation: { id: number } }>(calc, 201)).calculation.id;
  drillId = await apprenticeDrill();
});
afterAll(() => db?.close());

describe("drills role matrix", () => {
  test.each(CASES.map((c) => [c.route, c] as const))("%s", async (_route, c) => {
    const got: Record<string, number> = {};
    const want: Record<string, number> = {};
    for (const [i, caller] of CALLERS.entries()) {
      const res = await c.call(client(caller), c.fresh ? await c.fresh() : 0);
      got[caller] = res.status;
      want[caller] = c.expect[i];
      if (res.status >= 400) {
        expect(res.headers.get("content-type")).toMatch(/application\/json/);
        expect((await res.json()).error.message).toBeTruthy();
      }
      expect(res.headers.get("cache-control")).toBe("no-store");
    }
    expect(got).toEqual(want);
  });
});

/** One of each answer unit: Ω, W, words, per cent, farads (a backward kind) and a plain number. */
const HTTP_KINDS = [
  "cathode-bias/resistor",
  "dropping-resistor/dissipation",
  "resistor-drift/verdict",
  "plate-dissipation/fraction",
  "reactance/capacitor-for-reactance",
  "triode-stage/gain",
];

/** Every key anywhere in a JSON value. */
function keysOf(v: unknown): string[] {
  if (Array.isArray(v)) return v.flatMap(keysOf);
  if (v && typeof v === "object") return Object.entries(v).flatMap(([k, x]) => [k, ...keysOf(x)]);
  return [];
}

describe("answering through the API", () => {
  test.each(HTTP_KINDS)(
    "%s: 100 drills, each answered as written and judged right; the problem is the core's for the stored seed",
    async (kindId) => {
      const kind = getDrillKind(kindId)!;
      for (let i = 0; i < 100; i++) {
        const problem = await json<Record<string, unknown>>(await team.apprentice.post("/api/drills", { kind: kindId }), 201);
        const row = stored(problem.id as number);
        const drill = generateDrill(kindId, row.seed);
        expect(problem.prompt).toBe(drill.problem.prompt);
        expect(problem.given).toEqual(drill.problem.given);
        expect(problem.asked).toMatchObject({ name: kind.asked.name, unit: kind.asked.unit });
        const { expected } = drill.solution;
        // Half as text the way the working writes it ("1.5 kΩ", "25 %"), half as the bare SI number.
        const answer =
          i % 2 === 0 || typeof expected === "string" ? formatAnswer(expected, kind.asked.unit, 6) : kind.asked.unit === "%" ? expected * 100 : expected;
        const result = await json<{ correct: boolean; verdict: string; expected: unknown }>(
          await team.apprentice.post(`/api/drills/${problem.id}/answer`, { answer }),
          200,
        );
        expect([result.correct, result.verdict], `${kindId} seed ${row.seed}: ${String(answer)}`).toEqual([true, "correct"]);
        expect(result.expected).toEqual(expected);
      }
    },
    120_000,
  );

  test.each(HTTP_KINDS)("%s: the problem's answer carries no expected value, solution, seed or working", async (kindId) => {
    for (let i = 0; i < 5; i++) {
      const res = await team.apprentice.post("/api/drills", { kind: kindId });
      const text = await res.text();
      const problem = JSON.parse(text);
      expect(Object.keys(problem)).toEqual(expect.arrayContaining(["id", "slug", "prompt", "given", "asked"]));
      const keys = keysOf(problem);
      for (const secret of ["expected", "expectedText", "solution", "seed", "steps", "tolerance", "mistakes", "inputs"]) expect(keys).not.toContain(secret);
      const { solution } = stored(problem.id);
      // A words answer is one of the choices the question offers; a figure appears nowhere in the problem's own
      // words and givens, written either way (not as part of a longer number). The "answer in …" line is the same
      // for every problem of a kind and its examples are not this answer, though one may read alike: "2 kΩ" sits
      // inside the example "2,2 kΩ", and a 0.25 W answer matches the example "0.25 W". A bare figure of one or two
      // digits (1, 12) turns up among any problem's givens and gives nothing away; and where the answer has no unit,
      // the same figure followed by one is another quantity (a gain of 11.8 is not given away by 11.8 kΩ of plate resistance).
      if (typeof solution.expected === "number") {
        const own = text.replaceAll(problem.asked.help, "");
        const bare = (f: string) => /^-?[\d.]+$/.test(f);
        const figures = [solution.expectedText, JSON.stringify(solution.expected)].filter((f) => !bare(f) || f.replace(/\D/g, "").length > 2);
        for (const figure of figures) {
          const after = problem.asked.unit === "" ? "(?![\\d]|\\s?[A-Za-zµΩ%])" : "(?![\\d])";
          expect(own).not.toMatch(new RegExp(`(?<![\\d.,])${figure.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}${after}`));
        }
      }
      // Nor does a second look before answering give it away.
      expect(keysOf(await json(await team.apprentice.get(`/api/drills/${problem.id}`), 200))).not.toContain("expected");
    }
  });

  test.each(HTTP_KINDS.filter((k) => getDrillKind(k)!.asked.unit !== "text"))(
    "%s: a wrong number and a wrong unit are judged wrong, and told apart",
    async (kindId) => {
      const kind = getDrillKind(kindId)!;
      const unit = kind.asked.unit as keyof typeof WRONG_UNIT;
      const a = await json<{ id: number }>(await team.apprentice.post("/api/drills", { kind: kindId }), 201);
      const expected = stored(a.id).solution.expected as number;
      const wrong = await json<Record<string, unknown>>(
        await team.apprentice.post(`/api/drills/${a.id}/answer`, { answer: formatAnswer(expected * 3, kind.asked.unit, 4) }),
        200,
      );
      expect([wrong.correct, wrong.verdict]).toEqual([false, "wrong-number"]);
      // Feedback that teaches: the working, the step to watch, and a similar one to try.
      expect((wrong.steps as unknown[]).length).toBeGreaterThan(0);
      expect(wrong.similar).toMatchObject({ kind: kindId });
      expect(wrong.expected).toBe(expected);

      const b = await json<{ id: number }>(await team.apprentice.post("/api/drills", { kind: kindId }), 201);
      const right = stored(b.id).solution.expected as number;
      const number = kind.asked.unit === "%" ? right * 100 : right;
      const wrongUnit = await json<Record<string, unknown>>(
        await team.apprentice.post(`/api/drills/${b.id}/answer`, { answer: `${number} ${WRONG_UNIT[unit]}` }),
        200,
      );
      expect([wrongUnit.correct, wrongUnit.verdict]).toEqual([false, "wrong-unit"]);
      expect(wrongUnit.message).toMatch(/asks for/);
    },
  );

  test("progress counts the answers per kind with a mastery level that misses pull down, and a point for today", async () => {
    const p = await json<{
      kinds: { kind: string; attempts: number; correct: number; misses: number; mastery: number; level: string }[];
      timeline: { date: string }[];
    }>(await team.technician.get(`/api/drills/progress?member=${uid.apprentice}`), 200);
    const byKind = (id: string) => p.kinds.find((k) => k.kind === id)!;
    // 100 right in one day and no miss: a day's full credit (lib/drills/mastery.ts), so above zero and "starting".
    const verdicts = byKind("resistor-drift/verdict");
    expect([verdicts.attempts, verdicts.correct, verdicts.misses]).toEqual([100, 100, 0]);
    expect(verdicts.mastery).toBeGreaterThan(0.2);
    expect(verdicts.level).toBeTruthy();
    // The same day's credit less two misses (the wrong number and the wrong unit above).
    const cathode = byKind("cathode-bias/resistor");
    expect([cathode.correct, cathode.misses]).toEqual([100, 2]);
    expect(cathode.mastery).toBeLessThan(verdicts.mastery);
    expect(p.timeline.at(-1)!.date).toBe(new Date().toISOString().slice(0, 10));
  });
});

describe("bad input gets a clear message, never a 500", () => {
  async function refused(res: Response, status: number, field?: string) {
    const body = await json<{ error: { message: string; fields: Record<string, string> } }>(res, status);
    expect(body.error.message.length).toBeGreaterThan(5);
    if (field) expect(body.error.fields[field]).toMatch(/\w{3,}/);
  }

  test("answers: empty, missing, words for a number, not JSON, too long; none uses the drill up", async () => {
    const id = await apprenticeDrill("cathode-bias/resistor");
    await refused(await team.apprentice.post(`/api/drills/${id}/answer`, { answer: "" }), 400, "answer");
    await refused(await team.apprentice.post(`/api/drills/${id}/answer`, {}), 400, "answer");
    await refused(await team.apprentice.post(`/api/drills/${id}/answer`, { answer: "about right" }), 400, "answer");
    await refused(await team.apprentice.post(`/api/drills/${id}/answer`, { answer: null }), 400, "answer");
    await refused(await team.apprentice.post(`/api/drills/${id}/answer`, { answer: "9".repeat(500) }), 400, "answer");
    await refused(await team.apprentice.post(`/api/drills/${id}/answer`, "answer=1k", { "content-type": "application/json" }), 400);
    await refused(await team.apprentice.post(`/api/drills/${id}/answer`, "answer=1k", { "content-type": "text/plain" }), 415);
    expect(stored(id).answered_at).toBeNull();
  });

  test("a drill already answered is a 409 that says so", async () => {
    const id = await apprenticeDrill();
    await json(await team.apprentice.post(`/api/drills/${id}/answer`, { answer: "1 A" }), 200);
    const res = await team.apprentice.post(`/api/drills/${id}/answer`, { answer: "2 A" });
    const body = await json<{ error: { message: string } }>(res, 409);
    expect(body.error.message).toMatch(/already been answered/);
  });

  test("another workshop's drill, and ids that are not ids, are 404", async () => {
    const theirs = (await json<{ id: number }>(await team.outsider.post("/api/drills", { slug: "ohms-law" }), 201)).id;
    await refused(await team.apprentice.get(`/api/drills/${theirs}`), 404);
    await refused(await team.apprentice.post(`/api/drills/${theirs}/answer`, { answer: "1 A" }), 404);
    for (const path of ["/api/drills/abc", "/api/drills/0", "/api/drills/1e3/answer", "/api/drills/99999999"]) {
      await refused(path.endsWith("answer") ? await team.apprentice.post(path, { answer: "1" }) : await team.apprentice.get(path), 404);
    }
  });

  test("making drills and sets: unknown calculators and kinds, two choices at once, bad ids and dates", async () => {
    await refused(await team.apprentice.post("/api/drills", {}), 400, "slug");
    await refused(await team.apprentice.post("/api/drills", { slug: "flux-capacitor" }), 400, "slug");
    await refused(await team.apprentice.post("/api/drills", { kind: "ohms-law/nothing" }), 400, "kind");
    await refused(await team.apprentice.post("/api/drills", { kind: 12 }), 400, "kind");
    await refused(await team.apprentice.post("/api/drills", { slug: "ohms-law", kind: "ohms-law/current" }), 400, "slug");
    await refused(await team.apprentice.post("/api/drills", { calculationId: "twelve" }), 400, "calculationId");
    await refused(await team.apprentice.post("/api/drills", { calculationId: 99999999 }), 404);
    await refused(await team.apprentice.post("/api/drills", ["ohms-law"]), 400);
    await refused(await team.apprentice.get("/api/drills/progress?member=abc"), 400, "member");
    await refused(await team.owner.post("/api/drills/assignments", { apprentice: uid.apprentice, kinds: ["ohms-law"], due: "2001-01-01" }), 400, "due");
    await refused(await team.owner.post("/api/drills/assignments", { apprentice: uid.apprentice, kinds: ["ohms-law"], due: "2031-02-30" }), 400, "due");
    await refused(await team.owner.post("/api/drills/assignments", { apprentice: uid.apprentice, kinds: [], due: due() }), 400, "kinds");
    await refused(await team.owner.post("/api/drills/assignments", { apprentice: uid.apprentice, kinds: ["no-such"], due: due() }), 400, "kinds");
    await refused(await team.owner.post("/api/drills/assignments", { apprentice: uid.apprentice, kinds: ["ohms-law"], count: 500, due: due() }), 400, "count");
    await refused(await team.owner.post("/api/drills/assignments", { apprentice: uid.technician, kinds: ["ohms-law"], due: due() }), 404);
  });

  test("a set of drills shows up for the apprentice with its due date, made from the kinds chosen in turn", async () => {
    const when = due();
    const { assignment } = await json<{ assignment: { id: number; dueDate: string; drills: { id: number; kind: string }[] } }>(
      await team.owner.post("/api/drills/assignments", {
        apprentice: uid.apprentice,
        kinds: ["ohms-law/power", "cathode-bias/dissipation"],
        count: 4,
        due: when,
        note: "Before Friday",
      }),
      201,
    );
    expect(assignment.drills.map((d) => d.kind)).toEqual(["ohms-law/power", "cathode-bias/dissipation", "ohms-law/power", "cathode-bias/dissipation"]);
    const mine = await json<{ assignments: { id: number; dueDate: string; note: string }[] }>(await team.apprentice.get("/api/drills/assignments"), 200);
    expect(mine.assignments.find((a) => a.id === assignment.id)).toMatchObject({ dueDate: when, note: "Before Friday" });
    expect((await json<{ assignments: unknown[] }>(await team.outsider.get("/api/drills/assignments"), 200)).assignments).toEqual([]);
    // The drill is the apprentice's to answer; the owner who set it reads it but cannot answer it.
    await json(await team.owner.get(`/api/drills/${assignment.drills[0].id}`), 200);
    await refused(await team.owner.post(`/api/drills/${assignment.drills[0].id}/answer`, { answer: "1 W" }), 403);
  });
});
