import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { and, eq, sql } from "drizzle-orm";
import { designOptions, projects, proposalEvents, proposals } from "../../server/db/schema/index.ts";
import { ESIGN_CONSENT_VERSION } from "../../shared/proposals/disclosures.ts";
import { startTestApp, type TestApp } from "../setup/test-app.ts";
import { makeTeam, send, type Team } from "../setup/survey-fixtures.ts";
import { draftReadyToSend } from "../setup/proposal-fixture.ts";
import { startServerProcess, type ServerProcess } from "../setup/server-process.ts";

/**
 * Issue 14, "atomic acceptance": the server is killed with SIGKILL between recording the signature
 * and writing the "accepted" event. Afterwards the proposal is either not accepted at all (and can
 * be accepted again) or accepted completely: event, sold project and crew release together.
 *
 * The gap is held open by a trigger that sleeps while the "accepted" event of one signer (the name
 * below, used by no other test) is inserted; the test sees the sleep in pg_stat_activity and kills
 * the server then. client_connection_check_interval makes PostgreSQL notice the dead client within
 * 100 ms and abort the statement, as it would a real crash, instead of finishing the sleep.
 */
const SLOW_SIGNER = "Slow Crashwell";

let t: TestApp;
let team: Team;
const storageDir = mkdtempSync(path.join(tmpdir(), "eavesight-accept-crash-"));
let first: ServerProcess | undefined;
let second: ServerProcess | undefined;

beforeAll(async () => {
  t = await startTestApp({ runWorkers: false });
  team = await makeTeam(t, "Acceptance crash roofing");
  await t.db.execute(sql.raw(`
    CREATE OR REPLACE FUNCTION test_sleep_on_slow_accept() RETURNS trigger AS $$
    BEGIN
      IF NEW.event = 'accepted' AND NEW.detail->>'signerName' = '${SLOW_SIGNER}' THEN PERFORM pg_sleep(60); END IF;
      RETURN NEW;
    END; $$ LANGUAGE plpgsql`));
  await t.db.execute(sql.raw(`CREATE OR REPLACE TRIGGER test_sleep_on_slow_accept BEFORE INSERT ON proposal_events FOR EACH ROW EXECUTE FUNCTION test_sleep_on_slow_accept()`));
  await t.db.execute(sql.raw(`DO $$ BEGIN EXECUTE format('ALTER DATABASE %I SET client_connection_check_interval = 100', current_database()); END $$`));
});
afterAll(async () => {
  await first?.stop("SIGKILL");
  await second?.stop();
  await t?.db.execute(sql.raw(`DROP TRIGGER IF EXISTS test_sleep_on_slow_accept ON proposal_events`));
  await t?.db.execute(sql.raw(`DO $$ BEGIN EXECUTE format('ALTER DATABASE %I RESET client_connection_check_interval', current_database()); END $$`));
  await t?.close();
  rmSync(storageDir, { recursive: true, force: true });
});

async function until<T>(what: string, read: () => Promise<T>, isDone: (v: T) => boolean, timeoutMs: number): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (isDone(value)) return value;
    if (Date.now() > deadline) throw new Error(`${what} did not happen within ${timeoutMs} ms; last seen: ${JSON.stringify(value)}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

const acceptOn = (server: ServerProcess, token: string, optionId: string, signerName: string) =>
  fetch(`${server.origin}/api/public/proposals/${token}/accept`, {
    method: "POST", headers: { origin: server.origin, "content-type": "application/json" },
    body: JSON.stringify({ optionId, signerName, signature: { typed: signerName }, consent: { esign: true, consentTextVersion: ESIGN_CONSENT_VERSION } }),
  });

async function stateOf(proposalId: string, projectId: string, optionId: string) {
  const [p] = await t.db.select().from(proposals).where(eq(proposals.id, proposalId));
  const events = await t.db.select().from(proposalEvents).where(and(eq(proposalEvents.proposalId, proposalId), eq(proposalEvents.event, "accepted")));
  const [project] = await t.db.select().from(projects).where(eq(projects.id, projectId));
  const [option] = await t.db.select().from(designOptions).where(eq(designOptions.id, optionId));
  return { status: p!.status, acceptedEvents: events.length, projectStatus: project!.status, isReleased: option!.releasedAt !== null };
}

describe("a server killed while it records an acceptance", () => {
  it("when the server dies between the signature and the accepted event, then there is no acceptance at all, and accepting again completes it", async () => {
    const { proposalId, projectId } = await draftReadyToSend(t, team);
    const sent = await send(team.asSales, "post", `/api/proposals/${proposalId}/send`);
    expect(sent.status, JSON.stringify(sent.body)).toBe(200);
    const token = (sent.body.link as string).split("/p/")[1]!;
    const optionId = sent.body.proposal.optionIds[0] as string;

    first = await startServerProcess({ STORAGE_DIR: storageDir });
    const pending = acceptOn(first, token, optionId, SLOW_SIGNER).then((r) => r.status, () => "connection lost");
    await until("the accept sleeping inside the event insert",
      async () => (await t.db.execute(sql`select count(*)::int as n from pg_stat_activity where wait_event = 'PgSleep' and datname = current_database()`))[0] as { n: number },
      (row) => row.n > 0, 30_000);
    await first.stop("SIGKILL");
    expect(await pending).toBe("connection lost");

    // Nothing half-done: not accepted, no event, project not sold, nothing released.
    await until("the aborted transaction to end",
      async () => (await t.db.execute(sql`select count(*)::int as n from pg_stat_activity where wait_event = 'PgSleep' and datname = current_database()`))[0] as { n: number },
      (row) => row.n === 0, 10_000);
    expect(await stateOf(proposalId, projectId, optionId)).toEqual({ status: "sent", acceptedEvents: 0, projectStatus: "proposed", isReleased: false });

    second = await startServerProcess({ STORAGE_DIR: storageDir });
    const res = await acceptOn(second, token, optionId, "Rowan Tessaly");
    expect(res.status, await res.clone().text()).toBe(200);
    expect(await stateOf(proposalId, projectId, optionId)).toEqual({ status: "accepted", acceptedEvents: 1, projectStatus: "sold", isReleased: true });
    // The signed copy follows from the same commit (queued there, rendered by the worker).
    const signed = await until("the signed PDF", async () => (await t.db.select().from(proposals).where(eq(proposals.id, proposalId)))[0]!,
      (p) => p.signedRenderStatus === "ready" || p.signedRenderStatus === "failed", 60_000);
    expect(signed.signedRenderStatus).toBe("ready");
  });
});
