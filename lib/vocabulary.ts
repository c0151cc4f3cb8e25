/**
 * Glowbench's vocabulary: the value lists the database schema (db/schema.ts), the zod schemas and the
 * components all share. It sits in lib/, the bottom floor, so none of them reaches into db/ for a word.
 * Labels are Glowbench's own wording.
 */

export const ROLES = ["owner", "technician", "apprentice"] as const;
export type Role = (typeof ROLES)[number];

export const EQUIPMENT_KINDS = [
  "table-radio",
  "console-radio",
  "tuner",
  "amplifier",
  "television",
  "test-gear",
  "other",
] as const;
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

/** A set's path through the shop, from the day it arrives to the day it goes home. */
export const JOB_STATUSES = [
  "booked-in",
  "inspecting",
  "awaiting-go-ahead",
  "recapping",
  "slow-start",
  "fault-finding",
  "aligning",
  "ready",
  "returned",
] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

export const JOB_STATUS_LABELS: Record<JobStatus, string> = {
  "booked-in": "Booked in",
  inspecting: "Inspecting",
  "awaiting-go-ahead": "Awaiting go-ahead",
  recapping: "Recapping",
  "slow-start": "Slow start",
  "fault-finding": "Fault-finding",
  aligning: "Aligning",
  ready: "Ready to collect",
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
