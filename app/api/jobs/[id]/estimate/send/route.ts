import { NextResponse } from "next/server";
import { z } from "zod";
import { issueApprovalLink } from "@/db/queries/estimates";
import { sendApprovalLink } from "@/server/mail/estimate-mail";
import { HttpError } from "@/server/http/errors";
import { publicOrigin } from "@/server/http/public-origin";
import { route } from "@/server/http/route";

/** E-mails the customer a single-use approval link. The token is only ever in that e-mail. */
export const POST = route({ role: "prepareEstimates", ids: { id: "That job" }, body: z.object({}) }, async ({ request, member, ids }) => {
  const base = publicOrigin(request); // before the link is issued: a server that cannot address it refuses first
  const issued = issueApprovalLink(member, ids.id);
  try {
    await sendApprovalLink({
      workshopId: member.workshopId,
      to: issued.job.customerEmail!,
      customerName: issued.job.customerName,
      workshopName: issued.workshopName,
      jobTitle: issued.job.title,
      total: issued.total,
      link: `${base}/estimate/${issued.token}`,
      expiresAt: issued.expiresAt,
    });
  } catch (err) {
    console.error("Estimate e-mail failed", err);
    throw new HttpError(502, "The estimate could not be e-mailed; check the mail settings and send it again.");
  }
  return NextResponse.json({ sentTo: issued.job.customerEmail, expiresAt: issued.expiresAt });
});
