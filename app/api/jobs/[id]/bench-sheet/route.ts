import { route } from "@/server/http/route";
import { renderBenchSheet } from "@/server/bench-sheet/render";
import { downloadName } from "@/lib/jobs/download-name";

export const runtime = "nodejs";

/** The job's printable bench sheet (PDF), for any member of its workshop. */
export const GET = route({ ids: { id: "That job" } }, async ({ request, member, ids: { id: jobId } }) => {
  const pdf = await renderBenchSheet(member, jobId);
  const inline = new URL(request.url).searchParams.get("inline") === "1";
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-length": String(pdf.length),
      "content-disposition": downloadName(inline ? "inline" : "attachment", `bench-sheet-job-${jobId}.pdf`),
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
});
