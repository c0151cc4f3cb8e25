import { NextResponse } from "next/server";
import { deleteFileRecord, getFileRow } from "@/db/queries/files";
import { HttpError } from "@/server/http/errors";
import { route } from "@/server/http/route";
import { downloadName } from "@/lib/jobs/download-name";
import { readStored, removeStored } from "@/server/files/uploads";

const ids = { id: "That job", fileId: "That file" };

/** The only way to a stored file: member of the workshop, the sniffed type, and no sniffing by the browser. */
export const GET = route({ ids }, async ({ request, member, ids }) => {
  const row = getFileRow(member, ids.id, ids.fileId);
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

export const DELETE = route({ role: "editJobs", ids }, async ({ member, ids }) => {
  const storedName = deleteFileRecord(member, ids.id, ids.fileId);
  await removeStored(storedName);
  return NextResponse.json({ deleted: true });
});
