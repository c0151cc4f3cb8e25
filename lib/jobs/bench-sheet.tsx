import { renderToBuffer } from "@react-pdf/renderer";
import type { Member } from "@/lib/auth/member";
import { benchSheetData } from "./bench-sheet-data";
import { BenchSheetDocument } from "./bench-sheet-document";

/**
 * The bench sheet of one job as a PDF. Checks the member's workshop (404 otherwise) like every
 * query; used by GET /api/jobs/[id]/bench-sheet and by e-mails that attach it.
 */
export async function renderBenchSheet(member: Member, jobId: number): Promise<Buffer> {
  const data = benchSheetData(member, jobId);
  return renderToBuffer(<BenchSheetDocument data={data} />);
}
