/**
 * A database holding the seeded demo (Tallgrass Exteriors), for benchmarks that change it (they
 * send proposals): `npm run bench` hands over a throwaway one in EAVESIGHT_BENCH_DATABASE_URL; run
 * directly, a bench gets its own in the test cluster, dropped by `drop()`, so the shared test
 * database keeps its demo exactly as the suite expects it.
 */
import { prepareDatabase } from "../scripts/lib/environment.ts";
import { dropDatabase, testCluster } from "../scripts/lib/postgres.ts";
import { seedDemo } from "../scripts/lib/seed.ts";

export interface DemoDatabase {
  databaseUrl: string;
  drop(): void;
}

export async function demoDatabase(benchName: string): Promise<DemoDatabase> {
  const given = process.env.EAVESIGHT_BENCH_DATABASE_URL;
  if (given) {
    await seedDemo(given);
    return { databaseUrl: given, drop: () => {} };
  }
  const database = `eavesight_bench_${benchName.replace(/[^a-z0-9]/g, "_")}_${process.pid}`;
  const { databaseUrl } = await prepareDatabase("test", { recreate: true, database });
  await seedDemo(databaseUrl);
  return { databaseUrl, drop: () => dropDatabase(testCluster(), database) };
}
