import { and, eq, isNull, sql } from "drizzle-orm";
import { readPartValues } from "../lib/jobs/part-values";
import type { Db, Tx } from "./client";
import { customers, jobs, logEntries, memberships, parts, users, workshops } from "./schema";

/**
 * The demo's customers and ordering: every demo job linked to a customer record (some with several jobs),
 * contact details, and parts with suppliers, supplier part numbers and unit costs spread over several jobs,
 * so the order list has groups to show. Suppliers and people are invented. Runs once: a second run finds
 * the marker job by title and adds nothing.
 */

export const DEMO_ORDERING_MARKER = "Portable battery radio, late 1950s";

const HOUR = 3_600_000;
const VALVE_CELLAR = "Valve Cellar Supplies";
const ANODE = "Anode & Daughters";

type PartSeed = Omit<typeof parts.$inferInsert, "jobId" | "workshopId">;

/** A part row with its value and rating read into SI, as the app stores them (sorting, order totals, checks). */
function withValues<P extends PartSeed>(p: P): P {
  const texts = {
    kind: p.kind,
    originalValue: p.originalValue ?? null,
    originalRating: p.originalRating ?? null,
    replacementValue: p.replacementValue ?? null,
    replacementRating: p.replacementRating ?? null,
  };
  return { ...p, ...readPartValues(texts) };
}

/** Every demo part goes in through this, so the demo's parts read as the app's own would. */
export function withPartValues<P extends PartSeed>(rows: P[]): P[] {
  return rows.map(withValues);
}

/** Links every job that names a customer to one record per e-mail (else per name) in its workshop. */
function linkCustomers(tx: Tx) {
  const unlinked = tx
    .select({ id: jobs.id, workshopId: jobs.workshopId, name: jobs.customerName, email: jobs.customerEmail })
    .from(jobs)
    .where(and(isNull(jobs.customerId), sql`coalesce(${jobs.customerName}, ${jobs.customerEmail}) is not null`))
    .all();
  for (const j of unlinked) {
    const email = j.email?.trim().toLowerCase() || null;
    const name = j.name?.trim() || email!;
    const match = email
      ? tx
          .select({ id: customers.id })
          .from(customers)
          .where(and(eq(customers.workshopId, j.workshopId), eq(customers.email, email)))
          .get()
      : tx
          .select({ id: customers.id })
          .from(customers)
          .where(and(eq(customers.workshopId, j.workshopId), sql`lower(${customers.name}) = lower(${name})`))
          .get();
    const id = match?.id ?? tx.insert(customers).values({ workshopId: j.workshopId, name, email }).returning({ id: customers.id }).get().id;
    tx.update(jobs).set({ customerId: id }).where(eq(jobs.id, j.id)).run();
  }
}

/**
 * A fresh demo numbers its jobs in the order they came in (as the migration numbers older ones), since the
 * seed inserts them in another order. Never on a database people have used: numbers once seen stay.
 */
function numberByArrival(tx: Tx, workshopId: number) {
  tx.update(jobs)
    .set({ number: sql`-${jobs.id}` })
    .where(eq(jobs.workshopId, workshopId))
    .run();
  tx.run(
    sql`update ${jobs} set number = ranked.n from (select id, row_number() over (order by created_at, id) as n from ${jobs} where workshop_id = ${workshopId}) as ranked where ranked.id = ${jobs.id}`,
  );
  tx.update(workshops)
    .set({ lastJobNumber: sql`(select count(*) from ${jobs} where ${jobs.workshopId} = ${workshopId})` })
    .where(eq(workshops.id, workshopId))
    .run();
}

