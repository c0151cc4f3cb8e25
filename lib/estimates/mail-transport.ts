/** The estimate e-mails go through the workshop's SMTP transport like every other message. */
export { sendMail, type OutgoingMail } from "@/lib/mail/send";
