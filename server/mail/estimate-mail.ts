import "server-only";
import { sendMail } from "./send";

/** The e-mails of the estimate round trip: the approval link to the customer, the answer to whoever prepared it. */

export async function sendApprovalLink(input: {
  workshopId: number;
  to: string;
  customerName: string | null;
  workshopName: string;
  jobTitle: string;
  total: string;
  link: string;
  expiresAt: Date;
}) {
  const until = input.expiresAt.toLocaleDateString("en-GB", { day: "numeric", month: "long", year: "numeric" });
  const text = [
    `${input.customerName ? `Dear ${input.customerName}` : "Hello"},`,
    "",
    `${input.workshopName} has prepared an estimate of ${input.total} for your ${input.jobTitle}.`,
    "Please look it over and approve or decline it here:",
    "",
    input.link,
    "",
    `The link works once and until ${until}. Please do not open or power the set yourself while it waits: tube equipment holds lethal voltages.`,
    "",
    input.workshopName,
  ].join("\n");
  await sendMail({ to: input.to, subject: `Your estimate from ${input.workshopName}: ${input.total}`, text, workshopId: input.workshopId });
}

export async function notifyPreparer(answer: {
  workshopId: number;
  text: string;
  status: string;
  job: { id: number; title: string };
  preparer?: { email: string; name: string };
}) {
  if (!answer.preparer) return;
  try {
    await sendMail({
      to: answer.preparer.email,
      subject: `Estimate ${answer.status}: ${answer.job.title}`,
      text: `${answer.preparer.name},\n\n${answer.text}\n\nThe answer is in the job's Log: /jobs/${answer.job.id}\n`,
      workshopId: answer.workshopId,
    });
  } catch (err) {
    // The answer is already recorded and logged; a mail failure must not make the customer answer again.
    console.error("Could not notify the technician of an estimate answer", err);
  }
}
