import { NextResponse } from "next/server";
import { createWorkshopWithOwner, emailTaken } from "@/db/queries/auth";
import { hashPassword } from "@/lib/auth/password";
import { signUpSchema } from "@/lib/auth/schemas";
import { startSession } from "@/server/auth/session";
import { HttpError } from "@/server/http/errors";
import { route } from "@/server/http/route";

export const POST = route({ auth: "public", body: signUpSchema }, async ({ body: input }) => {
  if (emailTaken(input.email)) {
    throw new HttpError(409, "That e-mail already has an account.", { email: "That e-mail already has an account; sign in instead." });
  }
  const passwordHash = await hashPassword(input.password);
  let created;
  try {
    created = createWorkshopWithOwner({ ...input, passwordHash });
  } catch (err) {
    // Two sign-ups racing for one address: the unique index decides.
    if (String(err).includes("UNIQUE")) throw new HttpError(409, "That e-mail already has an account.", { email: "That e-mail already has an account; sign in instead." });
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
