import { NextResponse } from "next/server";
import { z } from "zod";
import { bumpSessionVersion, getMember } from "@/lib/auth/member";
import { endSession } from "@/lib/auth/session";
import { handle, parseJson } from "@/lib/http/api";

const signOutSchema = z.object({ everywhere: z.boolean().optional() }).strict();

/** Signs out this browser; with `{ everywhere: true }` every other session of the user ends too. */
export const POST = handle(async (request: Request) => {
  const { everywhere } = await parseJson(request, signOutSchema);
  const member = await getMember();
  if (member && everywhere) await bumpSessionVersion(member.userId);
  await endSession();
  return NextResponse.json({ ok: true });
});
