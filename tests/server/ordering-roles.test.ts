import { beforeAll, describe, expect, test } from "vitest";
import { Client } from "../helpers/http";
import { makeTeam, type Team } from "../helpers/team";

/**
 * The order list and customer routes against every kind of caller, through the real server. Roles follow
 * docs/PRODUCT.md: every member reads (apprentices without prices), technicians and owners write, only an
 * owner removes a customer; another workshop's member never sees ours (a list of their own, 404 by id).
 */

const CALLERS = ["signedOut", "apprentice", "technician", "owner", "outsider"] as const;
type Caller = (typeof CALLERS)[number];

let team: Team;
let job: number, customer: number;
const client = (c: Caller): Client => (c === "signedOut" ? new Client() : team[c]);
const tech = () => team.technician;

async function created(res: Response, key: string): Promise<number> {
  if (res.status !== 201) throw new Error(`fixture failed: ${res.status} ${await res.text()}`);
  return (await res.json())[key].id;
}
const freshCustomer = async () => created(await tech().post("/api/customers", { name: `Throwaway ${Math.random()}` }), "customer");
/** A to-order part of the team's own supplier, one per caller, so a mark by one caller leaves the next a part to mark. */
const freshPart = async () =>
  created(await tech().post(`/api/jobs/${job}/parts`, { designator: "C40", kind: "film", supplier: "Roles Supply", unitCost: "0.95", quantity: "2" }), "part");

interface Case {
  route: string;
  call: (c: Client, target: number) => Promise<Response>;
  fresh?: () => Promise<number>;
  expect: [number, number, number, number, number];
}

const CASES: Case[] = [
  { route: "GET /api/orders", call: (c) => c.get("/api/orders"), expect: [401, 200, 200, 200, 200] },
  { route: "GET /api/orders/csv", call: (c) => c.get("/api/orders/csv?supplier=Roles%20Supply"), expect: [401, 200, 200, 200, 200] },
  {
    route: "POST /api/orders/mark-ordered",
    call: (c, id) => c.post("/api/orders/mark-ordered", { supplier: "Roles Supply", partIds: [id] }),
    fresh: freshPart,
    expect: [401, 403, 200, 200, 404],
  },
  { route: "GET /api/customers", call: (c) => c.get("/api/customers"), expect: [401, 200, 200, 200, 200] },
  { route: "POST /api/customers", call: (c) => c.post("/api/customers", { name: "Matrix Customer" }), expect: [401, 403, 201, 201, 201] },
  { route: "GET /api/customers/[id]", call: (c) => c.get(`/api/customers/${customer}`), expect: [401, 200, 200, 200, 404] },
  { route: "PATCH /api/customers/[id]", call: (c) => c.patch(`/api/customers/${customer}`, { phone: "01632 960 000" }), expect: [401, 403, 200, 200, 404] },
  { route: "DELETE /api/customers/[id]", call: (c, id) => c.delete(`/api/customers/${id}`), fresh: freshCustomer, expect: [401, 403, 403, 200, 404] },
];

beforeAll(async () => {
  team = await makeTeam("ordering");
  customer = await created(await tech().post("/api/customers", { name: "Hester Vane", email: `hester-${Date.now()}@example.com` }), "customer");
  job = await created(await tech().post("/api/jobs", { title: "Ordering matrix radio", equipmentKind: "table-radio", customerId: customer }), "job");
});

describe("who may call each ordering and customer route", () => {
  for (const c of CASES) {
    test(c.route, async () => {
      const got: number[] = [];
      for (const caller of CALLERS) {
        const target = c.fresh ? await c.fresh() : 0;
        got.push((await c.call(client(caller), target)).status);
      }
      expect(got).toEqual(c.expect);
    });
  }
});

describe("what each role sees", () => {
  test("apprentices get the order list, the CSV and the parts without a price; technicians with one", async () => {
    const part = await freshPart();
    const forApprentice = await (await team.apprentice.get("/api/orders")).json();
    expect(forApprentice.currency).toBeNull();
    const line = forApprentice.groups.flatMap((g: { lines: { id: number }[] }) => g.lines).find((l: { id: number }) => l.id === part);
    expect(line).toBeDefined();
    expect(JSON.stringify(forApprentice)).not.toMatch(/unitCostMinor|totalMinor":\d/);
    const csv = await (await team.apprentice.get("/api/orders/csv")).text();
    expect(csv.replace(/^\uFEFF/, "").split("\r\n")[0]).toBe("supplier,supplier_part_number,description,quantity,for");
    expect(csv).not.toContain("0.95");
    const parts = await (await team.apprentice.get(`/api/jobs/${job}/parts`)).json();
    expect(parts.parts.find((p: { id: number }) => p.id === part)).not.toHaveProperty("unitCostMinor");
    expect(await (await team.apprentice.get(`/api/jobs/${job}/parts/csv`)).text()).not.toContain("unit_cost");

    const forTech = await (await tech().get("/api/orders")).json();
    const group = forTech.groups.find((g: { key: string }) => g.key === "roles supply");
    expect(forTech.currency).toBe("GBP");
    expect(group.lines.find((l: { id: number }) => l.id === part)).toMatchObject({ unitCostMinor: 95, quantity: 2, lineMinor: 190 });
    expect(Number.isInteger(group.totalMinor)).toBe(true);
    const techCsv = await (await tech().get("/api/orders/csv?supplier=roles%20supply")).text();
    expect(techCsv).toContain(",0.95,");
  });

  test("an outsider's lists hold nothing of ours", async () => {
    const orders = await (await team.outsider.get("/api/orders")).json();
    expect(orders.groups).toEqual([]);
    const customers = await (await team.outsider.get("/api/customers")).json();
    expect(customers.customers.some((c: { id: number }) => c.id === customer)).toBe(false);
    expect((await team.outsider.post("/api/jobs", { title: "x", equipmentKind: "other", customerId: customer })).status).toBe(400);
  });

  test("pages: the order list and the customers render for every member, another workshop's customer is a 404", async () => {
    for (const path of ["/jobs/orders", "/customers", `/customers/${customer}`]) {
      expect((await team.apprentice.get(path)).status).toBe(200);
    }
    const html = await (await team.apprentice.get("/jobs/orders")).text();
    expect(html).toContain("Order list");
    expect(html).not.toContain("£1.90");
    expect((await tech().get("/jobs/orders")).status).toBe(200);
    expect((await team.outsider.get(`/customers/${customer}`)).status).toBe(404);
    expect((await new Client().get("/customers")).status).toBe(307);
  });
});
