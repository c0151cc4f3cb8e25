import { NextResponse } from "next/server";
import { listCalculations, saveCalculation } from "@/db/queries/calculations";
import { route } from "@/server/http/route";
import { calculationSaveSchema } from "@/lib/jobs/calculation-schemas";

export const GET = route({ ids: { id: "That job" } }, ({ member, ids }) => NextResponse.json({ calculations: listCalculations(member, ids.id) }));

/** `{ slug, inputs, note? }` → 201 `{ calculation }`, recomputed on the server; the client's outputs are never stored. */
export const POST = route({ role: "addNotes", ids: { id: "That job" }, body: calculationSaveSchema }, ({ member, ids, body }) =>
  NextResponse.json({ calculation: saveCalculation(member, ids.id, body) }, { status: 201 }),
);
