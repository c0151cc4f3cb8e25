import { NextResponse } from "next/server";

// Dynamic on purpose: the benchmark compares it with the calculator route, so it must not be served from cache.
export const dynamic = "force-dynamic";

export function GET() {
  return NextResponse.json({ ok: true });
}
