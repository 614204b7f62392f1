import { describe, expect, it } from "vitest";
import { FINDING_CODES } from "../ventilation/findings";
import { homeownerTitle } from "./homeowner-words";

describe("homeowner words for the new findings", () => {
  it.each([
    "meets-minimum-narrowly",
    "vents-blocked",
    "unvented-assembly",
    "vents-in-unvented-attic",
    "whole-house-fan-outlet-short",
    "whole-house-fan-operation",
    "fan-control-cold-climate",
    "fan-winding-shorted",
    "fan-winding-grounded",
  ] as const)("when a proposal shows %s, then it has a plain title of its own, not the trade title", (code) => {
    expect(FINDING_CODES).toContain(code);
    expect(homeownerTitle(code, "TRADE TITLE")).not.toBe("TRADE TITLE");
  });
  it("when the sealed-attic finding is shown to a homeowner, then it says no vents are needed", () => {
    expect(homeownerTitle("unvented-assembly", "")).toMatch(/needs no vents/);
  });
});
