import { beforeAll, describe, expect, test } from "vitest";
import { makeTeam, type Team } from "../helpers/team";

/** What the jobs API answers, beyond who may call it (see jobs-roles.test.ts). */

let team: Team;
let job: number;
const t = () => team.technician;

beforeAll(async () => {
  team = await makeTeam("api");
  const res = await t().post("/api/jobs", {
    title: "Eight-tube console, 1949",
    equipmentKind: "console-radio",
    maker: "Fernhill Radio Co.",
    year: "1949",
    customerName: "Ivo Trask",
    customerEmail: "ivo@example.com",
  });
  expect(res.status).toBe(201);
  job = (await res.json()).job.id;
});

describe("GET /api/jobs", () => {
  test("keeps the old shape and pages, sorts, filters and searches on the server", async () => {
    for (const [i, kind] of ["amplifier", "tuner", "amplifier", "television", "amplifier"].entries()) {
      await t().post("/api/jobs", { title: `Paging set ${String.fromCharCode(69 - i)}`, equipmentKind: kind, customerName: i === 3 ? "Wren O'Dare" : null });
    }
    const all = await (await t().get("/api/jobs")).json();
    expect(Object.keys(all).sort()).toEqual(["jobs", "page", "pageSize", "total"]);
    expect(all.total).toBe(6);
    expect(all.jobs[0].title).toBe("Paging set A"); // most recently worked on first
    expect(all.jobs[0]).not.toHaveProperty("workshopId");

    const page2 = await (await t().get("/api/jobs?q=paging&sort=title&dir=asc&pageSize=2&page=2")).json();
    expect(page2).toMatchObject({ total: 5, page: 2, pageSize: 2 });
    expect(page2.jobs.map((j: { title: string }) => j.title)).toEqual(["Paging set C", "Paging set D"]);

    const amps = await (await t().get("/api/jobs?kind=amplifier&sort=title&dir=desc")).json();
    expect(amps.jobs.map((j: { title: string }) => j.title)).toEqual(["Paging set E", "Paging set C", "Paging set A"]);
    expect((await (await t().get("/api/jobs?q=o'dare")).json()).jobs[0].customerName).toBe("Wren O'Dare");
    expect((await (await t().get("/api/jobs?status=at-the-counter")).json()).total).toBe(0);
    expect((await (await t().get("/api/jobs?status=on-the-rack,at-the-counter")).json()).total).toBe(6);
  });

  test("bad query parameters are a 400 naming each one", async () => {
    const res = await t().get("/api/jobs?page=-1&pageSize=1000&sort=secret&dir=up&status=lost&kind=spaceship");
    expect(res.status).toBe(400);
    const { error } = await res.json();
    expect(Object.keys(error.fields).sort()).toEqual(["dir", "kind", "page", "pageSize", "sort", "status"]);
  });
});

describe("jobs", () => {
  test("a bad job is a 400 with a message under each field", async () => {
    const res = await t().post("/api/jobs", { title: " ", equipmentKind: "toaster", year: "1700", customerEmail: "not-mail" });
    expect(res.status).toBe(400);
    expect(Object.keys((await res.json()).error.fields).sort()).toEqual(["customerEmail", "equipmentKind", "title", "year"]);
  });

  test("a status change is logged in plain words; the record comes back whole", async () => {
    expect((await t().post(`/api/jobs/${job}/status`, { status: "inspecting" })).status).toBe(200);
    expect((await t().post(`/api/jobs/${job}/status`, { status: "lost" })).status).toBe(400);
    const record = await (await team.apprentice.get(`/api/jobs/${job}`)).json();
    expect(Object.keys(record).sort()).toEqual(["calculations", "files", "job", "log", "parts", "readings"]);
    expect(record.job).toMatchObject({ status: "inspecting", year: 1949, maker: "Fernhill Radio Co." });
    expect(record.log.map((e: { text: string }) => e.text)).toContain("Status: On the rack → Inspecting.");
  });
});

