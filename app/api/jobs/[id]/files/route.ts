import { NextResponse } from "next/server";
import { z } from "zod";
import { assertCanUpload, createFileRecord, listFiles } from "@/db/queries/files";
import { FILE_KINDS } from "@/lib/vocabulary";
import { HttpError } from "@/server/http/errors";
import { route } from "@/server/http/route";
import { MAX_UPLOAD_BYTES, checkOriginalName, prepareUpload, removeStored, storeUpload } from "@/server/files/uploads";

export const GET = route({ ids: { id: "That job" } }, ({ member, ids }) => NextResponse.json({ files: listFiles(member, ids.id) }));

const kindField = z.enum(FILE_KINDS, { error: `Kind must be one of ${FILE_KINDS.join(", ")}.` }).default("photo");

/** The file itself may be up to 20 MB; the form around it gets 64 KiB of room. */
const uploadLimit = {
  bytes: MAX_UPLOAD_BYTES + 64 * 1024,
  message: "Files may be up to 20 MB.",
  fields: { file: "This file is over 20 MB; export a smaller copy." },
};

/** multipart/form-data with `file` and optional `kind`. Every check runs before anything is written. */
export const POST = route(
  { role: "editJobs", ids: { id: "That job" }, body: "form", limit: uploadLimit },
  async ({ member, ids: { id: jobId }, body: form }) => {
    assertCanUpload(member, jobId);
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
  },
);
