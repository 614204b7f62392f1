import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { AddressInfo } from "node:net";
import type { Server } from "node:http";
import { and, eq, sql as rawSql } from "drizzle-orm";
import { auditEvents, outboxMessages, passwordResets } from "../../server/db/schema/index.ts";
import { ORIGIN, TEST_PASSWORD, startTestApp, type TestApp } from "../setup/test-app.ts";

/**
 * The limits that guard accounts hold under a parallel burst: each attempt is counted before the
 * password is checked, atomically, so a burst of 300 checks at most the limit (5 per account,
 * 20 per address in 15 minutes). Each test speaks from an address of its own (X-Forwarded-For,
 * trusted from loopback) so the per-address limit of one test does not reach another.
 */
let t: TestApp;
let server: Server;
let base: string;
let companyId: string;
let addressCounter = 1;
const nextAddress = () => `10.77.${(addressCounter >> 8) & 255}.${addressCounter++ & 255}`;

beforeAll(async () => {
  t = await startTestApp();
  companyId = (await t.makeCompany()).id;
  server = t.app.listen(0, "127.0.0.1");
  await new Promise((r) => server.once("listening", r));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(async () => {
  await new Promise((r) => server?.close(r));
  await t?.close();
});

async function post(path: string, body: unknown, address: string, cookie?: string) {
  const res = await fetch(`${base}${path}`, {
    method: "POST",
    headers: { origin: ORIGIN, "content-type": "application/json", "x-forwarded-for": address, ...(cookie ? { cookie } : {}) },
    body: JSON.stringify(body),
  });
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : null, setCookie: res.headers.getSetCookie() };
}
const statuses = (results: { status: number }[]) =>
  results.reduce<Record<number, number>>((acc, r) => ({ ...acc, [r.status]: (acc[r.status] ?? 0) + 1 }), {});

describe("sign-in limits under a parallel burst", () => {
  it("when 300 wrong passwords for one account arrive at once from one address, then at most 5 are checked and the rest answer 429", async () => {
    const u = await t.makeUser(companyId, "estimator");
    const address = nextAddress();
    const results = await Promise.all(Array.from({ length: 300 }, (_, i) => post("/api/auth/sign-in", { email: u.email, password: `wrong-${i}` }, address)));
    const counts = statuses(results);
    expect(counts[401] ?? 0).toBeGreaterThanOrEqual(1);
    expect(counts[401] ?? 0).toBeLessThanOrEqual(5);
    expect((counts[401] ?? 0) + (counts[429] ?? 0)).toBe(300);
    const failed = await t.db.select().from(auditEvents).where(and(eq(auditEvents.event, "sign-in-failed"), eq(auditEvents.subjectEmail, u.email)));
    expect(failed.length).toBeLessThanOrEqual(5);
    // Even the right password is refused while the account is locked.
    expect((await post("/api/auth/sign-in", { email: u.email, password: TEST_PASSWORD }, nextAddress())).status).toBe(429);
  });

  it("when 300 sign-ins for different accounts arrive at once from one address, then at most 20 are checked", async () => {
    const address = nextAddress();
    const results = await Promise.all(Array.from({ length: 300 }, (_, i) => post("/api/auth/sign-in", { email: `burst-${i}-${Date.now()}@test.example`, password: "wrong password" }, address)));
    const counts = statuses(results);
    expect(counts[401] ?? 0).toBeGreaterThanOrEqual(1);
    expect(counts[401] ?? 0).toBeLessThanOrEqual(20);
    expect((counts[401] ?? 0) + (counts[429] ?? 0)).toBe(300);
  });

  it("when a user signs in successfully many times, then successes never count toward the lockout", async () => {
    const u = await t.makeUser(companyId, "sales");
    const address = nextAddress();
    for (let i = 0; i < 8; i++) expect((await post("/api/auth/sign-in", { email: u.email, password: TEST_PASSWORD }, address)).status).toBe(200);
  });
});

describe("password reset requests", () => {
  const resetMails = (to: string) => t.db.select().from(outboxMessages).where(eq(outboxMessages.toAddress, to)).orderBy(outboxMessages.createdAt);
  const tokenOf = (text: string | null) => /token=([A-Za-z0-9_-]+)/.exec(text ?? "")![1]!;
  async function waitForMails(to: string, n: number) {
    const deadline = Date.now() + 15_000;
    for (;;) {
      const rows = await resetMails(to);
      if (rows.length >= n || Date.now() > deadline) return rows;
      await new Promise((r) => setTimeout(r, 150));
    }
  }

  it("when a newer reset link is requested, then the older one no longer works", async () => {
    const u = await t.makeUser(companyId, "estimator");
    const address = nextAddress();
    expect((await post("/api/auth/password-reset/request", { email: u.email }, address)).status).toBe(202);
    const [first] = await waitForMails(u.email, 1);
    expect((await post("/api/auth/password-reset/request", { email: u.email }, address)).status).toBe(202);
    const mails = await waitForMails(u.email, 2);
    expect(mails).toHaveLength(2);
    const older = tokenOf(first!.text);
    const newer = tokenOf(mails.find((m) => tokenOf(m.text) !== older)!.text);
    const stale = await post("/api/auth/password-reset/confirm", { token: older, password: "an old-link passphrase" }, address);
    expect(stale.status).toBe(400);
    expect(stale.body.error.code).toBe("invalid-token");
    expect((await post("/api/auth/password-reset/confirm", { token: newer, password: "a new-link passphrase" }, address)).status).toBe(204);
  });

  it("when 50 reset requests for one account arrive at once, then at most 3 links are made and the rest answer 429", async () => {
    const u = await t.makeUser(companyId, "sales");
    const results = await Promise.all(Array.from({ length: 50 }, (_, i) => post("/api/auth/password-reset/request", { email: u.email }, `10.78.0.${i + 1}`)));
    const counts = statuses(results);
    expect(counts[202]).toBeGreaterThanOrEqual(1);
    expect(counts[202]).toBeLessThanOrEqual(3);
    expect(counts[429]).toBe(50 - counts[202]!);
    await waitForMails(u.email, counts[202]!);
    const resets = await t.db.select().from(passwordResets).where(eq(passwordResets.userId, u.id));
    expect(resets.length).toBeLessThanOrEqual(3);
  });

  it("when one address asks for many accounts' resets, then it is limited to 10 an hour, known or unknown accounts alike", async () => {
    const address = nextAddress();
    const results = await Promise.all(Array.from({ length: 40 }, (_, i) => post("/api/auth/password-reset/request", { email: `someone-${i}-${Date.now()}@test.example` }, address)));
    const counts = statuses(results);
    expect(counts[202]).toBeLessThanOrEqual(10);
    expect(counts[429]).toBe(40 - (counts[202] ?? 0));
  });

  it("when a known and an unknown address ask, then both queue the same mail job and answer alike (no timing or answer tells them apart)", async () => {
    const u = await t.makeUser(companyId, "sales");
    const unknown = `ghost-${Date.now()}@test.example`;
    const known = await post("/api/auth/password-reset/request", { email: u.email }, nextAddress());
    const ghost = await post("/api/auth/password-reset/request", { email: unknown }, nextAddress());
    expect(known.status).toBe(202);
    expect(ghost.body).toEqual(known.body);
    const jobsFor = async (email: string) => {
      const rows = await t.db.execute(rawSql`select count(*)::int as n from pgboss.job where name = 'password-reset' and data->>'email' = ${email}`);
      return (rows as unknown as { n: number }[])[0]!.n;
    };
    expect(await jobsFor(u.email)).toBe(1);
    expect(await jobsFor(unknown)).toBe(1);
    await t.waitForMail(u.email, { subjectIncludes: "Reset" });
    expect(await t.mailCount(unknown)).toBe(0);
  });
});

describe("password change by a signed-in user", () => {
  it("when the current password is guessed 50 times at once, then at most 5 guesses are checked, and the right one is refused until the window passes", async () => {
    const u = await t.makeUser(companyId, "estimator");
    const address = nextAddress();
    const signedIn = await post("/api/auth/sign-in", { email: u.email, password: TEST_PASSWORD }, address);
    const cookie = signedIn.setCookie.map((c) => c.split(";")[0]).join("; ");
    const results = await Promise.all(Array.from({ length: 50 }, (_, i) => post("/api/auth/password", { currentPassword: `guess-${i}`, newPassword: "a takeover passphrase" }, address, cookie)));
    const counts = statuses(results);
    expect(counts[400] ?? 0).toBeLessThanOrEqual(5);
    expect((counts[400] ?? 0) + (counts[429] ?? 0)).toBe(50);
    const right = await post("/api/auth/password", { currentPassword: TEST_PASSWORD, newPassword: "my own new passphrase" }, address, cookie);
    expect(right.status).toBe(429);
    t.clock.offsetMs = 16 * 60 * 1000;
    try {
      // The session has a longer life than the window; the lockout has ended.
      expect((await post("/api/auth/password", { currentPassword: TEST_PASSWORD, newPassword: "my own new passphrase" }, address, cookie)).status).toBe(204);
    } finally {
      t.clock.offsetMs = 0;
    }
  });
});
