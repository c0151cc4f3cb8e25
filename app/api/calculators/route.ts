import { NextResponse } from "next/server";
import { describeCalculators } from "@/lib/calc/registry";
import { route } from "@/server/http/route";

/** Public: the calculators and their inputs and outputs, as docs/PRODUCT.md's contract gives them. */
export const GET = route({ auth: "public" }, () => NextResponse.json(describeCalculators()));
