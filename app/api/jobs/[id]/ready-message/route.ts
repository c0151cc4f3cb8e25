import { NextResponse } from "next/server";
import { readyMessageDraft, recordReadyMessageSent } from "@/db/queries/ready-message";
import { requireMember } from "@/lib/auth/member";
import { forbidden } from "@/lib/auth/errors";
import { HttpError, handle, parseJson } from "@/lib/http/api";
import { idParam, type JobParams } from "@/lib/http/ids";
import { renderBenchSheet } from "@/lib/jobs/bench-sheet";
import { readyMessageSchema } from "@/lib/mail/ready-schemas";
import { sendMail } from "@/lib/mail/send";

export const runtime = "nodejs";

/** The draft: the workshop's template filled in for this job, and whether it may be sent now. */
export const GET = handle(async (_request: Request, { params }: JobParams) => {
  const member = await requireMember();
  return NextResponse.json({ draft: readyMessageDraft(member, idParam((await params).id, "That job")) });
});

/** Sends the (possibly edited) message to the job's customer with the bench sheet attached. */
export const POST = handle(async (request: Request, { params }: JobParams) => {
  const member = await requireMember();
  const jobId = idParam((await params).id, "That job");
  const draft = readyMessageDraft(member, jobId);
  if (!draft.canSend && draft.blocked === "role") throw forbidden("send customers messages");
  const input = await parseJson(request, readyMessageSchema);
  if (!draft.canSend) throw new HttpError(409, draft.reason);
  const pdf = await renderBenchSheet(member, jobId);
  const attachment = `bench-sheet-job-${jobId}.pdf`;
  try {
    await sendMail({ to: draft.to, subject: input.subject, text: input.text, attachments: [{ filename: attachment, content: pdf, contentType: "application/pdf" }], workshopId: member.workshopId });
  } catch (err) {
    console.error("Ready message failed", err);
    throw new HttpError(502, "The e-mail could not be sent. Check the mail settings and try again.");
  }
  recordReadyMessageSent(member, jobId, { to: draft.to, subject: input.subject, attachment });
  return NextResponse.json({ sent: { to: draft.to, subject: input.subject, attachment } });
});
