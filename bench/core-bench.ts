/**
 * Standalone timing of analyzeAttic on a 20-section, 200-vent attic: `npx tsx bench/core-bench.ts`.
 * Prints median and p99 in milliseconds.
 */
import { analyzeAttic } from "../shared/ventilation/index";
import { largeAttic } from "./core-fixture";

const input = largeAttic();
for (let i = 0; i < 200; i += 1) analyzeAttic(input); // warm-up

const samplesMs: number[] = [];
for (let i = 0; i < 2000; i += 1) {
  const start = performance.now();
  analyzeAttic(input);
  samplesMs.push(performance.now() - start);
}
samplesMs.sort((a, b) => a - b);
const at = (q: number) => samplesMs[Math.min(samplesMs.length - 1, Math.floor(q * samplesMs.length))]!;
const analysis = analyzeAttic(input);
console.log(`analyzeAttic (20 sections, 200 vents, ${analysis.findings.length} findings): ${samplesMs.length} runs`);
console.log(`median ${at(0.5).toFixed(3)} ms · p99 ${at(0.99).toFixed(3)} ms · min ${samplesMs[0]!.toFixed(3)} ms`);
