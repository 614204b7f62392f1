/**
 * Timing of generateOptions on three demo-like attics (a small ranch, an L-shape, a gable fan
 * beside a ridge vent) with the demo catalog: `npx tsx bench/generator-bench.ts`.
 * Prints the median and p99 in milliseconds for each.
 */
import { demoCatalog } from "../shared/design/demo-catalog.test-helpers";
import { fanAndRidge, lShape, smallRanch, SPACE_ID, zone4Project } from "../shared/design/design-cases.test-helpers";
import { generateOptions } from "../shared/design/index";

const catalog = demoCatalog();
const cases = [
  { name: "small ranch, 1,000 sq ft gable", space: smallRanch() },
  { name: "L-shape, two sections", space: lShape() },
  { name: "gable fan + ridge vent", space: fanAndRidge() },
];

for (const { name, space } of cases) {
  const input = { project: zone4Project, spaceId: SPACE_ID, space, catalog };
  for (let i = 0; i < 100; i += 1) generateOptions(input); // warm-up
  const samplesMs: number[] = [];
  for (let i = 0; i < 1000; i += 1) {
    const start = performance.now();
    generateOptions(input);
    samplesMs.push(performance.now() - start);
  }
  samplesMs.sort((a, b) => a - b);
  const at = (q: number) => samplesMs[Math.min(samplesMs.length - 1, Math.floor(q * samplesMs.length))]!;
  const result = generateOptions(input);
  console.log(`generateOptions — ${name}: ${result.options.length} options, ${result.skipped.length} skipped; ${samplesMs.length} runs`);
  console.log(`  median ${at(0.5).toFixed(3)} ms · p99 ${at(0.99).toFixed(3)} ms · min ${samplesMs[0]!.toFixed(3)} ms`);
}