export function seedCustomersAndOrders(tx: Tx, workshopId: number, now = Date.now(), { fresh = false } = {}): boolean {
  const have = tx
    .select({ id: jobs.id })
    .from(jobs)
    .where(and(eq(jobs.workshopId, workshopId), eq(jobs.title, DEMO_ORDERING_MARKER)))
    .get();
  if (have) return false;
  const at = (hoursAgo: number) => new Date(now - hoursAgo * HOUR);
  linkCustomers(tx);
  const byEmail = (email: string) =>
    tx
      .select({ id: customers.id, name: customers.name })
      .from(customers)
      .where(and(eq(customers.workshopId, workshopId), eq(customers.email, email)))
      .get();
  const contact = (email: string, details: Partial<typeof customers.$inferInsert>) =>
    tx
      .update(customers)
      .set(details)
      .where(and(eq(customers.workshopId, workshopId), eq(customers.email, email)))
      .run();
  contact("edith.marlow@example.com", {
    phone: "01632 960 771",
    address: "2 Lantern Row, Wexcombe",
    notes: "Prefers a phone call to e-mail. Collects sets from the 1950s.",
  });
  contact("priya.c@example.com", { phone: "07700 900 512", notes: "Listens to records on the amplifier every evening; keep the original output transformer." });
  contact("b.oyelaran@example.com", { phone: "01632 960 233" });

  // Earlier sets of two customers, so their pages show more than one job.
  const edith = byEmail("edith.marlow@example.com");
  const priya = byEmail("priya.c@example.com");
  const job = (
    c: { id: number; name: string } | undefined,
    email: string,
    values: Omit<typeof jobs.$inferInsert, "workshopId" | "customerId" | "customerName" | "customerEmail">,
  ) =>
    tx
      .insert(jobs)
      .values({ ...values, workshopId, customerId: c?.id ?? null, customerName: c?.name ?? null, customerEmail: c ? email : null })
      .returning({ id: jobs.id })
      .get().id;
  job(edith, "edith.marlow@example.com", {
    title: DEMO_ORDERING_MARKER,
    equipmentKind: "table-radio",
    year: 1958,
    status: "returned",
    serialNumber: "B-20417",
    accessories: ["Back cover", "Manual"],
    notes: "Battery eliminator fitted in place of the dry batteries; customer keeps the originals as a keepsake.",
    createdAt: at(2200),
    updatedAt: at(1900),
  });
  const tuner = job(priya, "priya.c@example.com", {
    title: "AM/FM tuner, early 1960s",
    equipmentKind: "tuner",
    year: 1962,
    status: "inspecting",
    serialNumber: "T-3391",
    accessories: ["Knobs", "Power cord"],
    createdAt: at(20),
    updatedAt: at(18),
  });

  const find = (title: string) =>
    tx
      .select({ id: jobs.id })
      .from(jobs)
      .where(and(eq(jobs.workshopId, workshopId), eq(jobs.title, title)))
      .get()?.id;
  const radio = find("Five-tube AC/DC table radio, early 1950s");
  const amp = find("Push-pull 6V6 hi-fi amplifier, mid 1950s");
  const consoleRadio = find("Radio-phonograph console, late 1940s");
  const tv = find("12-inch black-and-white television, 1953");
  const add = (jobId: number | undefined, rows: PartSeed[]) => {
    if (jobId)
      tx.insert(parts)
        .values(rows.map((r) => ({ ...withValues(r), jobId, workshopId })))
        .run();
  };

  if (radio) {
    tx.update(jobs)
      .set({ serialNumber: "52-118403", accessories: ["Knobs", "Back cover"] })
      .where(eq(jobs.id, radio))
      .run();
    const supply = (designator: string, supplier: string, supplierPartNumber: string) =>
      tx
        .update(parts)
        .set({ supplier, supplierPartNumber })
        .where(and(eq(parts.jobId, radio), eq(parts.designator, designator)))
        .run();
    supply("C1", VALVE_CELLAR, "VCS-F47N-630");
    supply("C2", VALVE_CELLAR, "VCS-F22N-630");
    supply("C5a", VALVE_CELLAR, "VCS-E47-250");
    supply("C5b", VALVE_CELLAR, "VCS-E33-250");
    supply("R7", ANODE, "AD-R2M2-05");
    tx.update(parts)
      .set({ orderedAt: at(30) })
      .where(and(eq(parts.jobId, radio), eq(parts.designator, "C5a")))
      .run();
    const tech = tx.select({ id: users.id }).from(users).where(eq(users.email, "tech@demo.test")).get();
    tx.insert(logEntries)
      .values({ jobId: radio, workshopId, authorId: tech?.id ?? null, kind: "part", text: `Ordered from ${VALVE_CELLAR}: C5a ×1.`, createdAt: at(30) })
      .run();
  }
  add(amp, [
    {
      designator: "C10",
      kind: "electrolytic",
      originalValue: "40 mfd 450 V",
      replacementValue: "47 µF",
      replacementRating: "500 V",
      quantity: 2,
      supplier: VALVE_CELLAR,
      supplierPartNumber: "VCS-E47-500",
      unitCostMinor: 385,
    },
    {
      designator: "C12",
      kind: "paper",
      originalValue: "0.02 mfd 600 V",
      replacementValue: "0.022 µF",
      replacementRating: "630 V",
      quantity: 2,
      supplier: VALVE_CELLAR,
      supplierPartNumber: "VCS-F22N-630",
      unitCostMinor: 95,
    },
    {
      designator: "V3",
      kind: "tube",
      originalValue: "6V6GT",
      replacementValue: "6V6GT",
      quantity: 2,
      supplier: ANODE,
      supplierPartNumber: "AD-6V6GT-PR",
      unitCostMinor: 1850,
    },
    {
      designator: "R20",
      kind: "resistor",
      originalValue: "1k",
      originalRating: "1 W",
      replacementValue: "1 kΩ",
      replacementRating: "1/2 W",
      quantity: 1,
      supplier: ANODE,
      supplierPartNumber: "AD-R1K-05",
      unitCostMinor: 25,
    },
  ]);
  add(consoleRadio, [
    {
      designator: "W1",
      kind: "other",
      originalValue: "Two-core mains cord, perished",
      replacementValue: "Two-core cloth-covered mains cord, 2 m",
      quantity: 1,
      unitCostMinor: 650,
    },
  ]);
  add(tv, [
    {
      designator: "C31",
      kind: "ceramic",
      originalValue: "500 mmf",
      originalRating: "20 kV",
      replacementValue: "470 pF",
      replacementRating: "20 kV",
      quantity: 1,
      supplier: ANODE,
      supplierPartNumber: "AD-C470P-20K",
    },
  ]);
  if (fresh) numberByArrival(tx, workshopId);
  add(tuner, [
    {
      designator: "C3",
      kind: "electrolytic",
      originalValue: "20-20 mfd 350 V",
      replacementValue: "22 µF",
      replacementRating: "450 V",
      quantity: 2,
      supplier: "valve cellar supplies",
      supplierPartNumber: "VCS-E22-450",
      unitCostMinor: 210,
    },
  ]);
  return true;
}

/** For a demo database from before customers and ordering: the owner's workshop gains them once. */
export function addOrderingTo(db: Db, ownerId: number): void {
  const workshop = db.select({ id: memberships.workshopId }).from(memberships).where(eq(memberships.userId, ownerId)).get();
  if (workshop) db.transaction((tx) => seedCustomersAndOrders(tx, workshop.id));
}
