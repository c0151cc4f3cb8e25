import type { Member } from "@/lib/auth/can";
import { listCalculations } from "./calculations";
import { listFiles } from "./files";
import { getJob } from "./jobs";
import { listLog } from "./log";
import { listParts } from "./parts";
import { listReadings } from "./readings";

/** Everything a job page shows, in one call: the data of GET /api/jobs/[id]. */
export function getJobRecord(member: Member, jobId: number) {
  const job = getJob(member, jobId);
  return {
    job,
    parts: listParts(member, jobId),
    readings: listReadings(member, jobId),
    calculations: listCalculations(member, jobId),
    files: listFiles(member, jobId),
    log: listLog(member, jobId),
  };
}
