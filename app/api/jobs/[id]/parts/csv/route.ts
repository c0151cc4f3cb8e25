import { getJob } from "@/db/queries/jobs";
import { priceCurrency } from "@/db/queries/orders";
import { listParts } from "@/db/queries/parts";
import { route } from "@/server/http/route";
import { partsToCsv } from "@/lib/jobs/parts-csv";
import { downloadName } from "@/lib/jobs/download-name";

/** The parts list as a CSV download, in the columns the import takes back; unit costs only for those who see prices. */
export const GET = route({ ids: { id: "That job" } }, ({ member, ids }) => {
  const job = getJob(member, ids.id);
  const csv = partsToCsv(listParts(member, ids.id), priceCurrency(member));
  return new Response(`\uFEFF${csv}\r\n`, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": downloadName("attachment", `parts-job-${job.number}.csv`),
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
});
