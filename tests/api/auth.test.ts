import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { auditEvents, invites, passwordResets, sessions } from "../../server/db/schema/index.ts";
import { hashToken } from "../../server/lib/tokens.ts";
import { ORIGIN, TEST_PASSWORD, startTestApp, type TestApp } from "../setup/test-app.ts";

let t: TestApp;
let companyId: string;
beforeAll(async () => {
  t = await startTestApp();
  companyId = (await t.makeCompany()).id;
});
afterAll(async () => t?.close());

const post = (path: string, body: unknown) => t.request().post(path).set("origin", ORIGIN).send(body as object);

describe("sign-in", () => {
  it("when the password is right, then it answers the user and company and sets a hardened session cookie", async () => {
    const u = await t.makeUser(companyId, "estimator");
    const res = await post("/api/auth/sign-in", { email: u.email.toUpperCase(), password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email: u.email, role: "estimator" });
    expect(res.body.company.id).toBe(companyId);
    const cookie = String(res.headers["set-cookie"]);
    expect(cookie).toMatch(/eavesight_session=[a-z0-9]+/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).not.toMatch(/Secure/); // plain http on loopback
  });

  it("when served over https (behind a local proxy), then the cookie is Secure", async () => {
    const u = await t.makeUser(companyId, "sales");
    const res = await post("/api/auth/sign-in", { email: u.email, password: TEST_PASSWORD }).set("x-forwarded-proto", "https");
    expect(res.status).toBe(200);
    expect(String(res.headers["set-cookie"])).toMatch(/Secure/);
  });

  it("when the password is wrong or the e-mail unknown, then both answers are identical", async () => {
    const u = await t.makeUser(companyId, "sales");
    const wrong = await post("/api/auth/sign-in", { email: u.email, password: "not the password" });
    const unknown = await post("/api/auth/sign-in", { email: `nobody-${Date.now()}@test.example`, password: "not the password" });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(unknown.body).toEqual(wrong.body);
    const [event] = await t.db.select().from(auditEvents).where(eq(auditEvents.subjectEmail, u.email));
    expect(event?.event).toBe("sign-in-failed");
    expect(event?.ip).toBeTruthy();
  });

  it("when an account fails five times, then it is locked with a 'try again in N minutes' message, and it recovers after the window", async () => {
    const u = await t.makeUser(companyId, "estimator");
    for (let i = 0; i < 5; i++) expect((await post("/api/auth/sign-in", { email: u.email, password: `bad-${i}` })).status).toBe(401);
    const locked = await post("/api/auth/sign-in", { email: u.email, password: TEST_PASSWORD });
    expect(locked.status).toBe(429);
    expect(locked.body.error.message).toMatch(/Try again in 1[45] minutes/);
    t.clock.offsetMs = 16 * 60 * 1000;
    try {
      expect((await post("/api/auth/sign-in", { email: u.email, password: TEST_PASSWORD })).status).toBe(200);
    } finally {
      t.clock.offsetMs = 0;
    }
  });

  it("when a session already exists, then signing in issues a new session id and ends the old one", async () => {
    const u = await t.makeUser(companyId, "owner");
    const agent = await t.signIn(u.email);
    const before = await t.db.select().from(sessions).where(eq(sessions.userId, u.id));
    await agent.post("/api/auth/sign-in").set("origin", ORIGIN).send({ email: u.email, password: TEST_PASSWORD }).expect(200);
    const after = await t.db.select().from(sessions).where(eq(sessions.userId, u.id));
    expect(after).toHaveLength(1);
    expect(after[0]!.id).not.toBe(before[0]!.id);
  });
});

describe("sessions", () => {
  it("when a user signs out, then the session is deleted on the server and the cookie no longer works", async () => {
    const u = await t.makeUser(companyId, "sales");
    const agent = await t.signIn(u.email);
    await agent.get("/api/auth/me").expect(200);
    const cookieBefore = (await t.db.select().from(sessions).where(eq(sessions.userId, u.id)))[0]!.id;
    await agent.post("/api/auth/sign-out").set("origin", ORIGIN).expect(204);
    expect(await t.db.select().from(sessions).where(eq(sessions.userId, u.id))).toHaveLength(0);
    await t.request().get("/api/auth/me").set("cookie", `eavesight_session=${cookieBefore}`).expect(401);
  });

  it("when a user signs out everywhere, then every device's session ends", async () => {
    const u = await t.makeUser(companyId, "estimator");
    const phone = await t.signIn(u.email);
    const desk = await t.signIn(u.email);
    await desk.post("/api/auth/sign-out-everywhere").set("origin", ORIGIN).expect(204);
    await phone.get("/api/auth/me").expect(401);
    await desk.get("/api/auth/me").expect(401);
  });

  it("when the absolute lifetime has passed, then even an active session is refused", async () => {
    const u = await t.makeUser(companyId, "estimator");
    const agent = await t.signIn(u.email);
    t.clock.offsetMs = 15 * 24 * 60 * 60 * 1000;
    try {
      await agent.get("/api/auth/me").expect(401);
    } finally {
      t.clock.offsetMs = 0;
    }
  });

  it("when an owner deactivates a user, then that user's session stops working on the next request", async () => {
    const owner = await t.makeUser(companyId, "owner");
    const victim = await t.makeUser(companyId, "sales");
    const ownerAgent = await t.signIn(owner.email);
    const victimAgent = await t.signIn(victim.email);
    await victimAgent.get("/api/auth/me").expect(200);
    await ownerAgent.post(`/api/team/users/${victim.id}/deactivate`).set("origin", ORIGIN).expect(200);
    await victimAgent.get("/api/auth/me").expect(401);
    expect((await post("/api/auth/sign-in", { email: victim.email, password: TEST_PASSWORD })).status).toBe(401);
  });
});

