import { randomUUID } from "node:crypto";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import request from "supertest";
import { eq, sql as rawSql } from "drizzle-orm";
import { closeComputePool } from "../../server/lib/compute/pool.ts";
import { createApp } from "../../server/app.ts";
import { parseEnv } from "../../server/env.ts";
import { createDb } from "../../server/db/client.ts";
import { createLogger } from "../../server/lib/logger.ts";
import { createMailer } from "../../server/lib/mailer.ts";
import { startJobs } from "../../server/lib/jobs.ts";
import { createSessionCache } from "../../server/modules/auth/session-cache.ts";
import { companies, outboxMessages, users } from "../../server/db/schema/index.ts";
import { hashPassword } from "../../server/lib/password.ts";
import type { Role } from "../../shared/schemas/roles.ts";
import { testDatabaseUrl, testSmtpPort } from "./test-env.ts";

export const ORIGIN = "http://127.0.0.1:3999";
export const TEST_PASSWORD = "correct horse battery";

/**
 * The real app on the real test database, with a clock the test can move. Files go to a
 * throwaway folder of this test file unless `envOverrides` names other storage.
 */
/**
 * `runWorkers: false` leaves background jobs (mail, PDF) to other processes, e.g. for a test
 * that stops the database, where another file's queued job must not be half-run.
 */
export async function startTestApp(opts: { envOverrides?: Record<string, string | undefined>; runWorkers?: boolean; databaseUrl?: string; rateLimitNamespace?: string } = {}) {
  const databaseUrl = opts.databaseUrl ?? testDatabaseUrl();
  const storageDir = mkdtempSync(path.join(tmpdir(), "eavesight-files-"));
  const env = parseEnv({
    ...process.env, DATABASE_URL: databaseUrl, APP_ORIGIN: ORIGIN, LOG_LEVEL: process.env.TEST_LOG_LEVEL ?? "silent", SERVE_CLIENT: "false",
    STORAGE_DRIVER: "local", STORAGE_DIR: storageDir, ...opts.envOverrides,
  });
  const logger = createLogger((process.env.TEST_LOG_LEVEL ?? "silent") as "silent");
  const { db, sql } = createDb(databaseUrl, { max: 5 });
  const mailer = createMailer({ host: "127.0.0.1", port: testSmtpPort(), from: "Eavesight <no-reply@eavesight.example>" });
  const jobs = await startJobs({ databaseUrl, logger, mailer, runWorkers: opts.runWorkers });
  const clock = { offsetMs: 0 };
  const now = () => new Date(Date.now() + clock.offsetMs);
  // As server/index.ts: reads are answered from the session cache, so every API test runs with it.
  const sessionCache = createSessionCache({ databaseUrl, logger });
  await sessionCache.ready;
  const app = createApp({ env, db, logger, jobs, now, sessionCache, rateLimitNamespace: opts.rateLimitNamespace ?? `test-${randomUUID()}:` });

  /** A company of its own per test file, so files never see each other's rows. */
  async function makeCompany(name = `Test Co ${randomUUID().slice(0, 8)}`) {
    const [c] = await db.insert(companies).values({ name, slug: `t-${randomUUID()}` }).returning();
    return c!;
  }
  let cachedHash: string | undefined;
  async function makeUser(companyId: string, role: Role, opts: { email?: string; isActive?: boolean } = {}) {
    cachedHash ??= await hashPassword(TEST_PASSWORD);
    const email = opts.email ?? `${role}-${randomUUID().slice(0, 8)}@test.example`;
    const [u] = await db.insert(users).values({ id: randomUUID(), companyId, email, name: `Test ${role}`, role, passwordHash: cachedHash, isActive: opts.isActive ?? true }).returning();
    return u!;
  }
  /** A supertest agent signed in as the user (cookie kept), sending this app's Origin. */
  async function signIn(email: string, password = TEST_PASSWORD) {
    const agent = request.agent(app);
    const res = await agent.post("/api/auth/sign-in").set("origin", env.APP_ORIGIN).send({ email, password });
    if (res.status !== 200) throw new Error(`sign-in failed for ${email}: ${res.status} ${JSON.stringify(res.body)}`);
    return agent;
  }
  async function waitForMail(to: string, opts: { subjectIncludes?: string; timeoutMs?: number } = {}) {
    const deadline = Date.now() + (opts.timeoutMs ?? 10_000);
    while (Date.now() < deadline) {
      const rows = await db.select().from(outboxMessages).where(eq(outboxMessages.toAddress, to));
      const hit = rows.find((r) => !opts.subjectIncludes || r.subject.includes(opts.subjectIncludes));
      if (hit) return hit;
      await new Promise((r) => setTimeout(r, 150));
    }
    throw new Error(`no e-mail to ${to} arrived within the time allowed`);
  }
  async function mailCount(to: string) {
    const [row] = await db.select({ n: rawSql<number>`count(*)::int` }).from(outboxMessages).where(eq(outboxMessages.toAddress, to));
    return row?.n ?? 0;
  }
  async function close() {
    await jobs.stop();
    mailer.close();
    await sessionCache.close();
    await closeComputePool();
    await sql.end({ timeout: 2 });
    rmSync(storageDir, { recursive: true, force: true });
  }
  return { app, db, sql, sessionCache, clock, env, makeCompany, makeUser, signIn, waitForMail, mailCount, close, request: () => request(app) };
}
export type TestApp = Awaited<ReturnType<typeof startTestApp>>;
