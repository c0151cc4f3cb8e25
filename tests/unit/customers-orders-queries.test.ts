import { beforeAll, describe, expect, test } from "vitest";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "@/lib/errors";
import type { Member } from "@/lib/auth/can";
import { demoDatabase } from "../helpers/temp-db";

// First, before anything opens the database: a fresh migrated file for the process's one client (getDb).
const demo = await demoDatabase("ordering");
const { getDb } = demo;
const jobsQ = await import("@/db/queries/jobs");
const partsQ = await import("@/db/queries/parts");
const ordersQ = await import("@/db/queries/orders");
const customersQ = await import("@/db/queries/customers");
const logQ = await import("@/db/queries/log");
const { jobCreateSchema } = await import("@/lib/jobs/job-schemas");
const { partSchema, partUpdateSchema } = await import("@/lib/jobs/part-schemas");
const { customerSchema } = await import("@/lib/customers/schemas");
const { memberships, users, workshops } = await import("@/db/schema");

let owner: Member, tech: Member, apprentice: Member, other: Member;

/** A workshop of its own with one technician, straight in the database. */
function freshWorkshop(name: string): Member {
  const db = getDb();
  const w = db.insert(workshops).values({ name, currency: "GBP" }).returning({ id: workshops.id }).get();
  const u = db
    .insert(users)
    .values({ email: `${name.toLowerCase().replace(/\W+/g, "-")}@example.test`, name: `${name} tech`, passwordHash: "x" })
    .returning({ id: users.id })
    .get();
  db.insert(memberships).values({ workshopId: w.id, userId: u.id, role: "technician" }).run();
  return { userId: u.id, email: "", name: `${name} tech`, workshopId: w.id, workshopName: name, role: "technician" };
}
const newJob = (m: Member, input: Record<string, unknown>) => jobsQ.createJob(m, jobCreateSchema.parse({ equipmentKind: "other", ...input }));

beforeAll(async () => {
  ({ owner, tech, apprentice, other } = await demo.seed());
});

describe("job numbers count per workshop", () => {
  test("two new workshops both get job 1, then job 2", () => {
    const a = freshWorkshop("Aldgate Bench");
    const b = freshWorkshop("Brindle Bench");
    expect(newJob(a, { title: "First at A" }).number).toBe(1);
    expect(newJob(b, { title: "First at B" }).number).toBe(1);
    expect(newJob(a, { title: "Second at A" }).number).toBe(2);
  });

  test("the demo workshop's numbers run from 1 without gaps, and search finds “Job 3”", () => {
    const numbers = jobsQ
      .searchJobs(tech, { page: 1, pageSize: 100, sort: "createdAt", dir: "asc" })
      .jobs.map((j) => j.number)
      .sort((x, y) => x - y);
    expect(numbers).toEqual(numbers.map((_, i) => i + 1));
    const found = jobsQ.searchJobs(tech, { page: 1, pageSize: 50, sort: "updatedAt", dir: "desc", q: "Job 3" });
    expect(found.jobs.map((j) => j.number)).toContain(3);
  });
});

describe("customers", () => {
  test("the demo has customers with several jobs", () => {
    const list = customersQ.listCustomers(tech);
    expect(list.some((c) => c.jobCount >= 2)).toBe(true);
    const edith = list.find((c) => c.email === "edith.marlow@example.com")!;
    expect(customersQ.getCustomer(tech, edith.id).jobs.length).toBeGreaterThanOrEqual(2);
    // Each count is that customer's own, and the latest arrival is one of their jobs.
    for (const c of list) {
      const theirs = customersQ.getCustomer(tech, c.id).jobs;
      expect(c.jobCount).toBe(theirs.length);
      expect(c.lastJobAt?.getTime() ?? null).toBe(theirs.length ? Math.max(...theirs.map((j) => j.createdAt.getTime())) : null);
    }
    expect(customersQ.listCustomers(other).some((c) => c.email === "edith.marlow@example.com")).toBe(false);
  });

  test("booking in with a typed e-mail on file joins that customer; a new one is made once", () => {
    const edith = customersQ.listCustomers(tech).find((c) => c.email === "edith.marlow@example.com")!;
    const job = newJob(tech, { title: "Her third set", customerName: "E. Marlow", customerEmail: "EDITH.MARLOW@example.com" });
    expect(job).toMatchObject({ customerId: edith.id, customerName: edith.name, customerEmail: "edith.marlow@example.com" });
    const first = newJob(tech, { title: "New customer's set", customerName: "Oswin Fairleigh", customerPhone: "01632 960 999" });
    const again = newJob(tech, { title: "Their second", customerName: "oswin fairleigh" });
    expect(again.customerId).toBe(first.customerId);
    expect(customersQ.getCustomer(tech, first.customerId!).phone).toBe("01632 960 999");
  });

  test("a customer of another workshop cannot be chosen", () => {
    const theirs = customersQ.listCustomers(other)[0];
    expect(() => newJob(tech, { title: "x", customerId: theirs.id })).toThrow(ValidationError);
    expect(() => customersQ.getCustomer(tech, theirs.id)).toThrow(NotFoundError);
  });

  test("editing a customer updates the copy on every job of theirs; an e-mail on file twice is refused", () => {
    const c = customersQ.createCustomer(tech, customerSchema.parse({ name: "Rosalind Teague", email: "ros@example.com" }));
    const job = newJob(tech, { title: "Ros's set", customerId: c.id });
    customersQ.updateCustomer(tech, c.id, { name: "Rosalind Teague-Orr", email: "ros.t@example.com" } as never);
    expect(jobsQ.getJob(tech, job.id)).toMatchObject({ customerName: "Rosalind Teague-Orr", customerEmail: "ros.t@example.com" });
    expect(() => customersQ.createCustomer(tech, customerSchema.parse({ name: "Someone", email: "Ros.T@example.com" }))).toThrow(ConflictError);
    expect(() => customersQ.deleteCustomer(owner, c.id)).toThrow(ConflictError);
    expect(() => customersQ.createCustomer(apprentice, customerSchema.parse({ name: "No" }))).toThrow(ForbiddenError);
  });
});

