import { z } from "zod";

/**
 * The Drills API's zod schemas, shared by the forms (zodResolver) and the route handlers (safeParse).
 * Every message names what to do next. They check shape only and import no calculator, so a form stays
 * light; whether a kind or calculator has drills is checked by db/queries/drills.ts (a 400 naming the field).
 */

const idField = (what: string) =>
  z
    .union(
      [
        z.number(),
        z
          .string()
          .trim()
          .regex(/^\d{1,15}$/, `Choose ${what}.`)
          .transform(Number),
      ],
      { error: `Choose ${what}.` },
    )
    .pipe(z.number().int(`Choose ${what}.`).positive(`Choose ${what}.`).max(Number.MAX_SAFE_INTEGER, `Choose ${what}.`));

const slugField = z
  .string({ error: "Name the calculator, e.g. cathode-bias." })
  .trim()
  .min(1, "Name the calculator, e.g. cathode-bias.")
  .max(60, "That calculator name is too long.");

const kindField = z
  .string({ error: "Name the drill kind, e.g. cathode-bias/resistor." })
  .trim()
  .min(1, "Name the drill kind, e.g. cathode-bias/resistor.")
  .max(80, "That drill kind is too long.");

/** `POST /api/drills`: a calculator (`slug`), a drill kind (`kind`) or a saved calculation (`calculationId`): exactly one. */
export const drillCreateSchema = z
  .object(
    { slug: slugField.optional(), kind: kindField.optional(), calculationId: idField("a saved calculation").optional() },
    { error: "Send a JSON object with one of slug, kind or calculationId." },
  )
  .superRefine((v, ctx) => {
    const given = [v.slug, v.kind, v.calculationId].filter((x) => x !== undefined).length;
    if (given !== 1) {
      ctx.addIssue({
        code: "custom",
        path: ["slug"],
        message: "Choose one calculator (slug), one drill kind (kind) or one saved calculation (calculationId).",
      });
    }
  });
export type DrillCreate = z.output<typeof drillCreateSchema>;

const ANSWER_MESSAGE = 'Write your answer: a number, with its unit if you like ("1.5k", "250 mW"), or the words asked for.';

/** `POST /api/drills/{id}/answer`: a JSON number in SI, or text as people write it. Reading it is the judge's work. */
export const drillAnswerSchema = z.object(
  {
    answer: z.union([z.number().finite(ANSWER_MESSAGE), z.string().trim().min(1, ANSWER_MESSAGE).max(120, "Keep the answer under 120 characters.")], {
      error: ANSWER_MESSAGE,
    }),
  },
  { error: 'Send a JSON object: { "answer": … }.' },
);

/** `?member={userId}`: whose progress or assignments; left out, the member's own. */
export const drillMemberQuerySchema = z.object({ member: idField("a member of your workshop").optional() });

/** Today in UTC as "YYYY-MM-DD", less a day, so a due date of "today" is accepted in every time zone. */
function earliestDueDate(now = new Date()): string {
  return new Date(now.getTime() - 86_400_000).toISOString().slice(0, 10);
}

const dueField = z
  .string({ error: "Choose a due date." })
  .trim()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Choose a due date (YYYY-MM-DD).")
  .refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().slice(0, 10) === s, "That date does not exist.")
  .refine((s) => s >= earliestDueDate(), "The due date has passed; choose today or later.")
  .refine((s) => s <= "2100-01-01", "Choose a due date this century.");

/** Kinds and calculator slugs may be mixed: a slug gives one of its kinds per drill. */
const kindOrSlug = z
  .string({ error: "Choose kinds of drill by name." })
  .trim()
  .min(1, "Choose kinds of drill by name.")
  .max(80, "That drill kind is too long.");

/**
 * `POST /api/drills/assignments`: a set of drills for one apprentice, due on a date. Either kinds (drill kinds or
 * calculator slugs, taken in turn) and a count, or one saved calculation ("do this one yourself").
 */
export const drillAssignmentSchema = z
  .object(
    {
      apprentice: idField("the apprentice"),
      kinds: z.array(kindOrSlug, { error: "Choose at least one kind of drill." }).max(40, "Choose 40 kinds or fewer.").optional(),
      calculationId: idField("a saved calculation").optional(),
      count: z.coerce
        .number({ error: "Say how many drills (1 to 20)." })
        .int("Say how many drills (1 to 20).")
        .min(1, "Set at least one drill.")
        .max(20, "Set 20 drills or fewer at a time.")
        .optional(),
      due: dueField,
      note: z.string().trim().max(200, "Keep the note under 200 characters.").optional(),
    },
    { error: "Send a JSON object with apprentice, kinds (or calculationId) and due." },
  )
  .superRefine((v, ctx) => {
    const fromKinds = v.kinds !== undefined && v.kinds.length > 0;
    if (fromKinds === (v.calculationId !== undefined)) {
      ctx.addIssue({ code: "custom", path: ["kinds"], message: "Choose at least one kind of drill (or one saved calculation)." });
    }
  });
export type DrillAssignmentInput = z.output<typeof drillAssignmentSchema>;
