import { beforeAll, describe, expect, test } from "vitest";
import { fileForm, makeTeam, samplePng, type Team } from "../helpers/team";

/** What the ordering, customer and intake routes answer, beyond who may call them (see ordering-roles.test.ts). */

let team: Team;
const t = () => team.technician;

async function json(res: Response, status: number) {
  const body = await res.json();
  if (res.status !== status) throw new Error(`expected ${status}, got ${res.status}: ${JSON.stringify(body)}`);
  return body;
}

beforeAll(async () => {
  team = await makeTeam("ordering-api");
});

describe("job numbers", () => {
  test("two workshops both get job 1; each counts its own from there", async () => {
    const ours = await json(await t().post("/api/jobs", { title: "Our first", equipmentKind: "tuner" }), 201);
    const theirs = await json(await team.outsider.post("/api/jobs", { title: "Their first", equipmentKind: "tuner" }), 201);
    expect(ours.job.number).toBe(1);
    expect(theirs.job.number).toBe(1);
    expect((await json(await t().post("/api/jobs", { title: "Our second", equipmentKind: "tuner" }), 201)).job.number).toBe(2);
    const page = await (await t().get(`/jobs/${ours.job.id}`)).text();
    expect(page).toMatch(/>Job (<!-- -->)?1</); // the job's header shows its number, not its id
  });
});

describe("booking in with a customer and intake", () => {
  test("a typed customer becomes a record; the next booking with the same e-mail joins it; intake is kept", async () => {
    const email = `ada-${Date.now()}@example.com`;
    const first = await json(
      await t().post("/api/jobs", {
        title: "Walnut table radio",
        equipmentKind: "table-radio",
        customerName: "Ada Quarrie",
        customerEmail: email,
        customerPhone: "01632 960 123",
        serialNumber: "TR-5521",
        accessories: ["Knobs", "Back cover", "knobs", " Manual "],
      }),
      201,
    );
    expect(first.job).toMatchObject({ serialNumber: "TR-5521", accessories: ["Knobs", "Back cover", "Manual"], customerName: "Ada Quarrie" });
    const second = await json(
      await t().post("/api/jobs", { title: "Her amplifier", equipmentKind: "amplifier", customerName: "Ada Q.", customerEmail: email.toUpperCase() }),
      201,
    );
    expect(second.job.customerId).toBe(first.job.customerId);
    const { customer } = await json(await t().get(`/api/customers/${first.job.customerId}`), 200);
    expect(customer).toMatchObject({ name: "Ada Quarrie", email, phone: "01632 960 123" });
    expect(customer.jobs.map((j: { title: string }) => j.title)).toEqual(["Her amplifier", "Walnut table radio"]);

    const png = await samplePng();
    const photo = await t().request("POST", `/api/jobs/${first.job.id}/files`, fileForm(png, "as-it-came.png", "image/png", "intake"));
    expect((await json(photo, 201)).file.kind).toBe("intake");
  });

  test("renaming a customer renames them on their jobs", async () => {
    const { customer } = await json(await t().post("/api/customers", { name: "Corin Ashby" }), 201);
    const { job } = await json(await t().post("/api/jobs", { title: "Corin's set", equipmentKind: "other", customerId: customer.id }), 201);
    await json(await t().patch(`/api/customers/${customer.id}`, { name: "Corin Ashby-Vale" }), 200);
    expect((await json(await t().get(`/api/jobs/${job.id}`), 200)).job.customerName).toBe("Corin Ashby-Vale");
    expect((await t().delete(`/api/customers/${customer.id}`)).status).toBe(403);
    expect((await team.owner.delete(`/api/customers/${customer.id}`)).status).toBe(409);
  });
});

