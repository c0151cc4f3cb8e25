import { NextResponse } from "next/server";
import { z } from "zod";
import { issueApprovalLink } from "@/db/queries/estimates";
import { requireMember } from "@/lib/auth/member";
import { sendApprovalLink } from "@/lib/estimates/mail";
import { HttpError, handle, parseJson } from "@/lib/http/api";
import { idParam, type JobParams } from "@/lib/http/ids";
import { publicOrigin } from "@/lib/http/public-origin";

/** E-mails the customer a single-use approval link. The token is only ever in that e-mail. */
export const POST = handle(async (request: Request, { params }: JobParams) => {
  const member = await requireMember();
  const jobId = idParam((await params).id, "That job");
  await parseJson(request, z.object({}));
  const issued = issueApprovalLink(member, jobId);
  try {
    await sendApprovalLink({
      workshopId: member.workshopId,
      to: issued.job.customerEmail!,
      customerName: issued.job.customerName,
      workshopName: issued.workshopName,
      jobTitle: issued.job.title,
      total: issued.total,
      link: `${publicOrigin(request)}/estimate/${issued.token}`,
      expiresAt: issued.expiresAt,
    });
  } catch (err) {
    console.error("Estimate e-mail failed", err);
    throw new HttpError(502, "The estimate could not be e-mailed; check the mail settings and send it again.");
  }
  return NextResponse.json({ sentTo: issued.job.customerEmail, expiresAt: issued.expiresAt });
});
