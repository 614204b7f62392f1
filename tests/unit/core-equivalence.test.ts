/**
 * The faster core (issue 17) answers exactly what the core answered before: every field, every
 * sentence, the key order of the JSON the API sends and the verdict, on the bench attics (against
 * the analyses recorded at 3600f6f, before the change) and on random attics (against the frozen copy
 * of that core in tests/setup/frozen-core).
 */
import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { analyzeAttic, analyzeParsedAttic, AtticInputSchema, ParsedAtticSchema, tryAnalyzeAttic } from "../../shared/ventilation/index";
import { atticArb } from "../../shared/ventilation/arbitraries.test-helpers";
import { analyzeAttic as analyzeBefore } from "../setup/frozen-core/analyze-attic-3600f6f.mjs";
import { benchFixtures, RECORDED_ANALYSES_PATH } from "../setup/frozen-core/bench-fixtures";

const recorded = JSON.parse(readFileSync(RECORDED_ANALYSES_PATH, "utf8")) as Record<string, unknown>;

describe("analyzeAttic before and after issue 17", () => {
  for (const [name, input] of Object.entries(benchFixtures())) {
    it(`when the ${name} is analysed, then the JSON is the one recorded before the change, byte for byte`, () => {
      expect(JSON.stringify(analyzeAttic(input))).toBe(JSON.stringify(recorded[name]));
      expect(JSON.stringify(analyzeParsedAttic(ParsedAtticSchema.parse(input)))).toBe(JSON.stringify(recorded[name]));
      // The frozen copy is the core that made the recording.
      expect(JSON.stringify(analyzeBefore(input))).toBe(JSON.stringify(recorded[name]));
    });
  }

  it("when any valid attic is analysed, then the result equals the old core's, field for field and in JSON", () => {
    fc.assert(
      fc.property(atticArb(40), (input) => {
        const before = analyzeBefore(input);
        const after = analyzeAttic(input);
        expect(after).toStrictEqual(before);
        expect(JSON.stringify(after)).toBe(JSON.stringify(before));
        // The trusting entry, on the same input parsed once at the boundary, and the form's entry.
        const trusted = analyzeParsedAttic(ParsedAtticSchema.parse(input));
        expect(trusted).toStrictEqual(before);
        expect(JSON.stringify(trusted)).toBe(JSON.stringify(before));
        expect(tryAnalyzeAttic(input)).toStrictEqual({ ok: true, analysis: before });
      }),
      { numRuns: 300 },
    );
  });

  it("when the input is invalid, then both cores refuse it with the same issues", () => {
    fc.assert(
      fc.property(atticArb(4), fc.constantFrom("sections", "vents", "climateZone"), (input, broken) => {
        const bad = { ...input, [broken]: broken === "climateZone" ? 9 : [] } as typeof input;
        if (AtticInputSchema.safeParse(bad).success) return;
        const issues = (run: () => unknown) => {
          try {
            run();
          } catch (error) {
            return (error as { issues?: unknown }).issues;
          }
          return "no error";
        };
        expect(issues(() => analyzeAttic(bad))).toStrictEqual(issues(() => analyzeBefore(bad)));
        expect(tryAnalyzeAttic(bad).ok).toBe(false);
      }),
      { numRuns: 50 },
    );
  });
});
