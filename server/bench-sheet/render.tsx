import "server-only";
import { renderToBuffer } from "@react-pdf/renderer";
import type { Member } from "@/lib/auth/can";
import { benchSheetData } from "./data";
import { BenchSheetDocument } from "./document";

/**
 * The bench sheet of one job as a PDF. Checks the member's workshop (404 otherwise) like every
 * query; used by GET /api/jobs/[id]/bench-sheet and by e-mails that attach it.
 */
export async function renderBenchSheet(member: Member, jobId: number): Promise<Buffer> {
  const data = benchSheetData(member, jobId);
  return renderToBuffer(<BenchSheetDocument data={data} />);
}
