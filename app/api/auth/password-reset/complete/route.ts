import { NextResponse } from "next/server";
import { RESET_GONE, completePasswordReset, findPasswordReset } from "@/db/queries/password-resets";
import { resetPasswordSchema } from "@/lib/auth/reset-schemas";
import { assertStrongPassword } from "@/lib/auth/strength";
import { endSession } from "@/server/auth/session";
import { clientId, gatedHash, takeAttempt, throttles } from "@/server/auth/throttles";
import { HttpError } from "@/server/http/errors";
import { route } from "@/server/http/route";

/** Sets the new password; every session of the user ends, this browser's too, so they sign in afresh. */
export const POST = route({ auth: "public", body: resetPasswordSchema }, async ({ request, body: { token, password } }) => {
  takeAttempt(throttles.resetCompletions, clientId(request), "attempts");
  // Check the link before spending a hash on it; completePasswordReset checks again atomically.
  const state = findPasswordReset(token);
  if (state === "unknown") throw new HttpError(404, "That reset link is not valid. Check you opened the whole link from the e-mail.");
  if (state === "gone") throw new HttpError(410, RESET_GONE);
  assertStrongPassword(password);
  completePasswordReset(token, await gatedHash(password));
  await endSession();
  return NextResponse.json({ ok: true });
});
