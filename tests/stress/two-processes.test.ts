import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { auditEvents, customers } from "../../server/db/schema/index.ts";
import { TEST_PASSWORD, startTestApp, type TestApp } from "../setup/test-app.ts";
import { startServerProcess, type ServerProcess } from "../setup/server-process.ts";

/**
 * Two real server processes on one database, sharing nothing else (DESIGN.md §6): the sign-in
 * limit, the homeowner link's guessing limit and Idempotency-Key hold across them. Requests come
 * from loopback, so X-Forwarded-For names the client address (TRUST_PROXY=loopback).
 */
let t: TestApp;
let a: ServerProcess;
let b: ServerProcess;
let companyId: string;
let cookieA = "";
let cookieB = "";

beforeAll(async () => {
  t = await startTestApp({ runWorkers: false });
  [a, b] = await Promise.all([startServerProcess(), startServerProcess()]);
  companyId = (await t.makeCompany("Two-process roofing")).id;
  const estimator = await t.makeUser(companyId, "estimator");
  cookieA = await signIn(a, estimator.email);
  cookieB = await signIn(b, estimator.email);
});
afterAll(async () => {
  await Promise.all([a?.stop(), b?.stop()]);
  await t?.close();
});

let addressCounter = 1;
const nextAddress = () => `10.99.${(addressCounter >> 8) & 255}.${addressCounter++ & 255}`;

async function call(server: ServerProcess, path: string, init: { method?: string; body?: unknown; headers?: Record<string, string> } = {}) {
  const res = await fetch(`${server.origin}${path}`, {
    method: init.method ?? "GET",
    headers: { origin: server.origin, "content-type": "application/json", ...init.headers },
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
    signal: AbortSignal.timeout(30_000),
  });
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : null, headers: res.headers };
}
async function signIn(server: ServerProcess, email: string) {
  const res = await fetch(`${server.origin}/api/auth/sign-in`, {
    method: "POST",
    headers: { origin: server.origin, "content-type": "application/json", "x-forwarded-for": nextAddress() },
    body: JSON.stringify({ email, password: TEST_PASSWORD }),
  });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status}`);
  return res.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
}

describe("limits across two server processes", () => {
  it("when 300 wrong passwords for one account are spread over both processes at once, then at most 5 are checked", async () => {
    const target = await t.makeUser(companyId, "sales");
    const address = nextAddress();
    const results = await Promise.all(Array.from({ length: 300 }, (_, i) =>
      call(i % 2 ? b : a, "/api/auth/sign-in", { method: "POST", body: { email: target.email, password: `wrong-${i}` }, headers: { "x-forwarded-for": address } })));
    const checked = results.filter((r) => r.status === 401).length;
    expect(checked).toBeGreaterThanOrEqual(1);
    expect(checked).toBeLessThanOrEqual(5);
    expect(results.filter((r) => r.status === 429)).toHaveLength(300 - checked);
  });

  it("when link guesses from one address are spread over both processes at once, then at most 20 are looked up", async () => {
    const address = nextAddress();
    const results = await Promise.all(Array.from({ length: 120 }, (_, i) =>
      call(i % 2 ? b : a, `/api/public/proposals/two-process-guess-${String(i).padStart(12, "0")}`, { headers: { "x-forwarded-for": address } })));
    const lookedUp = results.filter((r) => r.status === 404).length;
    expect(lookedUp).toBeGreaterThanOrEqual(1);
    expect(lookedUp).toBeLessThanOrEqual(20);
    expect(results.filter((r) => r.status === 429)).toHaveLength(120 - lookedUp);
  });
});

describe("Idempotency-Key across two server processes", () => {
  const customersNamed = (name: string) => t.db.select().from(customers).where(and(eq(customers.companyId, companyId), eq(customers.name, name)));

  it("when a create answered by one process is retried on the other, then the retry gets the first result and one row exists", async () => {
    const key = crypto.randomUUID();
    const body = { name: "Cross-process Household", phone: "316-555-0199" };
    const first = await call(a, "/api/customers", { method: "POST", body, headers: { cookie: cookieA, "idempotency-key": key } });
    expect(first.status).toBe(201);
    const retry = await call(b, "/api/customers", { method: "POST", body, headers: { cookie: cookieB, "idempotency-key": key } });
    expect(retry.status).toBe(201);
    expect(retry.body).toEqual(first.body);
    expect(retry.headers.get("idempotent-replayed")).toBe("true");
    expect(await customersNamed("Cross-process Household")).toHaveLength(1);
  });

  it("when twenty copies with one key hit both processes at once, then exactly one row and one audit entry are written", async () => {
    const key = crypto.randomUUID();
    const body = { name: "Burst Across Household", phone: "316-555-0198" };
    const results = await Promise.all(Array.from({ length: 20 }, (_, i) =>
      call(i % 2 ? b : a, "/api/customers", { method: "POST", body, headers: { cookie: i % 2 ? cookieB : cookieA, "idempotency-key": key } })));
    expect(results.map((r) => r.status)).toEqual(Array(20).fill(201));
    const saved = await customersNamed("Burst Across Household");
    expect(saved).toHaveLength(1);
    expect(new Set(results.map((r) => r.body.customer.id))).toEqual(new Set([saved[0]!.id]));
    const audits = (await t.db.select().from(auditEvents).where(and(eq(auditEvents.companyId, companyId), eq(auditEvents.event, "customer-created"))))
      .filter((e) => (e.detail as { customerId?: string }).customerId === saved[0]!.id);
    expect(audits).toHaveLength(1);
  });
});
