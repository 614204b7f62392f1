import { rmSync } from "node:fs";
import path from "node:path";
import { freePort } from "../../scripts/lib/environment.ts";
import { runMigrations } from "../../scripts/lib/migrate.ts";
import { ensureCluster, ensureDatabase, startCluster, stopCluster, type ClusterConfig } from "../../scripts/lib/postgres.ts";

/**
 * A PostgreSQL cluster of the calling test file alone, migrated, for tests that stop the
 * database on purpose: the suite's shared test cluster (and any other run using it) is never
 * disturbed. Durable settings, so an immediate stop loses nothing that was committed.
 */
export async function startOwnCluster(label: string) {
  const cluster: ClusterConfig = { name: `${label}-${process.pid}`, port: await freePort(), isThrowaway: false };
  const info = ensureCluster(cluster);
  ensureDatabase(cluster, "eavesight");
  const databaseUrl = info.appUrl("eavesight");
  await runMigrations(databaseUrl);
  return {
    databaseUrl,
    stop: (mode: "fast" | "immediate" = "immediate") => stopCluster(cluster, mode),
    start: () => startCluster(cluster),
    /** Stops the cluster and deletes its files. */
    destroy() {
      stopCluster(cluster, "immediate");
      rmSync(path.dirname(info.dataDir), { recursive: true, force: true });
    },
  };
}
export type OwnCluster = Awaited<ReturnType<typeof startOwnCluster>>;