describe("CSRF", () => {
  it("when a state-changing request comes from another origin or names none, then it is refused", async () => {
    const u = await t.makeUser(companyId, "owner");
    const agent = await t.signIn(u.email);
    const evil = await agent.post("/api/team/invites").set("origin", "http://evil.example").send({ email: "x@test.example", role: "sales" });
    expect(evil.status).toBe(403);
    expect(evil.body.error.code).toBe("cross-origin");
    const none = await agent.post("/api/team/invites").send({ email: "x@test.example", role: "sales" });
    expect(none.status).toBe(403);
    const byReferer = await agent.post("/api/auth/sign-out").set("referer", `${ORIGIN}/settings`);
    expect(byReferer.status).toBe(204);
  });
});

describe("password reset", () => {
  it("when asked for a known or an unknown address, then the answer is the same, and only the known one gets mail", async () => {
    const u = await t.makeUser(companyId, "sales");
    const known = await post("/api/auth/password-reset/request", { email: u.email });
    const unknownEmail = `ghost-${Date.now()}@test.example`;
    const unknown = await post("/api/auth/password-reset/request", { email: unknownEmail });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
    const mail = await t.waitForMail(u.email, { subjectIncludes: "Reset" });
    expect(mail.text).toMatch(/reset-password\?token=/);
    expect(await t.mailCount(unknownEmail)).toBe(0);
  });

  it("when the token from the e-mail is used, then the password changes once, and the token cannot be used again", async () => {
    const u = await t.makeUser(companyId, "estimator");
    const other = await t.signIn(u.email);
    await post("/api/auth/password-reset/request", { email: u.email }).expect(202);
    const mail = await t.waitForMail(u.email, { subjectIncludes: "Reset" });
    const token = /token=([A-Za-z0-9_-]+)/.exec(mail.text ?? "")![1]!;
    // Only the hash is stored.
    const rows = await t.db.select().from(passwordResets).where(eq(passwordResets.userId, u.id));
    expect(rows[0]!.tokenHash).toBe(hashToken(token));
    expect(JSON.stringify(rows)).not.toContain(token);

    await post("/api/auth/password-reset/confirm", { token, password: "a brand new passphrase" }).expect(204);
    await other.get("/api/auth/me").expect(401); // sessions end with the reset
    expect((await post("/api/auth/sign-in", { email: u.email, password: "a brand new passphrase" })).status).toBe(200);
    const reused = await post("/api/auth/password-reset/confirm", { token, password: "another new passphrase" });
    expect(reused.status).toBe(400);
    expect(reused.body.error.code).toBe("invalid-token");
  });

  it("when the token is tampered with or expired, then it is refused", async () => {
    const u = await t.makeUser(companyId, "estimator");
    await post("/api/auth/password-reset/request", { email: u.email }).expect(202);
    const mail = await t.waitForMail(u.email, { subjectIncludes: "Reset" });
    const token = /token=([A-Za-z0-9_-]+)/.exec(mail.text ?? "")![1]!;
    const tampered = token.slice(0, -1) + (token.endsWith("A") ? "B" : "A");
    expect((await post("/api/auth/password-reset/confirm", { token: tampered, password: "a brand new passphrase" })).status).toBe(400);
    t.clock.offsetMs = 61 * 60 * 1000;
    try {
      expect((await post("/api/auth/password-reset/confirm", { token, password: "a brand new passphrase" })).status).toBe(400);
    } finally {
      t.clock.offsetMs = 0;
    }
  });
});

