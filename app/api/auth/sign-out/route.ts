import { NextResponse } from "next/server";
import { z } from "zod";
import { auditAccountEvent, endAllSessions } from "@/db/queries/sessions";
import { endSession } from "@/server/auth/session";
import { route } from "@/server/http/route";

const signOutSchema = z.object({ everywhere: z.boolean().optional() }).strict();

/**
 * Ends this browser's session on the server (its row is deleted, so a copy of the cookie is worthless);
 * with `{ everywhere: true }` every other session of the user ends too.
 */
export const POST = route({ auth: "optional", body: signOutSchema }, async ({ member, body: { everywhere } }) => {
  if (member && everywhere) endAllSessions(member.userId);
  await endSession();
  if (member) auditAccountEvent(member.userId, everywhere ? "session.signed-out-everywhere" : "session.signed-out", {}, member.workshopId);
  return NextResponse.json({ ok: true });
});
