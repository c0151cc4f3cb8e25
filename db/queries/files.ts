import { and, desc, eq, inArray } from "drizzle-orm";
import { assertCan, type Member } from "@/lib/auth/can";
import type { FileKind } from "@/lib/vocabulary";
import { notFound } from "@/lib/errors";
import { getDb } from "../client";
import { files, users } from "../schema";
import { assertJobInWorkshop, touchJob } from "./job-access";

/** Records of a job's photos and schematics; the bytes live in lib/jobs/uploads.ts's folder. */

const columns = {
  id: files.id,
  jobId: files.jobId,
  originalName: files.originalName,
  type: files.type,
  size: files.size,
  kind: files.kind,
  hasThumbnail: files.hasThumbnail,
  createdAt: files.createdAt,
  uploaderName: users.name,
};

export function listFiles(member: Member, jobId: number) {
  assertJobInWorkshop(member, jobId);
  return getDb()
    .select(columns)
    .from(files)
    .leftJoin(users, eq(users.id, files.uploadedBy))
    .where(and(eq(files.jobId, jobId), eq(files.workshopId, member.workshopId)))
    .orderBy(desc(files.createdAt), desc(files.id))
    .all();
}

/** Called before the upload is read, so a refused member never costs a disk write. */
export function assertCanUpload(member: Member, jobId: number) {
  assertCan(member, "editJobs", "attach files");
  assertJobInWorkshop(member, jobId);
}

export function createFileRecord(
  member: Member,
  jobId: number,
  input: { storedName: string; originalName: string; type: string; size: number; kind: FileKind; hasThumbnail: boolean },
) {
  assertCanUpload(member, jobId);
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const row = tx
      .insert(files)
      .values({ ...input, jobId, workshopId: member.workshopId, uploadedBy: member.userId })
      .returning({ id: files.id })
      .get();
    touchJob(member, jobId, tx);
    return row.id;
  });
}

export function getFileRow(member: Member, jobId: number, fileId: number) {
  const row = getDb()
    .select({ ...columns, storedName: files.storedName })
    .from(files)
    .leftJoin(users, eq(users.id, files.uploadedBy))
    .where(and(eq(files.id, fileId), eq(files.jobId, jobId), eq(files.workshopId, member.workshopId)))
    .get();
  if (!row) throw notFound("That file");
  return row;
}

/** Returns the stored name so the caller can remove the bytes after the row is gone. */
export function deleteFileRecord(member: Member, jobId: number, fileId: number): string {
  assertCan(member, "editJobs", "remove files");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const gone = tx
      .delete(files)
      .where(and(eq(files.id, fileId), eq(files.jobId, jobId), eq(files.workshopId, member.workshopId)))
      .returning({ storedName: files.storedName })
      .get();
    if (!gone) throw notFound("That file");
    touchJob(member, jobId, tx);
    return gone.storedName;
  });
}

/**
 * Of these stored names, the ones a file row still refers to, in any workshop. Only for the uploads
 * sweep (server/files/sweep.ts), a maintenance task with no member behind it; it returns names, nothing else.
 */
export function knownStoredNames(names: string[]): Set<string> {
  const known = new Set<string>();
  for (let i = 0; i < names.length; i += 500) {
    const rows = getDb()
      .select({ storedName: files.storedName })
      .from(files)
      .where(inArray(files.storedName, names.slice(i, i + 500)))
      .all();
    for (const r of rows) known.add(r.storedName);
  }
  return known;
}