describe("invitations", () => {
  it("when an owner invites someone, then the e-mailed one-time link lets them set a name and password and signs them in with the invited role", async () => {
    const owner = await t.makeUser(companyId, "owner");
    const agent = await t.signIn(owner.email);
    const email = `invitee-${Date.now()}@test.example`;
    const created = await agent.post("/api/team/invites").set("origin", ORIGIN).send({ email, role: "sales" });
    expect(created.status).toBe(201);
    const expiresInDays = (new Date(created.body.invite.expiresAt).getTime() - Date.now()) / 86_400_000;
    expect(expiresInDays).toBeGreaterThan(6.9);
    expect(expiresInDays).toBeLessThanOrEqual(7);
    const mail = await t.waitForMail(email, { subjectIncludes: "invited" });
    const token = /\/invite\/([A-Za-z0-9_-]+)/.exec(mail.text ?? "")![1]!;
    const info = await t.request().get(`/api/auth/invites/${token}`);
    expect(info.body).toMatchObject({ email, role: "sales" });
    const accepted = await post(`/api/auth/invites/${token}/accept`, { name: "Nell Ashgrove", password: "a long invite passphrase" });
    expect(accepted.status).toBe(200);
    expect(accepted.body.user).toMatchObject({ email, name: "Nell Ashgrove", role: "sales" });
    expect((await post(`/api/auth/invites/${token}/accept`, { name: "Again", password: "a long invite passphrase" })).status).toBeGreaterThanOrEqual(400);
    const events = await t.db.select().from(auditEvents).where(eq(auditEvents.subjectEmail, email));
    expect(events.map((e) => e.event)).toEqual(expect.arrayContaining(["invite-sent", "invite-accepted"]));
  });

  it("when an invitation is older than 7 days, then its link is refused as expired", async () => {
    const owner = await t.makeUser(companyId, "owner");
    const agent = await t.signIn(owner.email);
    const email = `late-${Date.now()}@test.example`;
    await agent.post("/api/team/invites").set("origin", ORIGIN).send({ email, role: "estimator" }).expect(201);
    const token = /\/invite\/([A-Za-z0-9_-]+)/.exec((await t.waitForMail(email)).text ?? "")![1]!;
    const [row] = await t.db.select().from(invites).where(eq(invites.email, email));
    expect(row!.tokenHash).toBe(hashToken(token));
    t.clock.offsetMs = 8 * 24 * 60 * 60 * 1000;
    try {
      expect((await t.request().get(`/api/auth/invites/${token}`)).status).toBe(410);
      expect((await post(`/api/auth/invites/${token}/accept`, { name: "Late", password: "a long invite passphrase" })).status).toBe(410);
    } finally {
      t.clock.offsetMs = 0;
    }
  });
});

describe("own profile", () => {
  it("when changing the password, then the current one is required", async () => {
    const u = await t.makeUser(companyId, "sales");
    const agent = await t.signIn(u.email);
    const bad = await agent.post("/api/auth/password").set("origin", ORIGIN).send({ currentPassword: "wrong", newPassword: "a brand new passphrase" });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.currentPassword).toBeTruthy();
    await agent.post("/api/auth/password").set("origin", ORIGIN).send({ currentPassword: TEST_PASSWORD, newPassword: "a brand new passphrase" }).expect(204);
    await agent.get("/api/auth/me").expect(200);
  });

  it("when editing name and unit system, then they are saved", async () => {
    const u = await t.makeUser(companyId, "estimator");
    const agent = await t.signIn(u.email);
    const res = await agent.patch("/api/auth/me").set("origin", ORIGIN).send({ name: "Renamed Person", unitSystem: "metric" });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ name: "Renamed Person", unitSystem: "metric" });
  });
});

describe("bad input on auth routes", () => {
  const huge = "a".repeat(10_000) + "@test.example";
  const cases: [string, unknown][] = [
    ["/api/auth/sign-in", {}],
    ["/api/auth/sign-in", { email: 42, password: true }],
    ["/api/auth/sign-in", { email: huge, password: "x" }],
    ["/api/auth/sign-in", { email: "名前@例え.テスト\u0000", password: "x" }],
    ["/api/auth/sign-in", [1, 2, 3]],
    ["/api/auth/password-reset/request", { email: null }],
    ["/api/auth/password-reset/request", { email: huge }],
    ["/api/auth/password-reset/confirm", { token: "../../etc/passwd", password: "a long enough password" }],
    ["/api/auth/password-reset/confirm", { token: "x".repeat(40), password: "short" }],
    ["/api/auth/invites/not-a-token/accept", { name: "A", password: "a long enough password" }],
  ];
  it.each(cases.map(([path, body]) => [path, JSON.stringify(body).slice(0, 60), body] as const))("when %s gets %s, then it answers 400 with a message", async (path, _label, body) => {
    const res = await post(path, body);
    expect(res.status).toBe(400);
    expect(typeof res.body.error.message).toBe("string");
    expect(res.body.error.message.length).toBeGreaterThan(5);
  });
});
