import { NextResponse } from "next/server";
import { z } from "zod";
import { voidInvoice } from "@/db/queries/invoices";
import { route } from "@/server/http/route";

export const POST = route({ role: "seeMoney", ids: { id: "That invoice" }, body: z.object({}) }, ({ member, ids }) =>
  NextResponse.json(voidInvoice(member, ids.id)),
);
