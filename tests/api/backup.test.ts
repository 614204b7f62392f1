import { execFile } from "node:child_process";
import { randomBytes } from "node:crypto";
import { mkdtempSync, rmSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import postgres from "postgres";
import sharp from "sharp";
import { backupArchive, backupDatabase, restoreArchive, restoreDatabase } from "../../scripts/lib/backup.ts";
import { createLocalStorage } from "../../server/lib/storage/index.ts";
import { pgBinDir } from "../../scripts/lib/postgres.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, makeTeam } from "../setup/survey-fixtures.ts";
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
const scratchArchive = `eavesight_restore_archive_${suffix}`;
let dir: string;

beforeAll(() => {
  dir = mkdtempSync(path.join(tmpdir(), "eavesight-backup-"));
});
afterAll(() => {
  for (const db of [scratch, scratchCli, scratchArchive]) dropDatabase(testCluster(), db);
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
    await expect(restoreDatabase({ cluster: testCluster(), database: untouched, file: bogus })).rejects.toThrow(/not an Eavesight backup or a pg_dump custom-format dump/);
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

describe("backup archives: database and files together, no secrets (issue 13)", () => {
  const apps: TestApp[] = [];
  let source: TestApp;
  let team: Awaited<ReturnType<typeof makeTeam>>;
  let photoUrl: string;
  let photoBytes: Buffer;
  const file = () => path.join(dir, "archive.tar.gz");
  const scratchHammered = `eavesight_restore_hammered_${suffix}`;

  // One company with a photo, a signed-in owner and a pending password reset, then one archive.
  beforeAll(async () => {
    source = await startTestApp({ runWorkers: false });
    apps.push(source);
    team = await makeTeam(source, "Backup Roofing");
    const project = await createProject(team.asOwner, (await createCustomer(team.asOwner)).id);
    const png = await sharp({ create: { width: 64, height: 32, channels: 3, background: "#7a3" } }).png().toBuffer();
    const uploaded = await team.asOwner.post(`/api/projects/${project.id}/photos`).set("origin", ORIGIN).attach("file", png, "attic.png");
    expect(uploaded.status, JSON.stringify(uploaded.body)).toBe(201);
    photoUrl = uploaded.body.photo.url;
    const stored = await team.asOwner.get(photoUrl).buffer(true);
    expect(stored.status).toBe(200);
    photoBytes = stored.body as Buffer;
    expect((await source.request().post("/api/auth/password-reset/request").set("origin", ORIGIN).send({ email: team.owner.email })).status).toBe(202);
    await backupArchive({ cluster: testCluster(), database: sourceDatabase(), file: file(), storage: createLocalStorage(source.env.STORAGE_DIR) });
  }, 120_000);
  afterAll(async () => {
    for (const app of apps.reverse()) await app.close();
    dropDatabase(testCluster(), scratchHammered);
  });

  it("when the archive is written, then only its owner may read it and its dump holds no session or reset-token rows", async () => {
    expect(statSync(file()).mode & 0o777).toBe(0o600);
    const unpacked = mkdtempSync(path.join(tmpdir(), "eavesight-unpacked-"));
    try {
      await promisify(execFile)("tar", ["-xzf", file(), "-C", unpacked]);
      const { stdout: listing } = await promisify(execFile)(path.join(pgBinDir(), "pg_restore"), ["--list", path.join(unpacked, "database.dump")], { maxBuffer: 16 * 1024 * 1024 });
      expect(listing).toMatch(/TABLE DATA public photos /);
      expect(listing).toMatch(/TABLE public sessions /);
      expect(listing).not.toMatch(/TABLE DATA public sessions /);
      expect(listing).not.toMatch(/TABLE DATA public password_resets /);
      const photoKey = photoUrl.split("/").pop()!;
      const { stdout: files } = await promisify(execFile)("find", [path.join(unpacked, "files"), "-type", "f"]);
      expect(files.split("\n").filter(Boolean).length).toBeGreaterThanOrEqual(2); // the photo and its thumbnail, at least
      expect(photoKey).toMatch(/^[0-9a-f-]{36}$/);
    } finally {
      rmSync(unpacked, { recursive: true, force: true });
    }
  });

  it("when a photo is deleted after the backup and the archive is restored, then the photo opens again and the session from before does not work", async () => {
    // After the backup the photo is deleted: row and file.
    expect((await team.asOwner.delete(photoUrl).set("origin", ORIGIN)).status).toBe(204);
    expect((await team.asOwner.get(photoUrl)).status).toBe(404);

    await restoreArchive({ cluster: testCluster(), database: scratchArchive, file: file(), storage: createLocalStorage(source.env.STORAGE_DIR) });
    const restored = await startTestApp({ runWorkers: false, databaseUrl: urlOf(scratchArchive), envOverrides: { STORAGE_DIR: source.env.STORAGE_DIR } });
    apps.push(restored);
    // The session cookie from before the backup signs nobody in on the restored database.
    const cookie = (team.asOwner as unknown as { jar: { getCookies: (o: unknown) => { toValueString(): string }[] } }).jar
      .getCookies({ domain: "127.0.0.1", path: "/", secure: false, script: false }).map((c) => c.toValueString()).join("; ");
    expect(cookie).not.toBe("");
    expect((await source.request().get("/api/auth/me").set("cookie", cookie)).status).toBe(200); // still valid where it was made
    expect((await restored.request().get("/api/auth/me").set("cookie", cookie)).status).toBe(401);
    const [secrets] = await restored.sql<{ sessions: number; resets: number }[]>`select (select count(*)::int from sessions) as sessions, (select count(*)::int from password_resets) as resets`;
    expect(secrets).toEqual({ sessions: 0, resets: 0 });
    // Signed in afresh, the deleted photo is there again, byte for byte.
    const owner = await restored.signIn(team.owner.email);
    const back = await owner.get(photoUrl).buffer(true);
    expect(back.status).toBe(200);
    expect(Buffer.compare(back.body as Buffer, photoBytes)).toBe(0);
  }, 120_000);

  it("when requests arrive while db:restore swaps the database under the app, then they answer 503 or their usual answer, never 500", async () => {
    const restoreInto = () => restoreArchive({ cluster: testCluster(), database: scratchHammered, file: file(), storage: createLocalStorage(source.env.STORAGE_DIR) });
    await restoreInto();
    const app = await startTestApp({ runWorkers: false, databaseUrl: urlOf(scratchHammered), envOverrides: { STORAGE_DIR: source.env.STORAGE_DIR } });
    apps.push(app);
    const owner = await app.signIn(team.owner.email);
    expect((await owner.get("/api/customers")).status).toBe(200);
    const statuses = new Map<number, number>();
    let isRestoring = true;
    const hammer = (async () => {
      while (isRestoring) {
        const res = await owner.get("/api/customers");
        statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
        await new Promise((r) => setTimeout(r, 20));
      }
    })();
    try {
      await restoreInto();
    } finally {
      isRestoring = false;
      await hammer;
    }
    const seen = [...statuses.keys()];
    expect(seen.every((s) => [200, 401, 503].includes(s)), JSON.stringify([...statuses])).toBe(true);
    expect(statuses.get(503) ?? 0, `the swap was seen: ${JSON.stringify([...statuses])}`).toBeGreaterThan(0);
    // The restore voided every session, this one included; the app then serves the restored database.
    expect((await owner.get("/api/auth/me")).status).toBe(401);
    expect((await app.request().get("/api/health")).status).toBe(200);
  }, 120_000);
});
