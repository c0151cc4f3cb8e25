import { z } from "zod";
import { EQUIPMENT_KINDS, JOB_STATUSES } from "@/lib/vocabulary";
import { blankToUndefined, optionalText, requiredText } from "./fields";

/** One schema per job form, used by react-hook-form (zodResolver) and the route handlers (safeParse). */

const THIS_YEAR = new Date().getFullYear();

const yearField = z
  .union([z.number(), z.string()], { error: "Enter the year as a number, like 1952." })
  .nullable()
  .optional()
  .transform((v, ctx): number | null | undefined => {
    if (v === undefined) return undefined;
    if (v === null || (typeof v === "string" && v.trim() === "")) return null;
    const n = typeof v === "number" ? v : Number(v.trim());
    if (!Number.isInteger(n) || n < 1880 || n > THIS_YEAR + 1) {
      ctx.addIssue({ code: "custom", message: `Enter a year between 1880 and ${THIS_YEAR + 1}, or leave it blank.` });
      return z.NEVER;
    }
    return n;
  });

const customerEmailField = optionalText(254, "Customer e-mail").refine(
  (v) => v == null || z.email().safeParse(v).success,
  "Enter a valid e-mail address, like name@example.com, or leave it blank.",
);

/** What came in with the set: a list, or the text of a form ("Knobs, back cover"); blank clears it. */
const accessoriesField = z
  .union([z.array(z.string({ error: "Each item must be text." })), z.string()], { error: "List what came in with the set." })
  .nullable()
  .optional()
  .transform((v, ctx): string[] | null | undefined => {
    if (v === undefined || v === null) return v;
    const items = (typeof v === "string" ? v.split(/[,;\n]/) : v).map((x) => x.trim()).filter(Boolean);
    const unique = items.filter((x, i) => items.findIndex((y) => y.toLowerCase() === x.toLowerCase()) === i);
    if (unique.length > 20 || unique.some((x) => x.length > 60)) {
      ctx.addIssue({ code: "custom", message: "List at most 20 items of up to 60 characters each." });
      return z.NEVER;
    }
    return unique.length ? unique : null;
  });

export const jobFields = {
  title: requiredText(120, "The title", "Give the set a short title, like “Five-tube table radio, 1950s”."),
  equipmentKind: z.enum(EQUIPMENT_KINDS, { error: "Choose what kind of set it is." }),
  maker: optionalText(80, "Maker"),
  model: optionalText(80, "Model"),
  year: yearField,
  customerName: optionalText(120, "Customer name"),
  customerEmail: customerEmailField,
  /** A customer already on file; without it the name and e-mail find or make the record (db/queries/customers.ts). */
  customerId: z
    .number({ error: "Choose a customer from the list." })
    .int("Choose a customer from the list.")
    .positive("Choose a customer from the list.")
    .nullable()
    .optional(),
  /** Only for a customer made at booking-in. */
  customerPhone: optionalText(40, "Customer phone").optional(),
  notes: optionalText(4000, "Notes"),
  serialNumber: optionalText(80, "Serial or chassis number").optional(),
  accessories: accessoriesField.optional(),
};

export const jobCreateSchema = z.object(jobFields);
export type JobCreateInput = z.input<typeof jobCreateSchema>;
export type JobCreate = z.output<typeof jobCreateSchema>;

/** PATCH: any subset of the fields; an absent key is left as it is. */
export const jobUpdateSchema = z
  .object({ ...jobFields, title: jobFields.title.optional(), equipmentKind: jobFields.equipmentKind.optional() })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: "Send at least one field to change." });
export type JobUpdate = z.output<typeof jobUpdateSchema>;

export const statusChangeSchema = z.object({
  status: z.enum(JOB_STATUSES, { error: "Choose one of the workflow steps." }),
});

export { JOB_LIST_PAGE_SIZE } from "./job-list-size";

export const JOB_SORTS = ["updatedAt", "createdAt", "title", "status", "equipmentKind", "customerName", "year"] as const;
export type JobSort = (typeof JOB_SORTS)[number];

const statusList = z.string().transform((s, ctx) => {
  const list = s
    .split(",")
    .map((x) => x.trim())
    .filter(Boolean);
  for (const x of list) {
    if (!(JOB_STATUSES as readonly string[]).includes(x)) {
      ctx.addIssue({ code: "custom", message: `“${x}” is not a job status; use one of ${JOB_STATUSES.join(", ")}.` });
      return z.NEVER;
    }
  }
  return list as (typeof JOB_STATUSES)[number][];
});

/** GET /api/jobs query: paging, sorting, filters and text search; every parameter optional. */
export const jobListQuerySchema = z.object({
  page: z.preprocess(
    blankToUndefined,
    z.coerce.number({ error: "page must be a whole number" }).int("page must be a whole number").min(1, "page starts at 1").max(100_000).default(1),
  ),
  pageSize: z.preprocess(
    blankToUndefined,
    z.coerce
      .number({ error: "pageSize must be a whole number" })
      .int("pageSize must be a whole number")
      .min(1, "pageSize must be 1 to 100")
      .max(100, "pageSize must be 1 to 100")
      .default(50),
  ),
  sort: z.preprocess(blankToUndefined, z.enum(JOB_SORTS, { error: `sort must be one of ${JOB_SORTS.join(", ")}` }).default("updatedAt")),
  dir: z.preprocess(blankToUndefined, z.enum(["asc", "desc"], { error: "dir must be asc or desc" }).default("desc")),
  status: z.preprocess(blankToUndefined, statusList.optional()),
  kind: z.preprocess(blankToUndefined, z.enum(EQUIPMENT_KINDS, { error: `kind must be one of ${EQUIPMENT_KINDS.join(", ")}` }).optional()),
  q: z.preprocess(blankToUndefined, z.string().trim().max(100, "Keep the search under 100 characters").optional()),
});
export type JobListQuery = z.output<typeof jobListQuerySchema>;
