/**
 * simulateAirflow on the 20-section attic of bench/core-fixture.ts (150 vent rows, the most a space
 * may hold; 18 powered fans), summer conditions, beside analyzeAttic on the same attic in the same
 * run: `npm run bench -- airflow-model`.
 * "Unchanged vents" reuses the vent objects between runs, as the survey does on a keystroke (the
 * core's per-vent NFA is kept per vent object); "every vent new" clones the attic before each run
 * (outside the timing), the worst case.
 */
import { simulateAirflow } from "../shared/airflow-model/index";
import { analyzeAttic } from "../shared/ventilation/index";
import { largeAttic } from "./core-fixture";

const input = largeAttic();
const summer = { outdoorTempF: 92, atticTempF: 130, houseTempF: 75 };

function time(label: string, runs: number, prepare: () => unknown, run: (x: never) => unknown): void {
  for (let i = 0; i < 200; i += 1) run(prepare() as never); // warm-up
  const samplesMs: number[] = [];
  for (let i = 0; i < runs; i += 1) {
    const x = prepare();
    const start = performance.now();
    run(x as never);
    samplesMs.push(performance.now() - start);
  }
  samplesMs.sort((a, b) => a - b);
  const at = (q: number) => samplesMs[Math.min(samplesMs.length - 1, Math.floor(q * samplesMs.length))]!;
  console.log(`${label.padEnd(52)} median ${at(0.5).toFixed(3)} ms · p99 ${at(0.99).toFixed(3)} ms · min ${samplesMs[0]!.toFixed(3)} ms`);
}

const result = simulateAirflow(input, summer);
console.log(`${input.vents.length} vent rows, ${result.openings.length} openings; fans ${result.fanCfm.toFixed(0)} cfm; attic ${result.atticPressurePa} Pa, house ${result.housePressurePa} Pa`);
time("simulateAirflow, unchanged vents", 2000, () => input, (x: typeof input) => simulateAirflow(x, summer));
time("simulateAirflow, every vent new", 1000, () => structuredClone(input), (x: typeof input) => simulateAirflow(x, summer));
time("baseline: analyzeAttic, same attic", 1000, () => input, (x: typeof input) => analyzeAttic(x));
