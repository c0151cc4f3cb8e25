import { eq, sql } from "drizzle-orm";
import type { DbOrTx } from "../client";
import { workshops } from "../schema";

/**
 * The next job number of a workshop ("Job 12"), counted per workshop like invoice numbers: the counter
 * is bumped by one statement inside the transaction that inserts the job, so a job that fails to insert
 * gives its number back and two bookings never share one.
 */
export function nextJobNumber(tx: DbOrTx, workshopId: number): number {
  const row = tx
    .update(workshops)
    .set({ lastJobNumber: sql`${workshops.lastJobNumber} + 1` })
    .where(eq(workshops.id, workshopId))
    .returning({ number: workshops.lastJobNumber })
    .get();
  if (!row) throw new Error(`Workshop ${workshopId} not found while numbering a job.`);
  return row.number;
}
