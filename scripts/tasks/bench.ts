/**
 * `npm run bench`: every `bench/*-bench.ts`, one after another, each printing its own figures.
 * Benchmarks that need PostgreSQL get a throwaway database in the test cluster. Figures are
 * printed, never asserted: speed is measured here, not in timed tests.
 */
import { spawn } from "node:child_process";
import { readdirSync } from "node:fs";
import path from "node:path";
import { prepareDatabase } from "../lib/environment.ts";
import { dropDatabase, testCluster } from "../lib/postgres.ts";
import { projectRoot, log } from "../lib/paths.ts";

const only = process.argv[2];
const files = readdirSync(path.join(projectRoot, "bench"))
  .filter((f) => f.endsWith("-bench.ts") && (!only || f.includes(only)))
  .sort();
const database = `eavesight_bench_${process.pid}`;
const { env } = await prepareDatabase("test", { recreate: true, database });
let failed = 0;
try {
  for (const file of files) {
    log(`── ${file} ──`);
    const status = await new Promise<number | null>((resolve) => {
      const child = spawn(process.execPath, ["--import", "tsx", path.join("bench", file)], { cwd: projectRoot, env: { ...env, EAVESIGHT_BENCH_DATABASE_URL: env.DATABASE_URL }, stdio: "inherit" });
      child.on("exit", resolve);
    });
    if (status !== 0) failed += 1;
  }
} finally {
  dropDatabase(testCluster(), database);
}
process.exit(failed ? 1 : 0);
