import { eq } from "drizzle-orm";
import { hashPassword } from "../lib/auth/password";
import { openDatabase, type Db } from "./client";
import { calculations, jobs, logEntries, memberships, parts, powerUpSteps, powerUps, readings, users, workshops } from "./schema";
import { seedTelevision } from "./seed-bench-record";
import { addOrderingTo, seedCustomersAndOrders, withPartValues } from "./seed-customers";

/**
 * The demo scenario: two invented workshops, their people, customers and sets. Every name here is
 * made up; sets are described by kind and era, never by a real brand.
 */

export const DEMO_PASSWORD = "glowbench-demo";

export const DEMO_USERS = {
  owner: { email: "owner@demo.test", name: "Maud Ferrier" },
  technician: { email: "tech@demo.test", name: "Tomas Quill" },
  apprentice: { email: "apprentice@demo.test", name: "Ada Brennock" },
  other: { email: "other@demo.test", name: "Niall Osgood" },
} as const;

const HOUR = 3_600_000;

export async function seedDemo(db: Db): Promise<{ created: boolean }> {
  const existing = db.select({ id: users.id }).from(users).where(eq(users.email, DEMO_USERS.owner.email)).get();
  if (existing) {
    // A demo database from before the bench record gains the television job; a second run adds nothing.
    addTelevisionTo(db, existing.id);
    addOrderingTo(db, existing.id);
    return { created: false };
  }
  // Hash outside the transaction (scrypt is async); write everything inside one.
  const hash = await hashPassword(DEMO_PASSWORD);
  const now = Date.now();
  const at = (hoursAgo: number) => new Date(now - hoursAgo * HOUR);

  db.transaction((tx) => {
    const lamplight = tx
      .insert(workshops)
      .values({
        name: "Lamplight Radio Workshop",
        contactEmail: "bench@lamplight.example",
        contactPhone: "01632 960 418",
        address: "Unit 4, Tannery Yard, Wexcombe",
        currency: "GBP",
        hourlyRateMinor: 4500,
        taxRateBp: 2000,
      })
      .returning({ id: workshops.id })
      .get();
    const harbour = tx
      .insert(workshops)
      .values({ name: "Harbour Street Valve Repairs", currency: "GBP", hourlyRateMinor: 4000, taxRateBp: 2000 })
      .returning({ id: workshops.id })
      .get();

    const person = (u: { email: string; name: string }) =>
      tx.insert(users).values({ email: u.email, name: u.name, passwordHash: hash }).returning({ id: users.id }).get().id;
    const owner = person(DEMO_USERS.owner);
    const tech = person(DEMO_USERS.technician);
    const apprentice = person(DEMO_USERS.apprentice);
    const other = person(DEMO_USERS.other);
    tx.insert(memberships)
      .values([
        { workshopId: lamplight.id, userId: owner, role: "owner" },
        { workshopId: lamplight.id, userId: tech, role: "technician" },
        { workshopId: lamplight.id, userId: apprentice, role: "apprentice" },
        { workshopId: harbour.id, userId: other, role: "owner" },
      ])
      .run();

    const job = (values: Omit<typeof jobs.$inferInsert, "workshopId">, workshopId = lamplight.id) =>
      tx
        .insert(jobs)
        .values({ ...values, workshopId })
        .returning({ id: jobs.id })
        .get().id;

    const radio = job({
      title: "Five-tube AC/DC table radio, early 1950s",
      equipmentKind: "table-radio",
      maker: "Marrowby Wireless",
      model: "Model 52",
      year: 1952,
      customerName: "Edith Marlow",
      customerEmail: "edith.marlow@example.com",
      status: "recapping",
      notes: "Hum at switch-on, then fades to nothing. Cabinet cracked at the back left corner; customer wants it kept original.",
      createdAt: at(72),
      updatedAt: at(2),
    });
    job({
      title: "Radio-phonograph console, late 1940s",
      equipmentKind: "console-radio",
      year: 1948,
      customerName: "Bertram Oyelaran",
      customerEmail: "b.oyelaran@example.com",
      status: "inspecting",
      notes: "Dead. Power cord perished; do not plug in until replaced.",
      createdAt: at(30),
      updatedAt: at(26),
    });
    job({
      title: "Push-pull 6V6 hi-fi amplifier, mid 1950s",
      equipmentKind: "amplifier",
      maker: "Oldstone Electric",
      year: 1956,
      customerName: "Priya Castellane",
      customerEmail: "priya.c@example.com",
      status: "slow-start",
      createdAt: at(120),
      updatedAt: at(5),
    });
    job({
      title: "12-inch black-and-white television, 1953",
      equipmentKind: "television",
      year: 1953,
      customerName: "Gwen Hallorann",
      status: "on-the-rack",
      notes: "Collector's set. EHT section to be checked before any power is applied.",
      createdAt: at(4),
      updatedAt: at(4),
    });
    job({
      title: "Bench signal generator, 1950s",
      equipmentKind: "test-gear",
      customerName: "Ivo Thackeray",
      customerEmail: "ivo.thackeray@example.com",
      status: "at-the-counter",
      notes: "Output attenuator cleaned; recalibrated against the workshop's frequency counter.",
      createdAt: at(400),
      updatedAt: at(50),
    });
    job(
      {
        title: "Shortwave receiver, 1960s",
        equipmentKind: "table-radio",
        customerName: "Lorcan Deverill",
        status: "fault-finding",
        createdAt: at(60),
        updatedAt: at(10),
      },
      harbour.id,
    );
    job({ title: "FM tuner, early 1960s", equipmentKind: "tuner", status: "on-the-rack", createdAt: at(8), updatedAt: at(8) }, harbour.id);

    const w = lamplight.id;
    tx.insert(parts)
      .values(
        withPartValues([
          {
            jobId: radio,
            workshopId: w,
            designator: "C1",
            kind: "paper",
            originalValue: "0.05 µF",
            originalRating: "400 V",
            replacementValue: "0.047 µF",
            replacementRating: "630 V",
            state: "fitted",
            unitCostMinor: 85,
          },
          {
            jobId: radio,
            workshopId: w,
            designator: "C2",
            kind: "paper",
            originalValue: "0.02 µF",
            originalRating: "400 V",
            replacementValue: "0.022 µF",
            replacementRating: "630 V",
            state: "fitted",
            unitCostMinor: 85,
          },
          {
            jobId: radio,
            workshopId: w,
            designator: "C5a",
            kind: "electrolytic",
            originalValue: "50 µF",
            originalRating: "150 V",
            replacementValue: "47 µF",
            replacementRating: "250 V",
            state: "ordered",
            unitCostMinor: 240,
          },
          {
            jobId: radio,
            workshopId: w,
            designator: "C5b",
            kind: "electrolytic",
            originalValue: "30 µF",
            originalRating: "150 V",
            replacementValue: "33 µF",
            replacementRating: "250 V",
            state: "to-order",
            unitCostMinor: 210,
          },
          {
            jobId: radio,
            workshopId: w,
            designator: "R7",
            kind: "resistor",
            originalValue: "2.2 MΩ",
            originalRating: "0.5 W",
            replacementValue: "2.2 MΩ",
            replacementRating: "0.5 W",
            state: "to-order",
            unitCostMinor: 30,
          },
        ]),
      )
      .run();
    tx.insert(readings)
      .values([
        { jobId: radio, workshopId: w, kind: "resistor", designator: "R1", nominal: 22_000, measured: 23_900, tolerance: 0.2 },
        { jobId: radio, workshopId: w, kind: "resistor", designator: "R4", nominal: 470_000, measured: 655_000, tolerance: 0.2 },
        { jobId: radio, workshopId: w, kind: "resistor", designator: "R7", nominal: 2_200_000, measured: 3_150_000, tolerance: 0.2 },
        { jobId: radio, workshopId: w, kind: "resistor", designator: "R9", nominal: 150, measured: 148, tolerance: 0.1 },
        { jobId: radio, workshopId: w, kind: "voltage", designator: "B+ after rectifier", partDesignators: "C5a", nominal: 120, measured: 112, tolerance: 0.1 },
      ])
      .run();
    tx.insert(calculations)
      .values({
        jobId: radio,
        workshopId: w,
        slug: "time-constant",
        inputs: { resistance: 470_000, capacitance: 0.00005, initialVoltage: 120, targetVoltage: 30 },
        outputs: { timeConstant: 23.5, fiveTau: 117.5, timeToTarget: 32.58 },
        note: "Original filter with the 470k across it: wait over half a minute before touching.",
        authorId: apprentice,
        createdAt: at(20),
      })
      .run();
    const radioLog = tx
      .insert(logEntries)
      .values([
        {
          jobId: radio,
          workshopId: w,
          authorId: tech,
          kind: "note",
          text: "Arrived this morning. Back cover off; all paper capacitors original and leaking wax.",
          createdAt: at(72),
        },
        {
          jobId: radio,
          workshopId: w,
          authorId: tech,
          kind: "power-up",
          text: "Slow start behind a 60 W lamp: lamp glowed bright then dimmed, heaters lit, hum loud.",
          data: { supplyVoltage: 120, currentDrawn: 0.21 },
          createdAt: at(48),
        },
        { jobId: radio, workshopId: w, authorId: apprentice, kind: "note", text: "Resistor survey done: R4 and R7 drifted high.", createdAt: at(20) },
      ])
      .returning({ id: logEntries.id, kind: logEntries.kind, text: logEntries.text, createdAt: logEntries.createdAt })
      .all();
    // The radio's power-up entry as a session of its own, as the bench-record migration moves older ones.
    const entry = radioLog.find((e) => e.kind === "power-up")!;
    const session = tx
      .insert(powerUps)
      .values({ jobId: radio, workshopId: w, authorId: tech, logEntryId: entry.id, startedAt: entry.createdAt })
      .returning({ id: powerUps.id })
      .get().id;
    tx.insert(powerUpSteps).values({ powerUpId: session, supplyVoltage: 120, currentDrawn: 0.21, note: entry.text, createdAt: entry.createdAt }).run();
    seedTelevision(tx, { workshopId: w, tech, apprentice }, now);
    seedCustomersAndOrders(tx, w, now, { fresh: true });
  });
  return { created: true };
}

function addTelevisionTo(db: Db, ownerId: number): void {
  const id = (email: string) => db.select({ id: users.id }).from(users).where(eq(users.email, email)).get()?.id;
  const workshop = db.select({ id: memberships.workshopId }).from(memberships).where(eq(memberships.userId, ownerId)).get();
  const tech = id(DEMO_USERS.technician.email);
  const apprentice = id(DEMO_USERS.apprentice.email);
  if (!workshop || !tech || !apprentice) return;
  db.transaction((tx) => seedTelevision(tx, { workshopId: workshop.id, tech, apprentice }));
}

if (process.argv[1] && /seed\.ts$/.test(process.argv[1])) {
  const { db, sqlite } = openDatabase();
  seedDemo(db)
    .then(({ created }) => {
      console.log(created ? "Demo data loaded." : "Demo data already present; nothing added.");
      sqlite.close();
    })
    .catch((err) => {
      console.error(err);
      process.exit(1);
    });
}
