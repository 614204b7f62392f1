import { describe, expect, it } from "vitest";
import type { VerifyAnswer } from "../api/types";
import { verdictOf } from "./verdict";

const when = (iso: string) => `[${iso}]`;
const doc = (over: Partial<Extract<VerifyAnswer, { matches: true }>["document"]>): VerifyAnswer => ({
  sha256: "a".repeat(64), matches: true,
  document: { kind: "sent", companyName: "Tallgrass Exteriors", revision: 2, changeOrderNumber: null, status: "sent", sentAt: "2026-12-01T10:00:00Z", signedAt: null, decidedAt: null, isSuperseded: false, ...over },
});

describe("verdictOf", () => {
  it("when nothing matches, then it says so and names nothing (no company, no revision)", () => {
    const v = verdictOf({ sha256: "b".repeat(64), matches: false }, when);
    expect(v.tone).toBe("critical");
    expect(v.title).toMatch(/^No match/);
    expect(v.details.join(" ")).not.toMatch(/revision \d|Tallgrass/);
  });

  it("when the signed copy matches, then it is the signed original, with its revision, company and signing time", () => {
    const v = verdictOf(doc({ kind: "signed", status: "accepted", signedAt: "2026-12-02T15:00:00Z" }), when);
    expect(v).toMatchObject({ tone: "ok", title: "This is the signed original" });
    expect(v.details.join(" ")).toContain("Proposal revision 2 from Tallgrass Exteriors, sent [2026-12-01T10:00:00Z].");
    expect(v.details.join(" ")).toContain("signed on [2026-12-02T15:00:00Z]");
  });

  it("when the copy as sent of a signed proposal matches, then it says it is not the signed copy", () => {
    const v = verdictOf(doc({ status: "accepted", signedAt: "2026-12-02T15:00:00Z" }), when);
    expect(v.tone).toBe("info");
    expect(v.title).toBe("This is the proposal as sent, before it was signed");
    expect(v.details.join(" ")).toMatch(/not the signed copy: the proposal was signed on \[2026-12-02T15:00:00Z\]/);
  });

  it("when a replaced revision matches, then it warns that a newer one exists", () => {
    expect(verdictOf(doc({ isSuperseded: true }), when)).toMatchObject({ tone: "warning", title: "This is an earlier revision that was replaced" });
  });

  it("when a change order matches, then it names its number and revision, and whether it was signed", () => {
    const unsigned = verdictOf(doc({ kind: "change-order", changeOrderNumber: 3, revision: 1 }), when);
    expect(unsigned.title).toMatch(/not signed yet/);
    expect(unsigned.details[0]).toBe("Change order 3 to revision 1 of the proposal from Tallgrass Exteriors, sent [2026-12-01T10:00:00Z].");
    const signed = verdictOf(doc({ kind: "change-order", changeOrderNumber: 3, status: "signed", signedAt: "2026-12-03T09:00:00Z" }), when);
    expect(signed).toMatchObject({ tone: "ok", title: "This change order matches our record, and it was signed" });
    expect(signed.details[1]).toContain("[2026-12-03T09:00:00Z]");
  });

  it("when a proposal was declined or expired, then the title says so", () => {
    expect(verdictOf(doc({ status: "declined", decidedAt: "2026-12-02T00:00:00Z" }), when).title).toMatch(/declined/);
    expect(verdictOf(doc({ status: "expired" }), when).title).toMatch(/expired unsigned/);
  });
});
