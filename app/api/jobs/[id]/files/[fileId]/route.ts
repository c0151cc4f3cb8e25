import { NextResponse } from "next/server";
import { deleteFileRecord, getFileRow } from "@/db/queries/files";
import { requireMember } from "@/lib/auth/member";
import { HttpError, handle } from "@/lib/http/api";
import { idParam } from "@/lib/http/ids";
import { downloadName } from "@/lib/jobs/download-name";
import { readStored, removeStored } from "@/lib/jobs/uploads";

type Params = { params: Promise<{ id: string; fileId: string }> };

/** The only way to a stored file: member of the workshop, the sniffed type, and no sniffing by the browser. */
export const GET = handle(async (request: Request, { params }: Params) => {
  const member = await requireMember();
  const { id, fileId } = await params;
  const row = getFileRow(member, idParam(id, "That job"), idParam(fileId, "That file"));
  const url = new URL(request.url);
  const thumb = url.searchParams.get("thumb") === "1" && row.hasThumbnail;
  const bytes = await readStored(row.storedName, thumb);
  if (!bytes) throw new HttpError(404, "That file is missing from the workshop's storage.");
  const disposition = url.searchParams.get("download") === "1" || row.type === "application/pdf" ? "attachment" : "inline";
  return new Response(new Uint8Array(bytes), {
    headers: {
      "content-type": thumb ? "image/webp" : row.type,
      "content-length": String(bytes.length),
      "content-disposition": downloadName(disposition, thumb ? `thumb-${row.originalName}.webp` : row.originalName),
      "x-content-type-options": "nosniff",
      "content-security-policy": "default-src 'none'; sandbox",
      "cache-control": "private, max-age=300",
    },
  });
});

export const DELETE = handle(async (_request: Request, { params }: Params) => {
  const member = await requireMember();
  const { id, fileId } = await params;
  const storedName = deleteFileRecord(member, idParam(id, "That job"), idParam(fileId, "That file"));
  await removeStored(storedName);
  return NextResponse.json({ deleted: true });
});
