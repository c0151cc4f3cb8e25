import { NextResponse, after } from "next/server";
import { createPasswordReset } from "@/db/queries/password-resets";
import { RateLimiter } from "@/lib/auth/rate-limit";
import { RESET_ANSWER, resetRequestSchema } from "@/lib/auth/reset-schemas";
import { processSingleton } from "@/lib/singleton";
import { passwordResetMail } from "@/lib/mail/messages";
import { clientId, takeAttempt, throttles } from "@/server/auth/throttles";
import { route } from "@/server/http/route";
import { emailLinkOrigin } from "@/server/http/public-origin";
import { sendMail } from "@/server/mail/send";

const perAddress = processSingleton("ResetEmailLimit", () => new RateLimiter({ max: 3, windowMs: 15 * 60 * 1000 }));

/** Same answer, same timing, whether or not the address exists: the e-mail goes out after the response. */
export const POST = route({ auth: "public", body: resetRequestSchema }, async ({ request, body: { email } }) => {
  takeAttempt(throttles.resetRequests, clientId(request), "requests");
  // A flood at one address quietly stops sending, without telling the sender whether it exists.
  const quiet = perAddress.retryAfter(email) > 0;
  perAddress.record(email);
  // Decided now, so a production server without GLOWBENCH_PUBLIC_URL fails here, loudly, rather than mail a wrong host.
  const base = emailLinkOrigin(request);
  after(async () => {
    if (quiet) return;
    const reset = createPasswordReset(email);
    if (!reset) return;
    try {
      // No workshopId: a reset link is the member's alone and never shows in an owner's outbox.
      await sendMail({ to: reset.email, ...passwordResetMail({ name: reset.name, link: `${base}/reset-password/${reset.token}` }) });
    } catch (err) {
      console.error("Password reset e-mail failed", err);
    }
  });
  return NextResponse.json({ ok: true, message: RESET_ANSWER });
});
