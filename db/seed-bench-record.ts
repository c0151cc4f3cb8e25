import { and, eq } from "drizzle-orm";
import { POWER_UP_CHECKLIST } from "../lib/vocabulary";
import type { Tx } from "./client";
import { withPartValues } from "./seed-customers";
import { faultCandidates, faults, jobs, logEntries, parts, powerUpSteps, powerUps, readings, tubes } from "./schema";

/**
 * The demo's bench record: an invented 1950s black-and-white television taken from recap to a fault hunt,
 * so the Tubes, Power-ups and Faults tabs all show work. No real brand or model; figures are typical of
 * such sets (tube functions of the era, common practice), not copied from any one set's service data.
 */

export const DEMO_TELEVISION_TITLE = "17-inch black-and-white console television, 1955";

const HOUR = 3_600_000;

export interface DemoPeople {
  workshopId: number;
  tech: number;
  apprentice: number;
}

/** Adds the television job once; a second run finds it by title and adds nothing. */
export function seedTelevision(tx: Tx, people: DemoPeople, now = Date.now()): boolean {
  const w = people.workshopId;
  const have = tx
    .select({ id: jobs.id })
    .from(jobs)
    .where(and(eq(jobs.workshopId, w), eq(jobs.title, DEMO_TELEVISION_TITLE)))
    .get();
  if (have) return false;
  const at = (hoursAgo: number) => new Date(now - hoursAgo * HOUR);
  const jobId = tx
    .insert(jobs)
    .values({
      workshopId: w,
      title: DEMO_TELEVISION_TITLE,
      equipmentKind: "television",
      year: 1955,
      customerName: "Rosalind Ashgrove",
      customerEmail: "r.ashgrove@example.com",
      status: "fault-finding",
      notes: "Lights up with a bright horizontal line and no height. Picture tube low on emission; the customer agreed to a substitute.",
      createdAt: at(240),
      updatedAt: at(1),
    })
    .returning({ id: jobs.id })
    .get().id;
  const own = { jobId, workshopId: w };

  tx.insert(parts)
    .values(
      withPartValues([
        {
          ...own,
          designator: "C101",
          kind: "electrolytic",
          originalValue: "40 µF",
          originalRating: "450 V",
          replacementValue: "47 µF",
          replacementRating: "500 V",
          state: "fitted",
          checkedBy: people.tech,
          checkedAt: at(200),
          unitCostMinor: 320,
        },
        {
          ...own,
          designator: "C102",
          kind: "electrolytic",
          originalValue: "40 µF",
          originalRating: "450 V",
          replacementValue: "47 µF",
          replacementRating: "500 V",
          state: "fitted",
          checkedBy: people.tech,
          checkedAt: at(200),
          unitCostMinor: 320,
        },
        {
          ...own,
          designator: "C205",
          kind: "paper",
          originalValue: "0.1 µF",
          originalRating: "600 V",
          replacementValue: "0.1 µF",
          replacementRating: "630 V",
          state: "fitted",
          unitCostMinor: 110,
        },
        {
          ...own,
          designator: "C310",
          kind: "paper",
          originalValue: "0.05 µF",
          originalRating: "1600 V",
          replacementValue: "0.047 µF",
          replacementRating: "2000 V",
          state: "ordered",
          unitCostMinor: 260,
        },
      ]),
    )
    .run();

  const [cathode, plate, yoke] = tx
    .insert(readings)
    .values([
      { ...own, kind: "voltage", designator: "V9 cathode", nominal: 18, measured: 1.6, tolerance: 0.2 },
      { ...own, kind: "voltage", designator: "V9 plate", nominal: 250, measured: 262, tolerance: 0.2 },
      { ...own, kind: "resistor", designator: "Yoke, vertical windings", nominal: 60, measured: 58, tolerance: 0.1 },
    ])
    .returning({ id: readings.id })
    .all();

  // Parallel 6.3 V heaters on a power transformer with a 5U4GB: no series string.
  const tube = (position: string, type: string, fn: string, verdict: (typeof tubes.$inferInsert)["verdict"], test?: [number, number], substitute?: string) => ({
    ...own,
    position,
    type,
    function: fn,
    verdict,
    testReading: test?.[0] ?? null,
    testMinimum: test?.[1] ?? null,
    substitute: substitute ?? null,
    createdAt: at(230),
    updatedAt: at(230),
  });
  tx.insert(tubes)
    .values([
      tube("V1", "6CB6", "RF amplifier", "strong", [82, 60]),
      tube("V2", "6J6", "mixer and local oscillator", "serviceable", [66, 60]),
      tube("V3", "6CB6", "first video IF", "strong", [78, 60]),
      tube("V4", "6CB6", "second video IF", "serviceable", [63, 60]),
      tube("V5", "6AL5", "video detector", "strong", [75, 60]),
      tube("V6", "6AU6", "sound IF", "serviceable", [64, 60]),
      tube("V7", "6AQ5", "audio output", "strong", [80, 60]),
      tube("V8", "6SN7GT", "vertical oscillator", "strong", [74, 60]),
      tube("V9", "6S4", "vertical output", "weak", [38, 60]),
      tube("V10", "6SN7GT", "horizontal oscillator", "serviceable", [61, 60], "6SN7GTB"),
      tube("V11", "6BQ6GT", "horizontal output", "strong", [85, 65]),
      tube("V12", "6W4GT", "damper", "serviceable", [68, 60]),
      tube("V13", "1B3GT", "high-voltage rectifier", "not-tested"),
      tube("V14", "5U4GB", "power rectifier", "strong", [90, 70]),
      tube("CRT", "17BP4A", "picture tube", "weak", [30, 50], "17HP4"),
    ])
    .run();

  // A stepped bring-up behind a 200 W series lamp, supply raised on a variable transformer.
  const session = tx
    .insert(powerUps)
    .values({
      ...own,
      limiter: "series-lamp",
      lampPower: 200,
      stopCurrent: 1.2,
      checklist: Object.fromEntries(POWER_UP_CHECKLIST.map((c) => [c.id, true])),
      outcome: "passed",
      reason: "The 1.35 A at 90 V was the new filter capacitors charging; it fell to 1.05 A within a minute and held there.",
      authorId: people.tech,
      startedAt: at(190),
    })
    .returning({ id: powerUps.id })
    .get().id;
  tx.insert(powerUpSteps)
    .values([
      { powerUpId: session, supplyVoltage: 40, currentDrawn: 0.45, minutes: 5, note: "Heaters glowing, lamp bright orange.", createdAt: at(190) },
      {
        powerUpId: session,
        supplyVoltage: 70,
        currentDrawn: 0.75,
        minutes: 5,
        note: "No smoke, no smell. Lamp dimming as the heaters warm.",
        createdAt: at(189.9),
      },
      { powerUpId: session, supplyVoltage: 90, currentDrawn: 1.35, minutes: 1, bPlus: 180, note: "Lamp flared as B+ came up.", createdAt: at(189.8) },
      {
        powerUpId: session,
        supplyVoltage: 90,
        currentDrawn: 1.05,
        minutes: 10,
        bPlus: 195,
        note: "Settled. Sound from the speaker, faint raster.",
        createdAt: at(189.6),
      },
      {
        powerUpId: session,
        supplyVoltage: 117,
        currentDrawn: 1.15,
        minutes: 15,
        bPlus: 255,
        note: "Full line: a bright horizontal line only, no height. High voltage present (line is lit).",
        createdAt: at(189.3),
      },
    ])
    .run();

  const fault = tx
    .insert(faults)
    .values({
      ...own,
      symptom: "No vertical deflection: a bright horizontal line across the screen",
      section: "vertical deflection",
      createdAt: at(188),
      updatedAt: at(20),
    })
    .returning({ id: faults.id })
    .get().id;
  tx.insert(faultCandidates)
    .values([
      {
        faultId: fault,
        position: 1,
        description: "Yoke (vertical windings)",
        status: "ruled-out",
        evidence: "Both vertical halves measure alike, near the expected figure.",
        readingId: yoke.id,
        createdAt: at(187),
      },
      {
        faultId: fault,
        position: 2,
        description: "Vertical output transformer",
        status: "ruled-out",
        evidence: "Primary continuous; B+ reaches the plate of V9.",
        readingId: plate.id,
        createdAt: at(187),
      },
      {
        faultId: fault,
        position: 3,
        description: "Vertical output tube (V9)",
        status: "cause",
        evidence: "Cathode at 1.6 V where about 18 V is expected: the tube hardly conducts. Tested weak.",
        readingId: cathode.id,
        createdAt: at(187),
      },
      { faultId: fault, position: 4, description: "Vertical oscillator (V8)", status: "open", createdAt: at(187) },
    ])
    .run();

  const log = (hoursAgo: number, author: number, kind: (typeof logEntries.$inferInsert)["kind"], text: string) => ({
    ...own,
    authorId: author,
    kind,
    text,
    createdAt: at(hoursAgo),
  });
  tx.insert(logEntries)
    .values([
      log(240, people.tech, "status", `On the rack: ${DEMO_TELEVISION_TITLE}.`),
      log(230, people.apprentice, "tube", "Tube line-up added and tested: V9 (6S4) and the picture tube test weak."),
      log(200, people.tech, "part", "Filter capacitors C101 and C102 recorded as fitted and checked."),
      log(190, people.tech, "power-up", "Power-up session started behind a 200 W series lamp, stop current 1.2 A; every check done."),
      log(189, people.tech, "power-up", "Power-up session passed: the 1.35 A at 90 V was the new filter capacitors charging."),
      log(188, people.tech, "fault", "Fault found: “No vertical deflection: a bright horizontal line across the screen” (points to the vertical deflection)."),
      log(
        20,
        people.apprentice,
        "fault",
        "“No vertical deflection…” — Vertical output tube (V9): the cause; reading V9 cathode 1.6 V. The fault is now: cause found.",
      ),
    ])
    .run();
  return true;
}
