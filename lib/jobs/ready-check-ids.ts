/**
 * The names of the checks before "at the counter" and the shape of one undone thing. Apart from
 * ready-checks.ts (which carries zod for its override fields) so the browser's submit path can read a
 * 409's checks without pulling zod into every page.
 */
export const READY_CHECK_IDS = ["parts-not-fitted", "open-faults", "no-passed-power-up"] as const;
export type ReadyCheckId = (typeof READY_CHECK_IDS)[number];

export interface ReadyIssue {
  id: ReadyCheckId;
  message: string;
}
