import { NextResponse } from "next/server";
import { z } from "zod";
import { assertCanUpload, createFileRecord, listFiles } from "@/db/queries/files";
import { requireMember } from "@/lib/auth/member";
import { HttpError, handle, sameOrigin } from "@/lib/http/api";
import { idParam, type JobParams } from "@/lib/http/ids";
import { MAX_UPLOAD_BYTES, checkOriginalName, prepareUpload, removeStored, storeUpload } from "@/lib/jobs/uploads";

export const GET = handle(async (_request: Request, { params }: JobParams) => {
  const member = await requireMember();
  return NextResponse.json({ files: listFiles(member, idParam((await params).id, "That job")) });
});

const kindField = z.enum(["photo", "schematic"], { error: "Kind must be photo or schematic." }).default("photo");

/** multipart/form-data with `file` and optional `kind`. Every check runs before anything is written. */
export const POST = handle(async (request: Request, { params }: JobParams) => {
  const member = await requireMember();
  const jobId = idParam((await params).id, "That job");
  assertCanUpload(member, jobId);
  if (!sameOrigin(request)) throw new HttpError(403, "Cross-site requests are not accepted.");
  if (!/^multipart\/form-data\b/i.test(request.headers.get("content-type") ?? "")) throw new HttpError(415, "Send the file as multipart/form-data.");
  if (Number(request.headers.get("content-length") ?? "0") > MAX_UPLOAD_BYTES + 64 * 1024) {
    throw new HttpError(413, "Files may be up to 20 MB.", { file: "This file is over 20 MB; export a smaller copy." });
  }
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    throw new HttpError(400, "The upload could not be read.", { file: "Choose the file again and retry." });
  }
  const file = form.get("file");
  if (!(file instanceof File)) throw new HttpError(400, "Choose a file to attach.", { file: "Choose a file to attach." });
  const kind = kindField.safeParse(form.get("kind") ?? undefined);
  if (!kind.success) throw new HttpError(400, "Some fields need attention.", { kind: kind.error.issues[0].message });
  const originalName = checkOriginalName(file.name);
  const prepared = await prepareUpload(file);
  const storedName = await storeUpload(prepared);
  try {
    const id = createFileRecord(member, jobId, {
      storedName,
      originalName,
      type: prepared.type,
      size: prepared.bytes.length,
      kind: prepared.type === "application/pdf" ? "schematic" : kind.data,
      hasThumbnail: prepared.thumbnail !== null,
    });
    const row = listFiles(member, jobId).find((f) => f.id === id)!;
    return NextResponse.json({ file: row }, { status: 201 });
  } catch (err) {
    await removeStored(storedName);
    throw err;
  }
});
