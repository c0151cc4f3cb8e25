import { NextResponse } from "next/server";
import { createWorkshopWithOwner, emailTaken } from "@/db/queries/auth";
import { signUpSchema } from "@/lib/auth/schemas";
import { assertStrongPassword } from "@/lib/auth/strength";
import { startSession } from "@/server/auth/session";
import { clientId, gatedHash, takeAttempt, throttles } from "@/server/auth/throttles";
import { HttpError } from "@/server/http/errors";
import { route } from "@/server/http/route";

const TAKEN = "That e-mail already has an account.";

export const POST = route({ auth: "public", body: signUpSchema }, async ({ request, body: input }) => {
  // Every sign-up costs a hash and a workshop: a few per client per hour, counted before either.
  takeAttempt(throttles.signUps, clientId(request), "sign-ups from here");
  if (emailTaken(input.email)) throw new HttpError(409, TAKEN, { email: "That e-mail already has an account; sign in instead." });
  assertStrongPassword(input.password, [input.email, input.name, input.workshopName]);
  const passwordHash = await gatedHash(input.password);
  let created;
  try {
    created = createWorkshopWithOwner({ ...input, passwordHash });
  } catch (err) {
    // Two sign-ups racing for one address: the unique index decides.
    if (String(err).includes("UNIQUE")) throw new HttpError(409, TAKEN, { email: "That e-mail already has an account; sign in instead." });
    throw err;
  }
  await startSession(created.userId, created.sessionVersion);
  return NextResponse.json(
    {
      user: { id: created.userId, email: input.email, name: input.name },
      workshop: { id: created.workshopId, name: input.workshopName },
      role: "owner",
    },
    { status: 201 },
  );
});
