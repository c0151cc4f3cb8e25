import { NextResponse } from "next/server";
import { readyMessageDraft, recordReadyMessageSent } from "@/db/queries/ready-message";
import { assertReadyOrOverride, readyIssues, recordReadyOverride } from "@/db/queries/ready-record";
import { HttpError } from "@/server/http/errors";
import { route } from "@/server/http/route";
import { renderBenchSheet } from "@/server/bench-sheet/render";
import { readyMessageSendSchema } from "@/lib/jobs/ready-schemas";
import { sendMail } from "@/server/mail/send";

export const runtime = "nodejs";

/** The draft: the workshop's template filled in for this job, whether it may be sent now, and the checks before "ready" still open. */
export const GET = route({ ids: { id: "That job" } }, ({ member, ids }) =>
  NextResponse.json({ draft: readyMessageDraft(member, ids.id), checks: readyIssues(member, ids.id) }),
);

/**
 * Sends the (possibly edited) message to the job's customer with the bench sheet attached. The checks
 * before "ready" answer 409 with `error.checks` unless `{ override: true, reason }` comes with it.
 */
export const POST = route(
  { role: "changeStatus", ids: { id: "That job" }, body: readyMessageSendSchema },
  async ({ member, ids: { id: jobId }, body: input }) => {
    const draft = readyMessageDraft(member, jobId);
    if (!draft.canSend) throw new HttpError(409, draft.reason);
    const overridden = assertReadyOrOverride(member, jobId, input);
    const pdf = await renderBenchSheet(member, jobId);
    const attachment = `bench-sheet-job-${jobId}.pdf`;
    try {
      await sendMail({
        to: draft.to,
        subject: input.subject,
        text: input.text,
        attachments: [{ filename: attachment, content: pdf, contentType: "application/pdf" }],
        workshopId: member.workshopId,
      });
    } catch (err) {
      console.error("Ready message failed", err);
      throw new HttpError(502, "The e-mail could not be sent. Check the mail settings and try again.");
    }
    recordReadyMessageSent(member, jobId, { to: draft.to, subject: input.subject, attachment });
    recordReadyOverride(member, jobId, overridden, input.reason ?? "", "Ready message sent");
    return NextResponse.json({ sent: { to: draft.to, subject: input.subject, attachment } });
  },
);
