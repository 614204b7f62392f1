import { describe, expect, it } from "vitest";
import { waitingSummary } from "./waiting";

describe("waitingSummary", () => {
  it("when changes and photos wait, then both are counted in words", () => {
    expect(waitingSummary(3, 2)).toBe("3 changes and 2 photos waiting");
  });
  it("when one of each waits, then the words are singular", () => {
    expect(waitingSummary(1, 1)).toBe("1 change and 1 photo waiting");
  });
  it("when only photos wait, then only photos are named", () => {
    expect(waitingSummary(0, 4)).toBe("4 photos waiting");
  });
  it("when nothing waits, then there is nothing to say", () => {
    expect(waitingSummary(0, 0)).toBeNull();
  });
});
