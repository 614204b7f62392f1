import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { breakLongToken } from "./break-long-text.ts";

describe("breakLongToken", () => {
  it("when the @example is run, then it gives the documented lines", () => {
    expect(breakLongToken("rowan.tessaly@homeowner.example", 16)).toBe("rowan.tessaly\n@homeowner.\nexample");
  });

  it("when the token fits, then it is left alone", () => {
    expect(breakLongToken("owner@tallgrass.example", 30)).toBe("owner@tallgrass.example");
  });

  it("when a piece has no break point, then it is cut at the limit", () => {
    expect(breakLongToken("a".repeat(25) + "@x.example", 10)).toBe("aaaaaaaaaa\naaaaaaaaaa\naaaaa@x.\nexample");
  });

  it("when any token is broken, then no line is longer than the limit and removing the breaks gives the token back", () => {
    fc.assert(fc.property(fc.string({ maxLength: 200 }).filter((s) => !s.includes("\n")), fc.integer({ min: 1, max: 60 }), (token, maxChars) => {
      const lines = breakLongToken(token, maxChars).split("\n");
      expect(lines.join("")).toBe(token);
      if (token.length > maxChars) for (const line of lines) expect(line.length).toBeLessThanOrEqual(maxChars);
    }));
  });
});
