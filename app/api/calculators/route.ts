import { NextResponse } from "next/server";
import { describeCalculators } from "@/lib/calc/registry";
import { handle } from "@/lib/http/api";

/** Public: the calculators and their inputs and outputs, as PRODUCT.md's contract gives them. */
export const GET = handle(() => NextResponse.json(describeCalculators()));
