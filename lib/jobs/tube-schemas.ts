import { z } from "zod";
import { quantity } from "@/lib/calc/units";
import { normaliseTubeName } from "@/lib/calc/tables/heaters";
import { TUBE_VERDICTS } from "@/lib/vocabulary";
import { optionalText, requiredText } from "./fields";

/** A job's Tubes tab: each socket's tube, the tester's result and an optional substitute. */

/** "6sn7-gt " → "6SN7GT": the spelling the tube tables read, so differences can be looked up. */
const tubeType = (label: string, missing: string) =>
  requiredText(20, label, missing)
    .transform((v) => normaliseTubeName(v))
    .refine((v) => /^[0-9A-Z/]+$/.test(v), `${label} takes letters and digits only, like 6SN7GT or 17BP4A.`);

/** The tester's own numbers (its meter scale, mA or µmho): only the comparison with its minimum matters. */
const testerNumber = (label: string) => quantity("ratio", { nonNegative: true, max: 1e6, label });

export const tubeTestSchema = z.object(
  {
    reading: testerNumber("The tester's reading"),
    minimum: testerNumber("The tester's minimum"),
  },
  { error: "Send the test as { reading, minimum }, the tester's own numbers." },
);

export const tubeFields = {
  position: requiredText(12, "The position", "Say which socket, like V3 or CRT."),
  type: tubeType("The tube type", "Give the tube type, like 6SN7GT."),
  function: optionalText(80, "The function"),
  /** null clears a test result; absent leaves it as it is. */
  test: tubeTestSchema.nullable().optional(),
  verdict: z.enum(TUBE_VERDICTS, { error: `Verdict must be one of ${TUBE_VERDICTS.join(", ")}.` }).default("not-tested"),
  substitute: tubeType("The substitute", "Give the substitute's type, or leave it blank.").nullable().optional(),
};

/** A blank substitute means none (the form sends "" for an empty field). */
const blankToNull = (v: unknown) => (typeof v === "string" && v.trim() === "" ? null : v);

export const tubeSchema = z.object({ ...tubeFields, substitute: z.preprocess(blankToNull, tubeFields.substitute) });
export type TubeInput = z.input<typeof tubeSchema>;
export type TubeValues = z.output<typeof tubeSchema>;

export const tubeUpdateSchema = z
  .object({
    ...tubeFields,
    position: tubeFields.position.optional(),
    type: tubeFields.type.optional(),
    verdict: z.enum(TUBE_VERDICTS, { error: `Verdict must be one of ${TUBE_VERDICTS.join(", ")}.` }).optional(),
    substitute: z.preprocess(blankToNull, tubeFields.substitute),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: "Send at least one field to change." });
export type TubeUpdate = z.output<typeof tubeUpdateSchema>;

export const MAX_LINEUP = 40;

/** A set's whole line-up pasted at once ("6BE6 6BA6 6AV6 6AQ5 6X4"), or picked from the table as a list. */
export const tubeLineupSchema = z.object({
  types: z.union([z.string(), z.array(z.string())], { error: "List the tube types, like “6BE6 6BA6 6AV6 6AQ5 6X4”." }).transform((v, ctx) => {
    const list = (Array.isArray(v) ? v : v.split(/[\s,;]+/)).map((t) => normaliseTubeName(t)).filter(Boolean);
    const bad = list.find((t) => t.length > 20 || !/^[0-9A-Z/]+$/.test(t));
    if (bad) ctx.addIssue({ code: "custom", message: `“${bad.slice(0, 24)}” is not a tube type: list them like “6BE6 6BA6 6AV6”.` });
    else if (!list.length) ctx.addIssue({ code: "custom", message: "List the tube types, like “6BE6 6BA6 6AV6 6AQ5 6X4”." });
    else if (list.length > MAX_LINEUP) ctx.addIssue({ code: "custom", message: `Add at most ${MAX_LINEUP} tubes at a time.` });
    return list;
  }),
});
export type TubeLineupInput = z.input<typeof tubeLineupSchema>;
