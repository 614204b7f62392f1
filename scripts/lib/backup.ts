/**
 * Backups of the project's own PostgreSQL (issue 9): pg_dump's custom format (-Fc) and pg_restore
 * from Debian's packages (the same bin folder as the cluster's server), run as the app role over
 * 127.0.0.1 with the password in the environment, never on the command line.
 */
import { spawn } from "node:child_process";
import { closeSync, existsSync, mkdirSync, openSync, readSync, statSync } from "node:fs";
import path from "node:path";
import { dropDatabase, ensureCluster, ensureDatabase, pgBinDir, type ClusterConfig } from "./postgres.ts";
import { projectRoot } from "./paths.ts";

export interface BackupOptions {
  cluster: ClusterConfig;
  database: string;
  /** Where the dump goes; by default `.var/backups/<database>-<UTC time>.dump`. */
  file?: string;
  /** An exported snapshot (`pg_export_snapshot()`), so the dump sees exactly what that transaction sees. */
  snapshot?: string;
}

export interface RestoreOptions {
  cluster: ClusterConfig;
  /** The database to restore into; created (owned by the app role) when missing. */
  database: string;
  file: string;
}

/** The default development / test database names (scripts/lib/environment.ts). */
export const defaultDatabase = (cluster: ClusterConfig) => (cluster.name === "dev" ? "eavesight" : "eavesight_test");

export function defaultBackupFile(database: string, now = new Date()): string {
  const stamp = now.toISOString().replace(/[:.]/g, "-");
  return path.join(projectRoot, ".var", "backups", `${database}-${stamp}.dump`);
}

function assertDatabaseName(database: string): void {
  if (!/^[a-z_][a-z0-9_]*$/.test(database)) throw new Error(`"${database}" is not a database name this script accepts (lower-case letters, digits, _).`);
}

/** Connection flags and environment for the app role on the cluster (started when it is not running). */
function connection(cluster: ClusterConfig, database: string) {
  const url = new URL(ensureCluster(cluster).appUrl(database));
  return {
    args: ["-h", url.hostname, "-p", url.port, "-U", decodeURIComponent(url.username), "-d", database],
    env: { ...process.env, PGPASSWORD: decodeURIComponent(url.password), PGCONNECT_TIMEOUT: "10" },
  };
}

function run(tool: string, args: string[], env: NodeJS.ProcessEnv): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(path.join(pgBinDir(), tool), args, { env, stdio: ["ignore", "inherit", "pipe"] });
    let stderr = "";
    child.stderr.on("data", (chunk: Buffer) => (stderr += chunk.toString()));
    child.on("error", reject);
    child.on("close", (code) => (code === 0 ? resolve() : reject(new Error(`${tool} failed (exit ${code}):\n${stderr.trim()}`))));
  });
}

/** Writes a custom-format dump of the database; returns the file and its size. */
export async function backupDatabase(opts: BackupOptions): Promise<{ file: string; bytes: number }> {
  assertDatabaseName(opts.database);
  const file = path.resolve(opts.file ?? defaultBackupFile(opts.database));
  mkdirSync(path.dirname(file), { recursive: true });
  const { args, env } = connection(opts.cluster, opts.database);
  await run("pg_dump", ["-Fc", "--no-owner", "--no-privileges", ...(opts.snapshot ? [`--snapshot=${opts.snapshot}`] : []), "-f", file, ...args], env);
  return { file, bytes: statSync(file).size };
}

/** A pg_dump custom-format archive starts with these bytes. */
function isCustomDump(file: string): boolean {
  const fd = openSync(file, "r");
  try {
    const head = Buffer.alloc(5);
    readSync(fd, head, 0, 5, 0);
    return head.toString("latin1") === "PGDMP";
  } finally {
    closeSync(fd);
  }
}

/**
 * Restores a dump into the named database, replacing what it held. pg_restore --clean --if-exists
 * cannot clean in place here: pg-boss's partitioned tables refuse DROP CONSTRAINT on their partitions.
 * So the dump is restored (in one transaction, stopping at the first error) into a fresh staging
 * database, and only when that succeeded does the staging database replace the target. On any
 * error the target is left exactly as it was. Connections to the target are closed by the swap.
 */
export async function restoreDatabase(opts: RestoreOptions): Promise<void> {
  assertDatabaseName(opts.database);
  const file = path.resolve(opts.file);
  if (!existsSync(file)) throw new Error(`No backup file at ${file}.`);
  if (!isCustomDump(file)) throw new Error(`${file} is not a pg_dump custom-format backup (made by \`npm run db:backup\`).`);
  ensureCluster(opts.cluster);
  const staging = `${opts.database.slice(0, 50)}_restoring`;
  dropDatabase(opts.cluster, staging);
  ensureDatabase(opts.cluster, staging);
  try {
    const target = connection(opts.cluster, staging);
    await run("pg_restore", ["--clean", "--if-exists", "--no-owner", "--no-privileges", "--single-transaction", "--exit-on-error", ...target.args, file], target.env);
  } catch (err) {
    dropDatabase(opts.cluster, staging);
    throw err;
  }
  dropDatabase(opts.cluster, opts.database);
  // The app role owns the staging database (and may create databases), so it may rename it.
  const admin = connection(opts.cluster, "postgres");
  await run("psql", [...admin.args, "-v", "ON_ERROR_STOP=1", "-qc", `alter database ${staging} rename to ${opts.database}`], admin.env);
}
