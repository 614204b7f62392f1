import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq, sql as rawSql } from "drizzle-orm";
import { auditEvents, customers, idempotencyKeys } from "../../server/db/schema/index.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";

/**
 * Creating requests accept an Idempotency-Key: the first answer is stored with the change, in one
 * transaction, so a retry (after a 503 or a lost answer) gets that answer instead of a second row.
 * The audit entry is written in the same transaction: a change is never saved without it.
 */
let t: TestApp;
let companyId: string;
let agent: Awaited<ReturnType<TestApp["signIn"]>>;
let otherAgent: Awaited<ReturnType<TestApp["signIn"]>>;
beforeAll(async () => {
  t = await startTestApp();
  companyId = (await t.makeCompany()).id;
  agent = await t.signIn((await t.makeUser(companyId, "estimator")).email);
  otherAgent = await t.signIn((await t.makeUser(companyId, "estimator")).email);
});
afterAll(async () => t?.close());

const customer = (name: string) => ({ name, phone: "316-555-0142", notes: "" });
const createCustomer = (who: typeof agent, key: string | null, body: object) => {
  const req = who.post("/api/customers").set("origin", ORIGIN);
  return key ? req.set("idempotency-key", key).send(body) : req.send(body);
};
const customersNamed = (name: string) => t.db.select().from(customers).where(and(eq(customers.companyId, companyId), eq(customers.name, name)));
const auditFor = async (customerId: string) =>
  (await t.db.select().from(auditEvents).where(and(eq(auditEvents.companyId, companyId), eq(auditEvents.event, "customer-created"))))
    .filter((e) => (e.detail as { customerId?: string }).customerId === customerId);

describe("Idempotency-Key on creating requests", () => {
  it("when a create is sent again with the same key (the first answer was lost), then the first result comes back and nothing is created twice", async () => {
    const key = crypto.randomUUID();
    const body = customer("Retry Household");
    const first = await createCustomer(agent, key, body);
    expect(first.status).toBe(201);
    const again = await createCustomer(agent, key, body);
    expect(again.status).toBe(201);
    expect(again.body).toEqual(first.body);
    expect(again.headers["idempotent-replayed"]).toBe("true");
    expect(await customersNamed("Retry Household")).toHaveLength(1);
    expect(await auditFor(first.body.customer.id)).toHaveLength(1);
  });

  it("when ten copies with one key arrive at once, then exactly one row is created and all ten answers name it", async () => {
    const key = crypto.randomUUID();
    const results = await Promise.all(Array.from({ length: 10 }, () => createCustomer(agent, key, customer("Burst Household"))));
    expect(results.map((r) => r.status)).toEqual(Array(10).fill(201));
    expect(new Set(results.map((r) => r.body.customer.id)).size).toBe(1);
    expect(await customersNamed("Burst Household")).toHaveLength(1);
  });

  it("when the same key comes with a different body, then it is refused with 422 and nothing is created", async () => {
    const key = crypto.randomUUID();
    expect((await createCustomer(agent, key, customer("First Body"))).status).toBe(201);
    const other = await createCustomer(agent, key, customer("Second Body"));
    expect(other.status).toBe(422);
    expect(other.body.error.code).toBe("idempotency-key-reused");
    expect(await customersNamed("Second Body")).toHaveLength(0);
  });

  it("when another user sends the same key, then it is theirs alone: keys are scoped per user", async () => {
    const key = crypto.randomUUID();
    const mine = await createCustomer(agent, key, customer("Scoped Household"));
    const theirs = await createCustomer(otherAgent, key, customer("Scoped Household"));
    expect(theirs.status).toBe(201);
    expect(theirs.body.customer.id).not.toBe(mine.body.customer.id);
    const stored = await t.db.select().from(idempotencyKeys).where(eq(idempotencyKeys.key, key));
    expect(stored).toHaveLength(2);
    expect(stored.every((row) => row.companyId === companyId && row.expiresAt > row.createdAt)).toBe(true);
  });

  it("when a bad key is sent, then it answers 400 with the header named", async () => {
    const res = await createCustomer(agent, "x".repeat(300), customer("Bad Key Household"));
    expect(res.status).toBe(400);
    expect(res.body.error.fields["Idempotency-Key"]).toBeTruthy();
    expect(await customersNamed("Bad Key Household")).toHaveLength(0);
  });

  it("when the database fails while the audit entry is written, then the answer is 503, the customer is not saved either, and the retry with the key creates exactly one with its audit entry", async () => {
    // The database "goes away" exactly between the change and its audit entry (SQLSTATE 57P03).
    const fn = `fail_audit_${companyId.replaceAll("-", "")}`;
    await t.db.execute(rawSql.raw(`create function ${fn}() returns trigger language plpgsql as $$ begin
      if new.company_id = '${companyId}' and new.event = 'customer-created' then raise exception 'the database is shutting down' using errcode = '57P03'; end if;
      return new; end $$`));
    await t.db.execute(rawSql.raw(`create trigger ${fn} before insert on audit_events for each row execute function ${fn}()`));
    const key = crypto.randomUUID();
    const body = customer("Outage Household");
    let failed;
    try {
      failed = await createCustomer(agent, key, body);
      expect((await createCustomer(agent, null, customer("Outage Without Key"))).status).toBe(503);
    } finally {
      await t.db.execute(rawSql.raw(`drop trigger ${fn} on audit_events; drop function ${fn}()`));
    }
    expect(failed.status).toBe(503);
    expect(await customersNamed("Outage Household")).toHaveLength(0);
    expect(await customersNamed("Outage Without Key")).toHaveLength(0);

    const retried = await createCustomer(agent, key, body);
    expect(retried.status).toBe(201);
    const saved = await customersNamed("Outage Household");
    expect(saved).toHaveLength(1);
    expect(await auditFor(saved[0]!.id)).toHaveLength(1);
  });

  it("when a key is older than a day, then it has expired and the same key creates anew", async () => {
    const key = crypto.randomUUID();
    const first = await createCustomer(agent, key, customer("Old Key Household"));
    t.clock.offsetMs = 25 * 60 * 60 * 1000;
    try {
      const later = await createCustomer(agent, key, customer("Old Key Household"));
      expect(later.status).toBe(201);
      expect(later.body.customer.id).not.toBe(first.body.customer.id);
    } finally {
      t.clock.offsetMs = 0;
    }
  });
});
