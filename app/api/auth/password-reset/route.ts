import { NextResponse, after } from "next/server";
import { createPasswordReset } from "@/db/queries/password-resets";
import { RateLimiter, clientAddress } from "@/lib/auth/rate-limit";
import { RESET_ANSWER, resetRequestSchema } from "@/lib/auth/reset-schemas";
import { HttpError } from "@/server/http/errors";
import { route } from "@/server/http/route";
import { appUrl } from "@/server/mail/config";
import { passwordResetMail } from "@/lib/mail/messages";
import { sendMail } from "@/server/mail/send";

const limits = globalThis as unknown as { __glowbenchResetLimits?: { address: RateLimiter; email: RateLimiter } };
const resetLimits = (limits.__glowbenchResetLimits ??= {
  address: new RateLimiter({ max: 10, windowMs: 15 * 60 * 1000 }),
  email: new RateLimiter({ max: 3, windowMs: 15 * 60 * 1000 }),
});

/** Same answer, same timing, whether or not the address exists: the e-mail goes out after the response. */
export const POST = route({ auth: "public", body: resetRequestSchema }, async ({ request, body: { email } }) => {
  const address = clientAddress(request);
  const wait = resetLimits.address.retryAfter(address);
  if (wait > 0) throw new HttpError(429, `Too many requests. Try again in ${Math.ceil(wait / 60)} minute(s).`, {}, { "Retry-After": String(wait) });
  resetLimits.address.record(address);
  // A flood at one address quietly stops sending, without telling the sender whether it exists.
  const quiet = resetLimits.email.retryAfter(email) > 0;
  resetLimits.email.record(email);
  const base = appUrl(request);
  after(async () => {
    if (quiet) return;
    const reset = createPasswordReset(email);
    if (!reset) return;
    try {
      await sendMail({ to: reset.email, ...passwordResetMail({ name: reset.name, link: `${base}/reset-password/${reset.token}` }), workshopId: reset.workshopId });
    } catch (err) {
      console.error("Password reset e-mail failed", err);
    }
  });
  return NextResponse.json({ ok: true, message: RESET_ANSWER });
});
