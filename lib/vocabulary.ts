/**
 * Glowbench's vocabulary: the value lists the database schema (db/schema.ts), the zod schemas and the
 * components all share. It sits in lib/, the bottom floor, so none of them reaches into db/ for a word.
 * Labels are Glowbench's own wording.
 */

export const ROLES = ["owner", "technician", "apprentice"] as const;
export type Role = (typeof ROLES)[number];

export const EQUIPMENT_KINDS = ["table-radio", "console-radio", "tuner", "amplifier", "television", "test-gear", "other"] as const;
export type EquipmentKind = (typeof EQUIPMENT_KINDS)[number];

export const EQUIPMENT_KIND_LABELS: Record<EquipmentKind, string> = {
  "table-radio": "Table radio",
  "console-radio": "Console radio",
  tuner: "AM/FM tuner",
  amplifier: "Amplifier",
  television: "Television",
  "test-gear": "Test gear",
  other: "Other",
};

/**
 * A set's path through the shop, from the day it arrives to the day it goes home. The ends are named for
 * where the set sits (on the rack, at the counter) and what the customer is doing; the middle is the trade's.
 * Renamed values are moved in db/migrations/0006 (on-the-rack was booked-in, customer-weighing-up was
 * awaiting-go-ahead, at-the-counter was ready).
 */
export const JOB_STATUSES = [
  "on-the-rack",
  "inspecting",
  "customer-weighing-up",
  "recapping",
  "slow-start",
  "fault-finding",
  "aligning",
  "at-the-counter",
  "returned",
] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

/** Where a new job starts, and the status the checks before collection guard (lib/jobs/ready-checks.ts). */
export const FIRST_JOB_STATUS = "on-the-rack" satisfies JobStatus;
export const COLLECTION_STATUS = "at-the-counter" satisfies JobStatus;

export const JOB_STATUS_LABELS: Record<JobStatus, string> = {
  "on-the-rack": "On the rack",
  inspecting: "Inspecting",
  "customer-weighing-up": "Customer weighing it up",
  recapping: "Recapping",
  "slow-start": "Slow start",
  "fault-finding": "Fault-finding",
  aligning: "Aligning",
  "at-the-counter": "At the counter",
  returned: "Gone home",
};

export const PART_KINDS = ["paper", "electrolytic", "mica", "ceramic", "film", "resistor", "tube", "other"] as const;
export type PartKind = (typeof PART_KINDS)[number];

export const PART_STATES = ["to-order", "ordered", "fitted"] as const;
export type PartState = (typeof PART_STATES)[number];

export const PART_STATE_LABELS: Record<PartState, string> = {
  "to-order": "To order",
  ordered: "Ordered",
  fitted: "Fitted",
};

/** The bench record (docs/PRODUCT.md "The bench record"): what a tube tester's result comes to. */
export const TUBE_VERDICTS = ["strong", "serviceable", "weak", "short", "open-heater", "gassy", "not-tested"] as const;
export type TubeVerdict = (typeof TUBE_VERDICTS)[number];

export const TUBE_VERDICT_LABELS: Record<TubeVerdict, string> = {
  strong: "Strong",
  serviceable: "Serviceable",
  weak: "Weak",
  short: "Shorted",
  "open-heater": "Heater open",
  gassy: "Gassy",
  "not-tested": "Not tested yet",
};

/** What holds a first power-up back from the full mains. */
export const POWER_UP_LIMITERS = ["variac", "series-lamp", "limited-supply"] as const;
export type PowerUpLimiter = (typeof POWER_UP_LIMITERS)[number];

export const POWER_UP_LIMITER_LABELS: Record<PowerUpLimiter, string> = {
  variac: "Variable transformer",
  "series-lamp": "Series lamp",
  "limited-supply": "Current-limited supply",
};

export const POWER_UP_OUTCOMES = ["passed", "stopped"] as const;
export type PowerUpOutcome = (typeof POWER_UP_OUTCOMES)[number];

