import { describe, expect, it } from "vitest";
import { depositFor, depositToRule, ruleToDraft } from "./deposit";

describe("the proposal's deposit", () => {
  it("when a percent with a cap is typed, then the rule is exact", () => {
    expect(depositToRule({ mode: "percent", value: "12.5", cap: "1,000" })).toEqual({ ok: true, value: { kind: "percent", value: 12.5, capCents: 100_000 } });
    expect(depositToRule({ mode: "amount", value: "$500", cap: "" })).toEqual({ ok: true, value: { kind: "amount", value: 50_000, capCents: null } });
  });
  it("when no deposit is chosen, then a zero amount is sent (null would mean the company's rule)", () => {
    expect(depositToRule({ mode: "none", value: "", cap: "" })).toEqual({ ok: true, value: { kind: "amount", value: 0, capCents: null } });
    expect(ruleToDraft({ kind: "amount", value: 0, capCents: null }).mode).toBe("none");
    expect(ruleToDraft(null).mode).toBe("company");
  });
  it("when the text is wrong, then it says so", () => {
    expect(depositToRule({ mode: "percent", value: "150", cap: "" }).ok).toBe(false);
    expect(depositToRule({ mode: "amount", value: "lots", cap: "" }).ok).toBe(false);
  });
  it("when 10 % is capped at $1,000, then a $15,000 job asks $1,000", () => {
    expect(depositFor(1_500_000, { kind: "percent", value: 10, capCents: 100_000 })).toBe(100_000);
    expect(depositFor(500_000, { kind: "percent", value: 10, capCents: 100_000 })).toBe(50_000);
  });
});
