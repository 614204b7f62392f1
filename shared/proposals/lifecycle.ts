/**
 * When a proposal's link works, expires and earns a reminder. Pure: the time is passed in.
 */
import type { ProposalStatus } from "./types";

const DAY_MS = 86_400_000;

/**
 * A link works through its validity date everywhere in the US: it ends at 12:00 UTC the next
 * day (midnight in Hawaii, UTC−10, is 10:00 UTC), so no homeowner loses the last day.
 *
 * @example
 * linkExpiresAt("2026-12-31").toISOString() // "2027-01-01T12:00:00.000Z"
 */
export function linkExpiresAt(validUntil: string): Date {
  return new Date(Date.parse(`${validUntil}T12:00:00Z`) + DAY_MS);
}

/**
 * How far ahead a proposal may be valid. Prices and code editions move; a year is already longer than
 * contractors hold a price (common practice: 30 to 90 days). It also keeps every date the product
 * derives from it (link expiry, reminders) well inside what PostgreSQL and JavaScript dates hold.
 */
export const MAX_VALID_DAYS = 365;

/**
 * Why a validity date (YYYY-MM-DD, a real calendar date) can't be used today, or null when it can.
 *
 * @example
 * validUntilProblem("2027-01-15", "2026-12-03") // null
 * validUntilProblem("9999-12-31", "2026-12-03") // "The validity date is at most 365 days ahead (until 2027-12-03)."
 */
export function validUntilProblem(validUntil: string, todayIso: string): string | null {
  if (validUntil < todayIso) return "The validity date can't be in the past.";
  const latest = new Date(Date.parse(`${todayIso}T00:00:00Z`) + MAX_VALID_DAYS * DAY_MS).toISOString().slice(0, 10);
  if (validUntil > latest) return `The validity date is at most ${MAX_VALID_DAYS} days ahead (until ${latest}).`;
  return null;
}

export interface LinkFacts {
  status: ProposalStatus;
  supersededBy: string | null;
  tokenRevokedAt: Date | null;
  tokenExpiresAt: Date | null;
}

export type LinkState = "open" | "revoked" | "superseded" | "expired";

/** What the homeowner's link answers: revoked reads as unknown, a replaced or lapsed one says so. */
export function linkState(p: LinkFacts, now: Date): LinkState {
  if (p.tokenRevokedAt && p.tokenRevokedAt <= now) return "revoked";
  if (p.supersededBy) return "superseded";
  const isDecided = p.status === "accepted" || p.status === "declined";
  if (p.status === "expired" || (!isDecided && p.tokenExpiresAt !== null && p.tokenExpiresAt <= now)) return "expired";
  return "open";
}

/** A sent revision whose link has lapsed, with no decision: mark it expired. */
export function isDueToExpire(p: LinkFacts, now: Date): boolean {
  return (p.status === "sent" || p.status === "viewed") && !p.supersededBy && p.tokenExpiresAt !== null && p.tokenExpiresAt <= now;
}

export interface ReminderFacts extends LinkFacts {
  sentAt: Date | null;
  viewedAt: Date | null;
  reminderSentAt: Date | null;
}

/**
 * One reminder, when the link is still unopened `reminderDays` after sending and before it
 * expires; any decision, a view, a revocation or a new revision stops it.
 *
 * @example
 * reminderDecision({ status: "sent", sentAt: new Date("2026-12-01T10:00Z"), viewedAt: null, reminderSentAt: null,
 *   supersededBy: null, tokenRevokedAt: null, tokenExpiresAt: new Date("2027-01-01T12:00Z") }, new Date("2026-12-04T10:00Z"), 3)
 * // { shouldSend: true, reason: "unopened after 3 days" }
 */
export function reminderDecision(p: ReminderFacts, now: Date, reminderDays: number | null): { shouldSend: boolean; reason: string } {
  if (reminderDays === null) return { shouldSend: false, reason: "reminders are off" };
  if (p.reminderSentAt) return { shouldSend: false, reason: "already reminded" };
  if (p.status !== "sent" || p.viewedAt) return { shouldSend: false, reason: `the proposal is ${p.viewedAt && p.status === "sent" ? "viewed" : p.status}` };
  const state = linkState(p, now);
  if (state !== "open") return { shouldSend: false, reason: `the link is ${state}` };
  if (!p.sentAt || now.getTime() - p.sentAt.getTime() < reminderDays * DAY_MS) return { shouldSend: false, reason: "too early" };
  return { shouldSend: true, reason: `unopened after ${reminderDays} day${reminderDays === 1 ? "" : "s"}` };
}
