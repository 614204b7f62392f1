/**
 * Backups of the project's own PostgreSQL (issue 9): pg_dump's custom format (-Fc) and pg_restore
 * from Debian's packages (the same bin folder as the cluster's server), run as the app role over
 * 127.0.0.1 with the password in the environment, never on the command line.
 *
 * Issue 13: `db:backup` writes one archive (`.tar.gz`, mode 0600) holding the database dump and every
 * stored file (local folder or S3 bucket), so a restore brings photos and PDFs back with their rows.
 * The dump leaves out the data of `sessions` and `password_resets` (a stolen backup signs no one in),
 * and every restore empties both tables again, so an older dump cannot bring them back either.
 */
import { spawn } from "node:child_process";
import { chmodSync, closeSync, createWriteStream, existsSync, mkdirSync, mkdtempSync, openSync, readSync, renameSync, rmSync, statSync, writeFileSync, readFileSync } from "node:fs";
import { mkdir, readdir, readFile, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { pipeline } from "node:stream/promises";
import path from "node:path";
import type { Storage } from "../../server/lib/storage/index.ts";
import { readAll } from "../../server/lib/storage/index.ts";
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
  return path.join(projectRoot, ".var", "backups", `${database}-${stamp}.tar.gz`);
}

/** Tables whose rows are secrets that let someone in: never in a backup, emptied by every restore. */
export const SECRET_TABLES = ["sessions", "password_resets"] as const;
const ARCHIVE_FORMAT = "eavesight-backup-1";

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
    const child = spawn(tool.includes("/") ? tool : path.join(pgBinDir(), tool), args, { env, stdio: ["ignore", "inherit", "pipe"] });
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
  const secrets = SECRET_TABLES.map((t) => `--exclude-table-data=${t}`);
  await run("pg_dump", ["-Fc", "--no-owner", "--no-privileges", ...secrets, ...(opts.snapshot ? [`--snapshot=${opts.snapshot}`] : []), "-f", file, ...args], env);
  chmodSync(file, 0o600);
  return { file, bytes: statSync(file).size };
}

export interface ArchiveBackupOptions extends BackupOptions {
  /** The file store whose every object goes into the archive. */
  storage: Storage;
}

/** What a file's extension says it holds (S3 keeps a content type; keys are ours, so the extension is reliable). */
const CONTENT_TYPES: Record<string, string> = { jpg: "image/jpeg", jpeg: "image/jpeg", png: "image/png", webp: "image/webp", pdf: "application/pdf" };
const contentTypeOf = (key: string) => CONTENT_TYPES[key.split(".").pop()?.toLowerCase() ?? ""] ?? "application/octet-stream";

/**
 * One archive of the database and the file store: `database.dump`, `files/<key>…` and a
 * `manifest.json`, packed by Debian's tar and gzip into a file only its owner can read (0600, in a
 * 0700 folder). Files are listed after the dump is taken, so every row's file is there (a file
 * added meanwhile is an orphan, harmless).
 */
