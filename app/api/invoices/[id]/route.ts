import { NextResponse } from "next/server";
import { getInvoice } from "@/db/queries/invoices";
import { route } from "@/server/http/route";

export const GET = route({ role: "seeMoney", ids: { id: "That invoice" } }, ({ member, ids }) => NextResponse.json(getInvoice(member, ids.id)));
