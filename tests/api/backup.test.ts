import { execFile } from "node:child_process";
import { randomBytes } from "node:crypto";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import postgres from "postgres";
import { backupDatabase, restoreDatabase } from "../../scripts/lib/backup.ts";
import { dropDatabase, listDatabases, testCluster } from "../../scripts/lib/postgres.ts";
import { testDatabaseUrl } from "../setup/test-env.ts";

/**
 * Issue 9, "backups": pg_dump / pg_restore (Debian's) round-trip the test database, which the test
 * task seeds with the demo data. The dump is taken under a snapshot exported by an open transaction,
 * so the comparison sees exactly the rows the dump saw while other test files keep writing.
 */

const KEY_TABLES = ["companies", "users", "projects", "attic_spaces", "design_options", "proposals"] as const;
const sourceUrl = () => testDatabaseUrl();
const sourceDatabase = () => new URL(sourceUrl()).pathname.slice(1);
const urlOf = (database: string) => {
  const u = new URL(sourceUrl());
  u.pathname = `/${database}`;
  return u.toString();
};
const suffix = `${process.pid}_${randomBytes(3).toString("hex")}`;
const scratch = `eavesight_restore_${suffix}`;
const scratchCli = `eavesight_restore_cli_${suffix}`;
let dir: string;

beforeAll(() => {
  dir = mkdtempSync(path.join(tmpdir(), "eavesight-backup-"));
});
afterAll(() => {
  for (const db of [scratch, scratchCli]) dropDatabase(testCluster(), db);
  rmSync(dir, { recursive: true, force: true });
});

type Stats = Record<string, { rows: number; checksum: string }>;
/** Row count and an md5 over every row's text form, in id order, per key table. */
async function tableStats(sql: postgres.Sql | postgres.ReservedSql): Promise<Stats> {
  const out: Stats = {};
  for (const table of KEY_TABLES) {
    const [row] = await sql<{ rows: number; checksum: string }[]>`
      select count(*)::int as rows, md5(coalesce(string_agg(t::text, '|' order by t.id), '')) as checksum from ${sql(table)} t`;
    out[table] = row!;
  }
  return out;
}

async function withDatabase<T>(database: string, fn: (sql: postgres.Sql) => Promise<T>): Promise<T> {
  const sql = postgres(urlOf(database), { max: 1, onnotice: () => {} });
  try {
    return await fn(sql);
  } finally {
    await sql.end({ timeout: 2 });
  }
}

describe("database backups (pg_dump -Fc / pg_restore)", () => {
  it("when the test database is dumped and restored into a scratch database, then every key table has the same row count and row checksum", async () => {
    const file = path.join(dir, "snapshot.dump");
    const source = postgres(sourceUrl(), { max: 1, onnotice: () => {} });
    let before: Stats;
    try {
      const tx = await source.reserve();
      try {
        await tx`begin isolation level repeatable read`;
        const [exported] = await tx<{ snapshot: string }[]>`select pg_export_snapshot() as snapshot`;
        const snapshot = exported!.snapshot;
        before = await tableStats(tx);
        const dump = await backupDatabase({ cluster: testCluster(), database: sourceDatabase(), file, snapshot });
        expect(dump.bytes).toBeGreaterThan(10_000);
        await tx`commit`;
      } finally {
        tx.release();
      }
    } finally {
      await source.end({ timeout: 2 });
    }
    // The demo seed is there, so the comparison is about real rows, not empty tables (the seed makes no proposals).
    for (const table of KEY_TABLES.filter((x) => x !== "proposals")) expect(before[table]!.rows, table).toBeGreaterThan(0);

    await restoreDatabase({ cluster: testCluster(), database: scratch, file });
    const after = await withDatabase(scratch, tableStats);
    expect(after).toEqual(before);

    // The restored database is usable as the app's: migrations recorded, the demo company's projects readable by a join.
    await withDatabase(scratch, async (sql) => {
      const [migrations] = await sql<{ n: number }[]>`select count(*)::int as n from drizzle.__drizzle_migrations`;
      expect(migrations!.n).toBeGreaterThan(0);
      const demo = await sql<{ title: string }[]>`select p.title from projects p join companies c on c.id = p.company_id where c.slug = 'tallgrass'`;
      expect(demo.length).toBeGreaterThan(0);
    });
  });

  it("when a restore is given a file that is not a backup, then it refuses before touching any database", async () => {
    const bogus = path.join(dir, "not-a-dump.dump");
    writeFileSync(bogus, "select 1;\n");
    const untouched = `eavesight_never_${suffix}`;
    await expect(restoreDatabase({ cluster: testCluster(), database: untouched, file: bogus })).rejects.toThrow(/not a pg_dump custom-format backup/);
    await expect(restoreDatabase({ cluster: testCluster(), database: untouched, file: path.join(dir, "missing.dump") })).rejects.toThrow(/No backup file/);
    expect(listDatabases(testCluster()).filter((d) => d.startsWith(untouched))).toEqual([]);
  });

  it("when `npm run db:backup` and `npm run db:restore` run against the test cluster, then the restored database holds the demo companies and the same migrations", async () => {
    const file = path.join(dir, "cli.dump");
    const exec = promisify(execFile);
    const bootstrap = path.resolve("scripts/bootstrap.mjs");
    await exec(process.execPath, [bootstrap, "db", "backup", file, "--test", "--database", sourceDatabase()], { timeout: 60_000 });
    // Twice: the second restore replaces a database that already holds the data.
    for (let i = 0; i < 2; i++) {
      const { stdout } = await exec(process.execPath, [bootstrap, "db", "restore", file, "--test", "--database", scratchCli], { timeout: 60_000 });
      expect(stdout).toContain(`restored ${file} into database "${scratchCli}"`);
    }
    const query = (sql: postgres.Sql) => sql<{ slug: string; name: string }[]>`select slug, name from companies where slug in ('tallgrass', 'bluestem') order by slug`;
    const migrations = (sql: postgres.Sql) => sql<{ hash: string }[]>`select hash from drizzle.__drizzle_migrations order by id`;
    expect(await withDatabase(scratchCli, query)).toEqual(await withDatabase(sourceDatabase(), query));
    expect(await withDatabase(scratchCli, migrations)).toEqual(await withDatabase(sourceDatabase(), migrations));
    expect((await withDatabase(scratchCli, query)).map((c) => c.slug)).toEqual(["bluestem", "tallgrass"]);
    // No staging database is left behind.
    expect(listDatabases(testCluster()).filter((d) => d.endsWith("_restoring"))).toEqual([]);
  }, 90_000);
});
