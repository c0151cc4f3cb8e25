import { NextResponse } from "next/server";
import { route } from "@/server/http/route";

export const GET = route({}, ({ member: m }) =>
  NextResponse.json({
    user: { id: m.userId, email: m.email, name: m.name },
    workshop: { id: m.workshopId, name: m.workshopName },
    role: m.role,
  }),
);
