import { NextResponse } from "next/server";
import { route } from "@/server/http/route";

// Dynamic on purpose: the benchmark compares it with the calculator route, so it must not be served from cache.
export const dynamic = "force-dynamic";

export const GET = route({ auth: "public" }, () => NextResponse.json({ ok: true }));