export async function backupArchive(opts: ArchiveBackupOptions): Promise<{ file: string; bytes: number; fileCount: number }> {
  assertDatabaseName(opts.database);
  const file = path.resolve(opts.file ?? defaultBackupFile(opts.database));
  mkdirSync(path.dirname(file), { recursive: true, mode: 0o700 });
  const work = mkdtempSync(path.join(tmpdir(), "eavesight-backup-"));
  try {
    await backupDatabase({ ...opts, file: path.join(work, "database.dump") });
    let fileCount = 0;
    for await (const key of opts.storage.list()) {
      const object = await opts.storage.get(key);
      if (!object) continue; // deleted while we listed
      const target = path.join(work, "files", ...key.split("/"));
      await mkdir(path.dirname(target), { recursive: true });
      await writeFile(target, await readAll(object), { mode: 0o600 });
      fileCount++;
    }
    writeFileSync(path.join(work, "manifest.json"), JSON.stringify({ format: ARCHIVE_FORMAT, database: opts.database, createdAt: new Date().toISOString(), fileCount }, null, 2));
    const partial = `${file}.part`;
    // The archive is created 0600 before a byte is written, so it is never readable by others.
    const tar = spawn("/usr/bin/tar", ["-czf", "-", "-C", work, "."], { stdio: ["ignore", "pipe", "pipe"] });
    let stderr = "";
    tar.stderr.on("data", (c: Buffer) => (stderr += c.toString()));
    const exited = new Promise<number | null>((resolve, reject) => {
      tar.on("error", reject);
      tar.on("close", resolve);
    });
    await pipeline(tar.stdout, createWriteStream(partial, { mode: 0o600 }));
    const code = await exited;
    if (code !== 0) throw new Error(`tar failed (exit ${code}): ${stderr.trim()}`);
    chmodSync(partial, 0o600);
    renameSync(partial, file);
    return { file, bytes: statSync(file).size, fileCount };
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}

export interface ArchiveRestoreOptions extends RestoreOptions {
  /** The file store the archive's files are written back to. */
  storage: Storage;
}

/** A gzip stream starts with these two bytes. */
function isGzip(file: string): boolean {
  const fd = openSync(file, "r");
  try {
    const head = Buffer.alloc(2);
    readSync(fd, head, 0, 2, 0);
    return head[0] === 0x1f && head[1] === 0x8b;
  } finally {
    closeSync(fd);
  }
}

/**
 * Restores an archive from `backupArchive`: the database first (all or nothing, as restoreDatabase),
 * then every file back into the store. Files the store holds beyond the archive's are left alone.
 * A plain `.dump` from before archives restores its database only.
 */
export async function restoreArchive(opts: ArchiveRestoreOptions): Promise<{ fileCount: number }> {
  const file = path.resolve(opts.file);
  if (!existsSync(file)) throw new Error(`No backup file at ${file}.`);
  if (!isGzip(file)) {
    await restoreDatabase(opts);
    return { fileCount: 0 };
  }
  const work = mkdtempSync(path.join(tmpdir(), "eavesight-restore-"));
  try {
    await run("/usr/bin/tar", ["-xzf", file, "-C", work, "--no-same-owner", "--no-same-permissions"], process.env);
    const manifestFile = path.join(work, "manifest.json");
    const manifest = existsSync(manifestFile) ? (JSON.parse(readFileSync(manifestFile, "utf8")) as { format?: string }) : {};
    if (manifest.format !== ARCHIVE_FORMAT) throw new Error(`${file} is not an Eavesight backup (made by \`npm run db:backup\`).`);
    await restoreDatabase({ ...opts, file: path.join(work, "database.dump") });
    const filesDir = path.join(work, "files");
    let fileCount = 0;
    if (existsSync(filesDir)) {
      for (const entry of await readdir(filesDir, { recursive: true, withFileTypes: true })) {
        if (!entry.isFile()) continue;
        const full = path.join(entry.parentPath, entry.name);
        const key = path.relative(filesDir, full).split(path.sep).join("/");
        await opts.storage.put(key, await readFile(full), contentTypeOf(key));
        fileCount++;
      }
    }
    return { fileCount };
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
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
  if (!isCustomDump(file)) throw new Error(`${file} is not an Eavesight backup or a pg_dump custom-format dump (made by \`npm run db:backup\`).`);
  ensureCluster(opts.cluster);
  const staging = `${opts.database.slice(0, 50)}_restoring`;
  dropDatabase(opts.cluster, staging);
  ensureDatabase(opts.cluster, staging);
  try {
    const target = connection(opts.cluster, staging);
    await run("pg_restore", ["--clean", "--if-exists", "--no-owner", "--no-privileges", "--single-transaction", "--exit-on-error", ...target.args, file], target.env);
    // Whatever the dump held, no session or reset token from before the backup works after it.
    await run("psql", [...target.args, "-v", "ON_ERROR_STOP=1", "-qc", SECRET_TABLES.map((t) => `delete from ${t};`).join(" ")], target.env);
  } catch (err) {
    dropDatabase(opts.cluster, staging);
    throw err;
  }
  dropDatabase(opts.cluster, opts.database);
  // The app role owns the staging database (and may create databases), so it may rename it.
  const admin = connection(opts.cluster, "postgres");
  await run("psql", [...admin.args, "-v", "ON_ERROR_STOP=1", "-qc", `alter database ${staging} rename to ${opts.database}`], admin.env);
}
