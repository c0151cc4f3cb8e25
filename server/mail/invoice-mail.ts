import "server-only";
import { KEEP_THE_BACK_ON } from "@/lib/customer/reminders";
import { sendMail } from "./send";

/** The invoice e-mail: the PDF attached, a link to pay by card, written to the customer, not the bench. */

export interface InvoiceMail {
  workshopId: number;
  to: string;
  customerName: string | null;
  workshopName: string;
  jobTitle: string;
  number: number;
  total: string;
  link: string;
  expiresAt: Date;
  note?: string;
  pdf: Buffer;
}

const longDate = (d: Date) => d.toLocaleDateString("en-GB", { day: "numeric", month: "long", year: "numeric" });

export function invoiceMailText(mail: Omit<InvoiceMail, "pdf" | "workshopId" | "to">): string {
  return [
    `${mail.customerName ? `Dear ${mail.customerName}` : "Hello"},`,
    "",
    ...(mail.note ? [mail.note, ""] : []),
    `Here is invoice ${mail.number} from ${mail.workshopName} for the work on your ${mail.jobTitle}: ${mail.total} in all. The invoice is attached as a PDF.`,
    "",
    "You can pay by card here:",
    "",
    mail.link,
    "",
    `The link is for you alone, so please don't forward it. It works until ${longDate(mail.expiresAt)}; once the invoice is paid it simply says thank you.`,
    "",
    `${KEEP_THE_BACK_ON.title}. ${KEEP_THE_BACK_ON.home}`,
    "",
    mail.workshopName,
  ].join("\n");
}

export async function sendInvoiceMail(mail: InvoiceMail) {
  await sendMail({
    to: mail.to,
    subject: `Invoice ${mail.number} from ${mail.workshopName}: ${mail.total}`,
    text: invoiceMailText(mail),
    attachments: [{ filename: `invoice-${mail.number}.pdf`, content: mail.pdf, contentType: "application/pdf" }],
    workshopId: mail.workshopId,
  });
}
