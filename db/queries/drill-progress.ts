import { and, asc, eq, inArray, isNotNull } from "drizzle-orm";
import { assertCan, type Member } from "@/lib/auth/can";
import { meanMastery, progressByKind, progressTimeline, type AnsweredDrill } from "@/lib/drills/progress";
import { getDb } from "../client";
import { drills, memberships, users } from "../schema";
import { findApprentice, type WorkshopPerson } from "./drill-rows";

/**
 * Progress and mastery: a member's own, and for owners and technicians any apprentice of their workshop.
 * Apprentices asking for someone else are refused (403); a user outside the workshop is never found (404).
 */

function whose(member: Member, userId: number | undefined): WorkshopPerson {
  if (userId === undefined || userId === member.userId) return { userId: member.userId, name: member.name, role: member.role };
  assertCan(member, "followDrills");
  return findApprentice(member, userId);
}

function answersOf(workshopId: number, userIds: number[]): (AnsweredDrill & { userId: number })[] {
  if (userIds.length === 0) return [];
  return getDb()
    .select({ userId: drills.userId, kind: drills.kind, correct: drills.correct, at: drills.answeredAt })
    .from(drills)
    .where(and(eq(drills.workshopId, workshopId), inArray(drills.userId, userIds), isNotNull(drills.answeredAt)))
    .orderBy(asc(drills.answeredAt))
    .all()
    .map((r) => ({ userId: r.userId, kind: r.kind, correct: r.correct === true, at: r.at as Date }));
}

function summary(answers: readonly AnsweredDrill[]) {
  const kinds = progressByKind(answers);
  return {
    attempts: answers.length,
    correct: answers.filter((a) => a.correct).length,
    kindsTried: kinds.length,
    mastery: meanMastery(kinds),
    lastAnsweredAt: answers.length ? answers[answers.length - 1].at.toISOString() : null,
  };
}

/** `GET /api/drills/progress?member=`: per kind attempts, correct and mastery, totals, and a point per day for the plot. */
export function drillProgress(member: Member, userId?: number) {
  assertCan(member, "doDrills");
  const person = whose(member, userId);
  const answers = answersOf(member.workshopId, [person.userId]);
  return {
    member: person,
    totals: summary(answers),
    kinds: progressByKind(answers),
    timeline: progressTimeline(answers),
  };
}
export type DrillProgress = ReturnType<typeof drillProgress>;

/** For owners and technicians: every apprentice of the workshop with their totals. */
export function apprenticesProgress(member: Member) {
  assertCan(member, "followDrills");
  const apprentices = getDb()
    .select({ userId: users.id, name: users.name })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.workshopId, member.workshopId), eq(memberships.role, "apprentice")))
    .orderBy(asc(users.name))
    .all();
  const answers = answersOf(
    member.workshopId,
    apprentices.map((a) => a.userId),
  );
  return apprentices.map((a) => ({ ...a, ...summary(answers.filter((x) => x.userId === a.userId)) }));
}
export type ApprenticeProgress = ReturnType<typeof apprenticesProgress>[number];
