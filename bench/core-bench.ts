/**
 * analyzeAttic on a 20-section attic, each figure beside the goal (issue 17: ≤ 100 µs median in Node)
 * and beside the core as it was before issue 17 (the frozen copy in tests/setup/frozen-core), timed
 * in the same run, in alternating blocks so a busy machine slows both alike:
 * `npm run bench -- core` (or `npx tsx bench/core-bench.ts`).
 *
 * - "trusted": analyzeParsedAttic on input parsed once at the boundary (what the server and the
 *   client's live panel run);
 * - "validating": analyzeAttic, which parses the input first (for callers holding raw input);
 * - "parse": the schema alone, which the boundary pays once.
 * The attic has 150 vent rows, the most a space may hold (decision 27); the 200-row attic issue 17
 * measured no longer validates, so it is timed through the trusted entry only.
 */
import { analyzeAttic, analyzeParsedAttic, ParsedAtticSchema, type ParsedAttic } from "../shared/ventilation/index";
import { analyzeAttic as analyzeBefore } from "../tests/setup/frozen-core/analyze-attic-3600f6f.mjs";
import { largeAttic } from "./core-fixture";

const GOAL_US = 100;
const RUNS = 3000;
const WARM_UP = 300;
const BLOCK = 50;

const input = largeAttic();
const parsed = ParsedAtticSchema.parse(input);
// Beyond the 150-row limit, so not parseable: the fixture is otherwise schema-clean (no text to trim).
const input200 = largeAttic(200) as ParsedAttic;

// The figures are only worth comparing if the answers are the same.
const before = JSON.stringify(analyzeBefore(input));
const isSame = JSON.stringify(analyzeAttic(input)) === before && JSON.stringify(analyzeParsedAttic(parsed)) === before;
if (!isSame) throw new Error("The core's answer differs from the core before issue 17: fix that before timing it.");

const candidates: { label: string; run: () => unknown; samplesUs: number[] }[] = [
  { label: "before issue 17 (validating)", run: () => analyzeBefore(input), samplesUs: [] },
  { label: "validating: analyzeAttic", run: () => analyzeAttic(input), samplesUs: [] },
  { label: "trusted: analyzeParsedAttic", run: () => analyzeParsedAttic(parsed), samplesUs: [] },
  { label: "parse alone: ParsedAtticSchema", run: () => ParsedAtticSchema.parse(input), samplesUs: [] },
  { label: "trusted, 200 vent rows", run: () => analyzeParsedAttic(input200), samplesUs: [] },
];

for (let i = 0; i < WARM_UP; i += 1) for (const c of candidates) c.run();
// Blocks of BLOCK runs, taking turns: a busy spell on the machine falls on every candidate alike,
// while the old core's garbage (megabytes a run) is mostly collected inside its own block.
for (let done = 0; done < RUNS; done += BLOCK) {
  for (const c of candidates) {
    for (let i = 0; i < BLOCK; i += 1) {
      const start = performance.now();
      c.run();
      c.samplesUs.push((performance.now() - start) * 1000);
    }
  }
}

const quantile = (samples: number[], q: number) => samples[Math.min(samples.length - 1, Math.floor(q * samples.length))]!;
const baselineUs = (() => {
  const s = [...candidates[0]!.samplesUs].sort((a, b) => a - b);
  return quantile(s, 0.5);
})();
const analysis = analyzeParsedAttic(parsed);
console.log(
  `analyzeAttic, 20 sections, 150 vent rows (${analysis.findings.length} findings, ${Math.round(before.length / 1024)} KiB of JSON, the same as before issue 17): ${RUNS} runs each in alternating blocks of ${BLOCK}`,
);
for (const c of candidates) {
  const s = c.samplesUs.sort((a, b) => a - b);
  const median = quantile(s, 0.5);
  const isBaseline = c === candidates[0];
  const goal = c.label.startsWith("trusted") ? ` · goal ≤ ${GOAL_US} µs: ${median <= GOAL_US ? "met" : "NOT met"}` : "";
  const ratio = isBaseline || c.label.startsWith("trusted, 200") || c.label.startsWith("parse") ? "" : ` · ${(median / baselineUs).toFixed(3)}× before (${(baselineUs / median).toFixed(1)} times faster)`;
  console.log(`${c.label.padEnd(32)} median ${median.toFixed(1).padStart(7)} µs · p99 ${quantile(s, 0.99).toFixed(1).padStart(7)} µs${goal}${ratio}`);
}