export const POWER_UP_OUTCOME_LABELS: Record<PowerUpOutcome, string> = {
  passed: "Came up well",
  stopped: "Stopped",
};

/** The checks before first power, in the order they are done at the bench (advice, not a gate). */
export const POWER_UP_CHECKLIST = [
  { id: "filters-replaced", label: "Filter capacitors replaced or reformed" },
  { id: "caps-discharged", label: "Every capacitor discharged, and checked with a meter" },
  { id: "fuse-rating", label: "A fuse of the right rating fitted" },
  { id: "hv-lead-dressed", label: "High-voltage lead dressed and its clearance checked" },
  { id: "no-bplus-short", label: "No short on B+, measured with an ohmmeter" },
  { id: "tubes-seated", label: "Tubes seated and caps on" },
  { id: "output-loaded", label: "A load on the output transformer (speaker or resistor)" },
] as const;
export type PowerUpChecklistId = (typeof POWER_UP_CHECKLIST)[number]["id"];

/** One suspect on a fault's list. */
export const FAULT_CANDIDATE_STATUSES = ["open", "ruled-out", "cause"] as const;
export type FaultCandidateStatus = (typeof FAULT_CANDIDATE_STATUSES)[number];

export const FAULT_CANDIDATE_STATUS_LABELS: Record<FaultCandidateStatus, string> = {
  open: "Still to test",
  "ruled-out": "Ruled out",
  cause: "The cause",
};

/** A fault as a whole: open while no candidate is the cause, found once one is, fixed once the repair is written. */
export const FAULT_STATES = ["open", "found", "fixed"] as const;
export type FaultState = (typeof FAULT_STATES)[number];

export const FAULT_STATE_LABELS: Record<FaultState, string> = {
  open: "Open",
  found: "Cause found",
  fixed: "Fixed",
};

/** A reading is a resistor-survey row (Ω) or a voltage test point (V, nominal = expected). */
export const READING_KINDS = ["resistor", "voltage"] as const;

/** What an uploaded file is for: a PDF is always a schematic; an intake photo shows the set as it came in. */
export const FILE_KINDS = ["photo", "schematic", "intake"] as const;
export type FileKind = (typeof FILE_KINDS)[number];

export const FILE_KIND_LABELS: Record<FileKind, string> = { photo: "Photo", schematic: "Schematic", intake: "Intake photo" };

/** A line of an estimate or an invoice. */
export const LINE_KINDS = ["labour", "part", "fee"] as const;
export type LineKind = (typeof LINE_KINDS)[number];
export const LINE_KIND_LABELS: Record<LineKind, string> = { labour: "Labour", part: "Part", fee: "Fee" };

/** An estimate is prepared (draft), sent to the customer, and answered once. */
export const ESTIMATE_STATUSES = ["draft", "sent", "approved", "declined"] as const;
export type EstimateStatus = (typeof ESTIMATE_STATUSES)[number];

/** An invoice is issued, then paid (only from the payment service's webhook) or voided by the owner. */
export const INVOICE_STATUSES = ["issued", "paid", "void"] as const;
export type InvoiceStatus = (typeof INVOICE_STATUSES)[number];

/** What a line of a job's Log tells of: a member's note, the bench record, the workflow, the customer's answer, a payment, a mail. */
export const LOG_KINDS = ["note", "power-up", "tube", "fault", "part", "status", "estimate", "invoice", "mail"] as const;
export type LogKind = (typeof LOG_KINDS)[number];

export const LOG_KIND_LABELS: Record<LogKind, string> = {
  note: "Note",
  "power-up": "Power-up",
  tube: "Tube",
  fault: "Fault",
  part: "Part",
  status: "Status",
  estimate: "Estimate",
  invoice: "Invoice",
  mail: "E-mail",
};

/** How an answered drill was judged, as stored; an unreadable answer is refused, never stored. */
export const DRILL_VERDICTS = ["correct", "wrong-number", "wrong-unit"] as const;
export type DrillVerdict = (typeof DRILL_VERDICTS)[number];
