import { desc, eq } from "drizzle-orm";
import type { Member } from "@/lib/auth/member";
import { getDb } from "../client";
import { jobs } from "../schema";

/** Columns a job list shows; every query here is scoped to the member's workshop. */
const listColumns = {
  id: jobs.id,
  title: jobs.title,
  equipmentKind: jobs.equipmentKind,
  maker: jobs.maker,
  model: jobs.model,
  year: jobs.year,
  customerName: jobs.customerName,
  status: jobs.status,
  createdAt: jobs.createdAt,
  updatedAt: jobs.updatedAt,
};

export function listJobs(member: Member) {
  return getDb().select(listColumns).from(jobs).where(eq(jobs.workshopId, member.workshopId)).orderBy(desc(jobs.updatedAt)).all();
}