describe("parts ordering", () => {
  test("every demo part's value and rating texts were read into SI, as a part typed into the Parts tab is", async () => {
    // The demo once stored the texts alone, so every demo part showed "could not be read" on the Parts tab.
    const { parts } = await import("@/db/schema");
    const { partFlags } = await import("@/lib/jobs/part-flags");
    const { valueKindOf } = await import("@/lib/jobs/part-values");
    const rows = getDb().select().from(parts).all();
    expect(rows.length).toBeGreaterThan(10);
    // Only a multi-section can ("20-20 mfd") stays unread, rightly: it is two values, not one.
    const unread = rows.flatMap((p) =>
      partFlags(p)
        .filter((f) => f.message.includes("could not be read"))
        .map((f) => `${p.designator}: ${f.message}`),
    );
    expect(unread.filter((m) => !/\d-\d/.test(m))).toEqual([]);
    expect(rows.filter((p) => valueKindOf(p.kind) && p.originalValue && !/\d-\d/.test(p.originalValue) && p.originalValueSi === null)).toEqual([]);
    expect(rows.filter((p) => p.replacementRatingSi !== null).length).toBeGreaterThan(10);
  });

  test("a typed unit cost becomes integer pence; more decimals than the currency has are refused", () => {
    const job = newJob(tech, { title: "Pricing set" }).id;
    const part = partsQ.createPart(
      tech,
      job,
      partSchema.parse({ designator: "C1", kind: "paper", originalValue: "0.047 mfd 600 V", unitCost: "1.20", quantity: "3", supplier: "Kiln Street" }),
    );
    expect(part).toMatchObject({ unitCostMinor: 120, quantity: 3, originalRatingSi: 600 });
    expect(part.originalValueSi! / 47e-9).toBeCloseTo(1, 12);
    expect(() => partsQ.createPart(tech, job, partSchema.parse({ designator: "C2", kind: "paper", unitCost: "1.205" }))).toThrow(ValidationError);
    const changed = partsQ.updatePart(tech, job, part.id, partUpdateSchema.parse({ replacementValue: "47 uF 450 V", kind: "electrolytic" }));
    expect(changed.replacementRatingSi).toBe(450);
    expect(partsQ.listParts(apprentice, job)[0]).not.toHaveProperty("unitCostMinor");
  });

  test("the order list groups every job's parts by supplier; apprentices get no prices", () => {
    const list = ordersQ.getOrderList(tech);
    expect(list.currency).toBe("GBP");
    const cellar = list.groups.find((g) => g.key === "valve cellar supplies")!;
    expect(cellar.jobCount).toBeGreaterThanOrEqual(2);
    expect(cellar.totalMinor).toBe(cellar.lines.reduce((s, l) => s + (l.lineMinor ?? 0), 0));
    const plain = ordersQ.getOrderList(apprentice);
    expect(plain.currency).toBeNull();
    expect(plain.groups.flatMap((g) => g.lines).some((l) => "unitCostMinor" in l)).toBe(false);
    expect(ordersQ.getOrderList(other).groups.some((g) => g.key === "valve cellar supplies")).toBe(false);
  });

  test("marking a group ordered moves every part at once and writes each job's Log", () => {
    const cellar = ordersQ.getOrderList(tech).groups.find((g) => g.key === "valve cellar supplies")!;
    const ids = cellar.lines.map((l) => l.id);
    expect(() => ordersQ.markGroupOrdered(apprentice, { supplier: "Valve Cellar Supplies", partIds: ids })).toThrow(ForbiddenError);
    expect(() => ordersQ.markGroupOrdered(other, { supplier: "Valve Cellar Supplies", partIds: ids })).toThrow(NotFoundError);
    expect(() => ordersQ.markGroupOrdered(tech, { supplier: "Anode & Daughters", partIds: ids })).toThrow(ValidationError);
    const done = ordersQ.markGroupOrdered(tech, { supplier: "valve cellar supplies", partIds: ids });
    expect(done.ordered).toBe(ids.length);
    expect(ordersQ.getOrderList(tech).groups.some((g) => g.key === "valve cellar supplies")).toBe(false);
    for (const jobId of new Set(cellar.lines.map((l) => l.jobId))) {
      expect(
        partsQ
          .listParts(tech, jobId)
          .filter((p) => ids.includes(p.id))
          .every((p) => p.state === "ordered" && p.orderedAt),
      ).toBe(true);
      expect(logQ.listLog(tech, jobId)[0].text).toMatch(/^Ordered from Valve Cellar Supplies: /);
    }
    expect(() => ordersQ.markGroupOrdered(tech, { supplier: "Valve Cellar Supplies", partIds: ids })).toThrow(ConflictError);
  });
});