describe("bad input is a 400 naming each field, never a 500", () => {
  test("customers", async () => {
    const res = await t().post("/api/customers", { name: " ", email: "not-mail", phone: "call me" });
    const { error } = await json(res, 400);
    expect(Object.keys(error.fields).sort()).toEqual(["email", "name", "phone"]);
    expect((await t().patch("/api/customers/1", {})).status).toBe(400);
    expect((await t().get(`/api/customers?q=${"x".repeat(101)}`)).status).toBe(400);
    expect((await t().get("/api/customers/not-a-number")).status).toBe(404);
    const email = `dup-${Date.now()}@example.com`;
    await json(await t().post("/api/customers", { name: "First", email }), 201);
    expect((await json(await t().post("/api/customers", { name: "Second", email }), 409)).error.fields.email).toMatch(/already has this address/);
  });

  test("jobs: a customer not on file, too many accessories", async () => {
    const { error } = await json(
      await t().post("/api/jobs", {
        title: "x",
        equipmentKind: "other",
        customerId: 99_999_999,
        accessories: Array.from({ length: 25 }, (_, i) => `item ${i}`),
      }),
      400,
    );
    expect(Object.keys(error.fields)).toEqual(["accessories"]);
    const missing = await json(await t().post("/api/jobs", { title: "x", equipmentKind: "other", customerId: 99_999_999 }), 400);
    expect(missing.error.fields.customerId).toMatch(/not on your workshop's list/);
  });

  test("parts: quantity, unit cost and its decimals", async () => {
    const { job } = await json(await t().post("/api/jobs", { title: "Bad parts", equipmentKind: "other" }), 201);
    const bad = await json(await t().post(`/api/jobs/${job.id}/parts`, { designator: "C1", kind: "paper", quantity: "0", unitCost: "about a pound" }), 400);
    expect(Object.keys(bad.error.fields).sort()).toEqual(["quantity", "unitCost"]);
    const decimals = await json(await t().post(`/api/jobs/${job.id}/parts`, { designator: "C1", kind: "paper", unitCost: "1.205" }), 400);
    expect(decimals.error.fields.unitCost).toMatch(/at most 2 decimals for GBP/);
  });

  test("marking ordered", async () => {
    const { error } = await json(await t().post("/api/orders/mark-ordered", { supplier: "", partIds: [] }), 400);
    expect(Object.keys(error.fields).sort()).toEqual(["partIds", "supplier"]);
    expect((await t().post("/api/orders/mark-ordered", { supplier: "X", partIds: ["one"] })).status).toBe(400);
    expect((await t().get(`/api/orders/csv?supplier=${"x".repeat(81)}`)).status).toBe(400);
  });
});

describe("ordering", () => {
  test("values are read into SI; a group marked ordered moves every job's parts and writes each Log", async () => {
    const a = await json(await t().post("/api/jobs", { title: "Order job A", equipmentKind: "amplifier" }), 201);
    const b = await json(await t().post("/api/jobs", { title: "Order job B", equipmentKind: "table-radio" }), 201);
    const p1 = await json(
      await t().post(`/api/jobs/${a.job.id}/parts`, {
        designator: "C5",
        kind: "electrolytic",
        replacementValue: "47 uF 450 V",
        quantity: 2,
        unitCost: "2.40",
        supplier: "Kiln Street Parts",
        supplierPartNumber: "KS-47-450",
      }),
      201,
    );
    expect(p1.part).toMatchObject({ replacementRatingSi: 450, unitCostMinor: 240, quantity: 2 });
    expect(Math.abs(p1.part.replacementValueSi / 47e-6 - 1)).toBeLessThan(1e-12);
    const p2 = await json(
      await t().post(`/api/jobs/${b.job.id}/parts`, {
        designator: "C1",
        kind: "paper",
        originalValue: "0.047 mfd 600 V",
        quantity: 3,
        unitCost: "0.85",
        supplier: "kiln street parts",
      }),
      201,
    );
    expect(p2.part.originalRatingSi).toBe(600);

    const list = await json(await t().get("/api/orders"), 200);
    const group = list.groups.find((g: { key: string }) => g.key === "kiln street parts");
    expect(group.totalMinor).toBe(735); // 2 × 240 + 3 × 85 = 480 + 255, worked by hand
    expect(group.jobCount).toBe(2);

    const done = await json(await t().post("/api/orders/mark-ordered", { supplier: "Kiln Street Parts", partIds: [p1.part.id, p2.part.id] }), 200);
    expect(done).toEqual({ ordered: 2, jobs: [a.job.number, b.job.number].sort((x, y) => x - y) });
    for (const [jobId, part] of [
      [a.job.id, p1.part.id],
      [b.job.id, p2.part.id],
    ]) {
      const parts = (await json(await t().get(`/api/jobs/${jobId}/parts`), 200)).parts;
      expect(parts.find((p: { id: number }) => p.id === part)).toMatchObject({ state: "ordered" });
      const { log } = await json(await t().get(`/api/jobs/${jobId}/log`), 200);
      expect(log[0]).toMatchObject({ kind: "part", text: expect.stringMatching(/^Ordered from Kiln Street Parts: C\d ×[23]\.$/) });
    }
    expect((await t().post("/api/orders/mark-ordered", { supplier: "Kiln Street Parts", partIds: [p1.part.id] })).status).toBe(409);
  });
});
