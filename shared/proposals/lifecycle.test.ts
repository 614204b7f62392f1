import { describe, expect, it } from "vitest";
import { isDueToExpire, linkExpiresAt, linkState, MAX_VALID_DAYS, reminderDecision, validUntilProblem, type ReminderFacts } from "./lifecycle";

const sent: ReminderFacts = {
  status: "sent", sentAt: new Date("2026-12-01T10:00:00Z"), viewedAt: null, reminderSentAt: null,
  supersededBy: null, tokenRevokedAt: null, tokenExpiresAt: linkExpiresAt("2026-12-31"),
};

describe("proposal lifecycle", () => {
  it("when the validity date is given, then the link lasts through that day in every US time zone", () => {
    expect(linkExpiresAt("2026-12-31").toISOString()).toBe("2027-01-01T12:00:00.000Z");
  });

  it("when time passes, then the link goes from open to expired, and a decided proposal stays readable", () => {
    expect(linkState(sent, new Date("2026-12-31T23:00:00Z"))).toBe("open");
    expect(linkState(sent, new Date("2027-01-01T12:00:00Z"))).toBe("expired");
    expect(linkState({ ...sent, status: "accepted" }, new Date("2027-02-01T00:00:00Z"))).toBe("open");
    expect(linkState({ ...sent, supersededBy: "x" }, new Date("2026-12-02T00:00:00Z"))).toBe("superseded");
    expect(linkState({ ...sent, tokenRevokedAt: new Date("2026-12-02T00:00:00Z") }, new Date("2026-12-03T00:00:00Z"))).toBe("revoked");
    expect(isDueToExpire(sent, new Date("2027-01-01T12:00:00Z"))).toBe(true);
    expect(isDueToExpire({ ...sent, status: "declined" }, new Date("2027-01-02T00:00:00Z"))).toBe(false);
  });

  it("when the proposal is unopened after N days, then one reminder is due, and any view or decision stops it", () => {
    expect(reminderDecision(sent, new Date("2026-12-03T10:00:00Z"), 3)).toEqual({ shouldSend: false, reason: "too early" });
    expect(reminderDecision(sent, new Date("2026-12-04T10:00:00Z"), 3)).toEqual({ shouldSend: true, reason: "unopened after 3 days" });
    expect(reminderDecision({ ...sent, status: "viewed", viewedAt: new Date("2026-12-02T00:00:00Z") }, new Date("2026-12-05T00:00:00Z"), 3).shouldSend).toBe(false);
    expect(reminderDecision({ ...sent, status: "declined" }, new Date("2026-12-05T00:00:00Z"), 3).shouldSend).toBe(false);
    expect(reminderDecision({ ...sent, reminderSentAt: new Date("2026-12-04T11:00:00Z") }, new Date("2026-12-06T00:00:00Z"), 3).shouldSend).toBe(false);
    expect(reminderDecision(sent, new Date("2027-01-02T00:00:00Z"), 3)).toEqual({ shouldSend: false, reason: "the link is expired" });
    expect(reminderDecision(sent, new Date("2026-12-20T00:00:00Z"), null).shouldSend).toBe(false);
  });
});

describe("validUntilProblem", () => {
  it("when the date is today up to a year ahead, then it is accepted; before today or past a year, then it says why", () => {
    expect(validUntilProblem("2026-12-03", "2026-12-03")).toBeNull();
    expect(validUntilProblem("2027-01-15", "2026-12-03")).toBeNull();
    expect(validUntilProblem("2027-12-03", "2026-12-03")).toBeNull();
    expect(validUntilProblem("2026-12-02", "2026-12-03")).toBe("The validity date can't be in the past.");
    expect(validUntilProblem("2027-12-04", "2026-12-03")).toBe(`The validity date is at most ${MAX_VALID_DAYS} days ahead (until 2027-12-03).`);
    expect(validUntilProblem("9999-12-31", "2026-12-03")).toBe("The validity date is at most 365 days ahead (until 2027-12-03).");
  });
});