describe("saved calculations (the Bench's contract)", () => {
  test("POST recomputes on the server and answers 201 with the stored calculation", async () => {
    const res = await team.apprentice.post(`/api/jobs/${job}/calculations`, {
      slug: "cathode-bias",
      inputs: { biasVoltage: "1.5 V", plateCurrent: "1.2 mA" },
      outputs: { cathodeResistance: 1 }, // a client's outputs are ignored
      note: "V1 first stage",
    });
    expect(res.status).toBe(201);
    const { calculation } = await res.json();
    expect(Object.keys(calculation).sort()).toEqual(["author", "createdAt", "id", "inputs", "jobId", "note", "outputs", "slug"]);
    expect(calculation).toMatchObject({ jobId: job, slug: "cathode-bias", note: "V1 first stage" });
    expect(calculation.inputs.biasVoltage).toBe(1.5);
    expect(calculation.inputs.plateCurrent).toBeCloseTo(0.0012, 12);
    expect(calculation.outputs.cathodeResistance).toBeCloseTo(1250, 6);
    expect(calculation.author.name).toBe((await (await team.apprentice.get("/api/me")).json()).user.name);
    expect(Number.isNaN(Date.parse(calculation.createdAt))).toBe(false);

    const list = await (await t().get(`/api/jobs/${job}/calculations`)).json();
    expect(list.calculations.find((c: { id: number }) => c.id === calculation.id)).toEqual(calculation);
  });

  test("invalid inputs are a 400 with field messages; an unknown slug or foreign job a 404", async () => {
    const bad = await t().post(`/api/jobs/${job}/calculations`, { slug: "cathode-bias", inputs: { biasVoltage: "1.5 A" } });
    expect(bad.status).toBe(400);
    const { error } = await bad.json();
    expect(error.fields.biasVoltage).toMatch(/voltage/);
    expect(error.fields.plateCurrent).toBeTruthy();
    expect((await t().post(`/api/jobs/${job}/calculations`, { slug: "flux-capacitor", inputs: {} })).status).toBe(404);
    expect((await team.outsider.post(`/api/jobs/${job}/calculations`, { slug: "ohms-law", inputs: { voltage: 1, current: 1 } })).status).toBe(404);
    expect((await t().post(`/api/jobs/${job}/calculations`, { inputs: {} })).status).toBe(400);
  });
});

describe("parts CSV", () => {
  const header = "designator,kind,original_value,original_rating,replacement_value,replacement_rating,state";
  test("an import with bad rows imports nothing and names each bad row", async () => {
    const before = (await (await t().get(`/api/jobs/${job}/parts`)).json()).parts.length;
    const csv = [
      header,
      "C1,paper,0.05 µF,400 V,0.047 µF,630 V,fitted",
      "C2,plastic,0.02 µF,400 V,,,",
      ",resistor,1k,0.5 W,,,",
      "C4,mica,100 pF,500 V,,,lost",
    ].join("\n");
    const res = await t().post(`/api/jobs/${job}/parts/import`, { csv });
    expect(res.status).toBe(400);
    const { error } = await res.json();
    expect(Object.keys(error.fields).sort()).toEqual(["row.3.kind", "row.4.designator", "row.5.state"]);
    expect(error.fields["row.3.kind"]).toMatch(/^Row 3: /);
    expect((await (await t().get(`/api/jobs/${job}/parts`)).json()).parts.length).toBe(before);
  });

  test("a good import adds every row, and the export gives them back", async () => {
    const csv = [header, "C10,electrolytic,20 µF,150 V,22 µF,100 V,to-order", '"R5",resistor,"2,2 MΩ",0.5 W,2.2 MΩ,0.5 W,fitted', ""].join("\r\n");
    const res = await t().post(`/api/jobs/${job}/parts/import`, { csv });
    expect(res.status).toBe(201);
    expect((await res.json()).imported).toBe(2);
    const out = await t().get(`/api/jobs/${job}/parts/csv`);
    expect(out.headers.get("content-type")).toMatch(/^text\/csv/);
    expect(out.headers.get("content-disposition")).toMatch(/^attachment/);
    const text = await out.text();
    // The ordering columns follow the original seven; unit_cost only for those who see prices.
    expect(text.split(/\r\n/)[0].replace(/^\uFEFF/, "")).toBe(`${header},quantity,supplier,supplier_part_number,unit_cost`);
    expect(text).toContain('R5,resistor,"2,2 MΩ",0.5 W,2.2 MΩ,0.5 W,fitted');
  });

  test("inline edits change only what is sent", async () => {
    const { part } = await (await t().post(`/api/jobs/${job}/parts`, { designator: "C20", kind: "paper", originalValue: "0.1 µF" })).json();
    const res = await t().patch(`/api/jobs/${job}/parts/${part.id}`, { state: "fitted", replacementRating: "630 V" });
    expect((await res.json()).part).toMatchObject({ designator: "C20", originalValue: "0.1 µF", state: "fitted", replacementRating: "630 V" });
    expect((await t().patch(`/api/jobs/${job}/parts/${part.id}`, { kind: "valve" })).status).toBe(400);
    expect((await t().patch(`/api/jobs/${job}/parts/${part.id}`, {})).status).toBe(400);
  });
});

