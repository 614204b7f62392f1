/**
 * The bench attic (20 sections, 150 vent rows) and variants of it (with 40 vent rows, to keep the
 * recording small) that reach the other code bases, the sealed-attic path and the site findings, for
 * the before/after comparison of issue 17.
 * `npx tsx tests/setup/frozen-core/bench-fixtures.ts` re-records `bench-fixture-analyses.json` from the
 * frozen core (the committed file was recorded from the live core at 3600f6f, before the change).
 */
import { writeFileSync } from "node:fs";
import type { AtticInput } from "../../../shared/ventilation/index";
import { largeAttic } from "../../../bench/core-fixture";
import { analyzeAttic as analyzeBefore } from "./analyze-attic-3600f6f.mjs";

export function benchFixtures(): Record<string, AtticInput> {
  const base = largeAttic(40);
  return {
    "bench attic": largeAttic(),
    "bench attic, 40 vent rows": base,
    "40 rows, IRC 2009": { ...base, codeBasis: "irc-2009" },
    "40 rows, IRC 2012, class I retarder, light roof": { ...base, codeBasis: "irc-2012", ceilingVaporRetarder: "class-I", roofColor: "light", climateZone: 3 },
    "40 rows, strict 1/150, every site flag": {
      ...base,
      codeBasis: "strict-150",
      site: { atmosphericCombustionAppliance: false, gableFanSealed: false, soffitsBlocked: true, bafflesPresent: false, bathFanIntoAttic: true, kitchenOrDryerIntoAttic: true, ceilingAirSealed: true },
    },
    "40 rows, upper share of provided area, rafter bays": { ...base, upperShareBase: "provided", enclosedRafterBays: { bayCount: 40, baySpacingIn: 24 } },
    "40 rows, sealed": {
      ...base,
      assembly: "unvented",
      unvented: { insulation: "air-impermeable-and-air-permeable", airImpermeableRValue: 10, isInsideThermalEnvelope: true, roofCovering: "asphalt-shingles" },
      moistureRegime: "B",
    },
  };
}

export const RECORDED_ANALYSES_PATH = new URL("./bench-fixture-analyses.json", import.meta.url);

if (import.meta.url === `file://${process.argv[1]}`) {
  const analyses = Object.fromEntries(Object.entries(benchFixtures()).map(([name, input]) => [name, analyzeBefore(input)]));
  writeFileSync(RECORDED_ANALYSES_PATH, `${JSON.stringify(analyses)}\n`);
  console.log(`recorded ${Object.keys(analyses).length} analyses`);
}
