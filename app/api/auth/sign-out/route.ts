import { NextResponse } from "next/server";
import { z } from "zod";
import { bumpSessionVersion } from "@/db/queries/auth";
import { endSession } from "@/server/auth/session";
import { route } from "@/server/http/route";

const signOutSchema = z.object({ everywhere: z.boolean().optional() }).strict();

/** Signs out this browser; with `{ everywhere: true }` every other session of the user ends too. */
export const POST = route({ auth: "optional", body: signOutSchema }, async ({ member, body: { everywhere } }) => {
  if (member && everywhere) bumpSessionVersion(member.userId);
  await endSession();
  return NextResponse.json({ ok: true });
});
