import type { WarningLevel } from "@/lib/calc/types";
import { POWER_UP_CHECKLIST, type PowerUpChecklistId } from "@/lib/vocabulary";

/**
 * A bring-up's arithmetic: which steps went over the stop current, what the checklist left undone, the
 * points of the current-against-voltage plot, and whether the session may be marked passed. Pure, shared
 * by the query functions, the Power-ups tab and the bench sheet.
 */

export interface PowerUpWarning {
  level: WarningLevel;
  message: string;
}

export interface ChecklistWarning extends PowerUpWarning {
  id: PowerUpChecklistId;
}

export interface StepFigures {
  supplyVoltage: number;
  currentDrawn: number;
}

/** A step trips the limit only when the current drawn is above the stop current, not at it. */
export function isOverStop(currentDrawn: number, stopCurrent: number | null): boolean {
  return stopCurrent !== null && currentDrawn > stopCurrent;
}

/** Within this fraction below the stop current a step is flagged as close to it. */
export const NEAR_STOP = 0.9;

const amps = (a: number) => `${Number(a.toPrecision(3))} A`;

export function stepWarnings(step: StepFigures, stopCurrent: number | null): PowerUpWarning[] {
  if (stopCurrent === null) return [];
  if (isOverStop(step.currentDrawn, stopCurrent)) {
    return [
      {
        level: "danger",
        message: `Drew ${amps(step.currentDrawn)} at ${step.supplyVoltage} V, above the ${amps(stopCurrent)} stop current: switch off and find out why before going higher.`,
      },
    ];
  }
  if (step.currentDrawn >= NEAR_STOP * stopCurrent) {
    return [
      {
        level: "caution",
        message: `Drew ${amps(step.currentDrawn)}, within 10 % of the ${amps(stopCurrent)} stop current: go up in small steps and watch it.`,
      },
    ];
  }
  return [];
}

/** "Filter capacitors …" → "filter capacitors …", leaving "B+" and the rest as written. */
export const lowerFirst = (text: string) => text.charAt(0).toLowerCase() + text.slice(1);

/** The checklist is advice, not a gate: every unticked item is shown as not done. Null: a session moved from the Log, with no checklist. */
export function checklistWarnings(checklist: Partial<Record<PowerUpChecklistId, boolean>> | null): ChecklistWarning[] {
  if (checklist === null) return [];
  return POWER_UP_CHECKLIST.filter((c) => checklist[c.id] !== true).map((c) => ({
    id: c.id,
    level: "caution",
    message: `Not done before first power: ${lowerFirst(c.label)}.`,
  }));
}

export interface PlotPoint {
  supplyVoltage: number;
  currentDrawn: number;
  overStop: boolean;
}

/** The plot's points in the order the steps were taken (a step back down stays where it happened). */
export function plotPoints(steps: readonly StepFigures[], stopCurrent: number | null): PlotPoint[] {
  return steps.map((s) => ({ supplyVoltage: s.supplyVoltage, currentDrawn: s.currentDrawn, overStop: isOverStop(s.currentDrawn, stopCurrent) }));
}

/** 1, 2 or 5 times a power of ten, at or above x: a tidy top for a plot axis. */
export function niceCeiling(x: number): number {
  if (!(x > 0)) return 1;
  const p = 10 ** Math.floor(Math.log10(x));
  const m = [1, 2, 5, 10].find((k) => k * p >= x * (1 - 1e-12))!;
  return m * p;
}

/** The plot's axes: they always include the stop current, so its line is on the chart. */
export function plotData(steps: readonly StepFigures[], stopCurrent: number | null) {
  const points = plotPoints(steps, stopCurrent);
  const maxVoltage = niceCeiling(Math.max(0, ...points.map((p) => p.supplyVoltage)));
  const maxCurrent = niceCeiling(Math.max(0, stopCurrent ?? 0, ...points.map((p) => p.currentDrawn)));
  return { points, stopCurrent, maxVoltage, maxCurrent };
}

/**
 * Why a session may not be marked passed, or null: a step over the stop current needs a reason
 * (docs/PRODUCT.md "Power-ups"). Stopping needs none.
 */
export function outcomeRefusal(
  outcome: "passed" | "stopped",
  reason: string | null | undefined,
  steps: readonly StepFigures[],
  stopCurrent: number | null,
): string | null {
  if (outcome !== "passed" || (reason ?? "").trim()) return null;
  const over = steps.filter((s) => isOverStop(s.currentDrawn, stopCurrent)).length;
  if (!over) return null;
  return `${over === 1 ? "A step" : `${over} steps`} went over the ${amps(stopCurrent!)} stop current: say why the session still passed.`;
}
