import { describe, expect, it } from "vitest";
import { toAtticInput } from "../survey/to-attic-input";
import { analyzeAttic } from "../ventilation/index";
import { analyzeOption } from "./analyze-option";
import { DEMO_IDS, demoCatalog } from "./demo-catalog.test-helpers";
import { blockedSoffits, SPACE_ID, zone4Project } from "./design-cases.test-helpers";

describe("analyzeOption (the TSDoc example)", () => {
  it("when an option clears blocked soffits, then the analysis of the attic after the work is compliant while the survey's is not", () => {
    const space = blockedSoffits();
    expect(analyzeAttic(toAtticInput(zone4Project, space)).compliant).toBe(false);
    const { applied, analysis } = analyzeOption(
      zone4Project,
      space,
      { spaceId: SPACE_ID, ventActions: {}, added: [{ id: "b", catalogItemId: DEMO_IDS.baffle, quantity: 36 }], siteFixes: { clearsBlockedSoffits: true } },
      demoCatalog(),
    );
    expect(applied.site.soffitsBlocked).toBe(false);
    expect(analysis.compliant).toBe(true);
    expect(analysis.findings.map((f) => f.code)).not.toContain("soffits-blocked");
  });
});
