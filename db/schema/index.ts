/**
 * Every table of Glowbench. Each row belongs to one workshop, directly or through its job. One module an
 * area, each importing only the tables its foreign keys point at:
 * workshop ← users ← auth, customers ← jobs ← record ← bench-record, estimates ← invoices, drills.
 * Only tables and row types are exported here; the column helpers stay inside the folder.
 */
export { workshops, type Workshop } from "./workshop";
export { users, memberships, invitations, type Membership, type Invitation } from "./users";
export { passwordResets, sessions, auditEvents } from "./auth";
export { customers, type Customer } from "./customers";
export { jobs, type Job } from "./jobs";
export { parts, readings, calculations, files, logEntries, type Part, type Reading } from "./record";
export {
  tubes,
  powerUps,
  powerUpSteps,
  faults,
  faultCandidates,
  type Tube,
  type PowerUp,
  type PowerUpStep,
  type Fault,
  type FaultCandidate,
} from "./bench-record";
export { estimates, estimateLines, type Estimate } from "./estimates";
export { invoices, invoiceLines, paymentEvents, type Invoice } from "./invoices";
export { drillAssignments, drills } from "./drills";
