import { NextResponse } from "next/server";
import { answerEstimate } from "@/db/queries/estimates";
import { answerSchema } from "@/lib/estimates/schemas";
import { notifyPreparer } from "@/server/mail/estimate-mail";
import { route } from "@/server/http/route";

/** The customer's answer from the e-mailed link: no account, the single-use token is the credential. */
export const POST = route({ auth: "public", body: answerSchema }, async ({ body: input }) => {
  const answered = answerEstimate(input.token, input.decision, input.note);
  await notifyPreparer(answered);
  return NextResponse.json({ status: answered.status });
});
