import { spawn } from "node:child_process";
import { rmSync } from "node:fs";
import path from "node:path";
import { freePort } from "../../scripts/lib/environment.ts";
import { runMigrations } from "../../scripts/lib/migrate.ts";
import { ensureCluster, ensureDatabase, stopCluster, type ClusterConfig } from "../../scripts/lib/postgres.ts";

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
    stop: (mode: "fast" | "immediate" = "immediate") => inChildProcess("stopCluster", cluster, mode),
    start: () => inChildProcess("startCluster", cluster),
    /** Stops the cluster and deletes its files. */
    destroy() {
      stopCluster(cluster, "immediate");
      rmSync(path.dirname(info.dataDir), { recursive: true, force: true });
    },
  };
}
/**
 * Runs pg_ctl (through scripts/lib/postgres.ts) in a child process, so this test process keeps
 * serving its own sockets meanwhile. Run in-process, the synchronous pg_ctl blocked the test's event
 * loop for as long as a start takes on a loaded machine (9-12 s seen); the server meanwhile closed
 * the client's idle keep-alive sockets (5 s), and the stalled client then sent on closed sockets:
 * "other side closed", a failure of the test's own making, not of the app.
 */
async function inChildProcess(fn: "stopCluster" | "startCluster", ...args: unknown[]): Promise<void> {
  const module = new URL("../../scripts/lib/postgres.ts", import.meta.url).href;
  const code = `const m = await import(${JSON.stringify(module)}); m.${fn}(...${JSON.stringify(args)});`;
  const child = spawn(process.execPath, ["--import", "tsx", "--input-type=module", "-e", code], { stdio: ["ignore", "inherit", "inherit"] });
  const status = await new Promise<number | null>((resolve, reject) => {
    child.once("error", reject);
    child.once("exit", resolve);
  });
  if (status !== 0) throw new Error(`${fn} failed in its child process (exit ${status})`);
}

export type OwnCluster = Awaited<ReturnType<typeof startOwnCluster>>;
