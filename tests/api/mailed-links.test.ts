import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";

/**
 * Every link the product mails is built from the configured public origin, never from a request
 * header: a reset request carrying an attacker's Host and Origin must not mail the real user a
 * link to the attacker's site (the token in it would then reset the password).
 */
const ATTACKER = {
  host: "attacker.example",
  origin: "http://attacker.example",
  "x-forwarded-host": "attacker.example",
  "x-forwarded-proto": "https",
};
const tokenLinks = (text: string | null) => [...(text ?? "").matchAll(/https?:\/\/[^\s/]+/g)].map((m) => m[0]);

let configured: TestApp;
let unconfigured: TestApp;
/** Without APP_ORIGIN (development), the origin is the server's own HOST and PORT. */
const DEFAULT_ORIGIN = "http://127.0.0.1:3998";
beforeAll(async () => {
  configured = await startTestApp();
  unconfigured = await startTestApp({ envOverrides: { APP_ORIGIN: undefined, NODE_ENV: "development", HOST: "127.0.0.1", PORT: "3998" } });
});
afterAll(async () => {
  await configured?.close();
  await unconfigured?.close();
});

describe.each([
  ["APP_ORIGIN is configured", () => configured, ORIGIN],
  ["APP_ORIGIN is not set (development default)", () => unconfigured, DEFAULT_ORIGIN],
])("when %s", (_label, app, expectedOrigin) => {
  it("then a reset requested with an attacker's Host, Origin and X-Forwarded-* mails a link on the configured origin only", async () => {
    const t = app();
    const company = await t.makeCompany();
    const user = await t.makeUser(company.id, "sales");
    const res = await t.request().post("/api/auth/password-reset/request").set(ATTACKER).send({ email: user.email });
    // Refusing the request outright (403) would be safe too; answering it must not mail the attacker's origin.
    expect([202, 403]).toContain(res.status);
    if (res.status === 403) return;
    const mail = await t.waitForMail(user.email, { subjectIncludes: "Reset" });
    expect(mail.text).toContain(`${expectedOrigin}/reset-password?token=`);
    expect(tokenLinks(mail.text)).toEqual([expectedOrigin]);
    expect(mail.text).not.toContain("attacker");
  });

  it("then an invitation sent with an attacker's Origin mails a link on the configured origin only", async () => {
    const t = app();
    const company = await t.makeCompany();
    const owner = await t.makeUser(company.id, "owner");
    const agent = await t.signIn(owner.email);
    const to = `invited-${Date.now()}@test.example`;
    const res = await agent.post("/api/team/invites").set(ATTACKER).send({ email: to, role: "estimator" });
    expect([201, 200, 403]).toContain(res.status);
    if (res.status === 403) return;
    const mail = await t.waitForMail(to);
    expect(mail.text).toContain(`${expectedOrigin}/invite/`);
    expect(tokenLinks(mail.text)).toEqual([expectedOrigin]);
  });
});