describe("readings and log", () => {
  test("readings take engineering notation and carry the resistor-drift verdict", async () => {
    const res = await team.apprentice.post(`/api/jobs/${job}/readings`, { kind: "resistor", designator: "R7", nominal: "2.2M", measured: "3M15" });
    expect(res.status).toBe(201);
    expect((await res.json()).reading).toMatchObject({ nominal: 2_200_000, measured: 3_150_000, verdict: "high" });
    const bad = await team.apprentice.post(`/api/jobs/${job}/readings`, { kind: "resistor", designator: "", nominal: "47 uF", measured: "-5" });
    expect(bad.status).toBe(400);
    expect(Object.keys((await bad.json()).error.fields).sort()).toEqual(["designator", "measured", "nominal"]);
    const volts = await team.apprentice.post(`/api/jobs/${job}/readings`, {
      kind: "voltage",
      designator: "B+",
      nominal: "250 V",
      measured: "320 V",
      tolerance: 0.1,
    });
    expect((await volts.json()).reading).toMatchObject({ verdict: "high" });
  });

  test("a voltage reading names the capacitors it was taken across; a bad list is refused by field", async () => {
    const res = await team.apprentice.post(`/api/jobs/${job}/readings`, {
      kind: "voltage",
      designator: "TP3",
      partDesignators: "C12;c13 ",
      nominal: "350 V",
      measured: "380 V",
    });
    expect(res.status).toBe(201);
    expect((await res.json()).reading).toMatchObject({ designator: "TP3", partDesignators: "C12, c13", measured: 380 });
    const listed = (await (await t().get(`/api/jobs/${job}/readings`)).json()).readings;
    expect(listed.find((r: { designator: string }) => r.designator === "TP3").partDesignators).toBe("C12, c13");
    const bad = await team.apprentice.post(`/api/jobs/${job}/readings`, {
      kind: "voltage",
      designator: "TP4",
      partDesignators: 12,
      nominal: "1 V",
      measured: "1 V",
    });
    expect(bad.status).toBe(400);
    expect(Object.keys((await bad.json()).error.fields)).toEqual(["partDesignators"]);
  });

  test("a power-up entry keeps the supply voltage and current drawn", async () => {
    const res = await team.apprentice.post(`/api/jobs/${job}/log`, {
      kind: "power-up",
      supplyVoltage: "60 V",
      currentDrawn: "180 mA",
      text: "Heaters lit; no smoke.",
    });
    expect(res.status).toBe(201);
    const { entry } = await res.json();
    expect(entry.kind).toBe("power-up");
    expect(entry.data.supplyVoltage).toBe(60);
    expect(entry.data.currentDrawn).toBeCloseTo(0.18, 12);
    const bad = await team.apprentice.post(`/api/jobs/${job}/log`, { kind: "power-up", supplyVoltage: "60 A", text: "" });
    expect(Object.keys((await bad.json()).error.fields).sort()).toEqual(["currentDrawn", "supplyVoltage", "text"]);
  });
});

describe("bench sheet", () => {
  test("is a PDF attachment", async () => {
    const res = await team.apprentice.get(`/api/jobs/${job}/bench-sheet`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="bench-sheet-job-\d+\.pdf"/);
    const bytes = Buffer.from(await res.arrayBuffer());
    expect(bytes.subarray(0, 5).toString()).toBe("%PDF-");
    expect(bytes.length).toBeGreaterThan(2000);
  });
});
