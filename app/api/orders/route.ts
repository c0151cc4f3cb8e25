import { NextResponse } from "next/server";
import { getOrderList } from "@/db/queries/orders";
import { route } from "@/server/http/route";

/** Every part still to order across the workshop's jobs, grouped by supplier; prices only for owners and technicians. */
export const GET = route({}, ({ member }) => NextResponse.json(getOrderList(member)));
