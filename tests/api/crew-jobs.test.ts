import { afterAll, beforeAll, describe, expect, it } from "vitest";
import sharp from "sharp";
import { mkdirSync, writeFileSync } from "node:fs";
import { eq } from "drizzle-orm";
import type { RouteInfo } from "../../server/lib/routes.ts";
import { outboxMessages, projects, proposalMails } from "../../server/db/schema/index.ts";
import { can } from "../../shared/schemas/roles.ts";
import { ATTIC_SAFETY_CAUTION, COMBUSTION_SAFETY_CAUTION, FAN_SAFETY_CAUTION } from "../../shared/diagnostics/cautions.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, makeTeam, send, type Agent, type Team } from "../setup/survey-fixtures.ts";
import { acceptedProject, makeCrew, signBody } from "../setup/job-fixture.ts";

/**
 * Issue 21, "the crew's day": a crew role that sees only the jobs assigned to it and no prices
 * unless the owner allows; a job sheet of the signed scope and signed change orders only; a
 * checklist ticked with photos (after-photos required where airflow changes); completion that
 * tells the homeowner through the outbox with a link built from APP_ORIGIN.
 */
let t: TestApp;
let team: Team;
let crewA: { user: { id: string; name: string }; agent: Agent };
let crewB: { user: { id: string; name: string }; agent: Agent };
const ids: Record<string, string> = {};
let homeowner = "";
let png: Buffer;

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Tallgrass Exteriors (crew)");
  [crewA, crewB] = await Promise.all([makeCrew(t, team), makeCrew(t, team)]);
  png = await sharp({ create: { width: 40, height: 30, channels: 3, background: "#6a8" } }).png().toBuffer();
  const first = await acceptedProject(t, team, { title: "Farrant attic" });
  const second = await acceptedProject(t, team, { title: "Elsewhere attic" });
  homeowner = first.homeownerEmail;
  Object.assign(ids, { project: first.projectId, proposal: first.proposalId, strip: first.stripId, otherProject: second.projectId });
  // A signed change order (adds 16 ft of strip) and a draft one (never to reach the crew).
  const co = await send(team.asSales, "post", `/api/proposals/${first.proposalId}/change-orders`, { reason: "Garage side soffit found closed", lines: [{ id: "l1", action: "add", catalogItemId: first.stripId, quantity: 16 }] });
  expect(co.status, JSON.stringify(co.body)).toBe(201);
  const coSent = await send(team.asSales, "post", `/api/change-orders/${co.body.changeOrder.id}/send`);
  const coToken = (coSent.body.link as string).split("/c/")[1]!;
  expect((await t.request().post(`/api/public/change-orders/${coToken}/sign`).set("origin", ORIGIN).send(signBody())).status).toBe(200);
  const draft = await send(team.asSales, "post", `/api/proposals/${first.proposalId}/change-orders`, { reason: "Secret draft idea", lines: [{ id: "d1", action: "add", description: "Gold-plated cupola", quantity: 1, unitPriceCents: 99_999 }] });
  expect(draft.status).toBe(201);
});
afterAll(async () => t?.close());

describe("assigning accepted work to a crew", () => {
  it("when the project has no accepted proposal, then assigning answers 409 and says why", async () => {
    const customer = await createCustomer(team.asOwner, { name: "Nobody Yet" });
    const lead = await createProject(team.asEstimator, customer.id, { title: "A lead" });
    const res = await send(team.asSales, "put", `/api/projects/${lead.id}/job`, { crewUserId: crewA.user.id, scheduledFor: "2026-12-08" });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: "not-accepted", message: expect.stringMatching(/accepted/) });
  });

  it("when the chosen person is not a crew member or the date does not exist, then 400 names the field", async () => {
    const notCrew = await send(team.asSales, "put", `/api/projects/${ids.project}/job`, { crewUserId: team.estimator.id, scheduledFor: "2026-12-08" });
    expect(notCrew.status).toBe(400);
    expect(notCrew.body.error.fields).toHaveProperty("crewUserId");
    const badDate = await send(team.asSales, "put", `/api/projects/${ids.project}/job`, { crewUserId: crewA.user.id, scheduledFor: "2027-02-29" });
    expect(badDate.status).toBe(400);
    expect(badDate.body.error.fields).toHaveProperty("scheduledFor");
  });

  it("when sales assigns each accepted project to a crew member with a date, then each crew member lists only its own job", async () => {
    const a = await send(team.asSales, "put", `/api/projects/${ids.project}/job`, { crewUserId: crewA.user.id, scheduledFor: "2026-12-08" });
    expect(a.status, JSON.stringify(a.body)).toBe(200);
    const b = await send(team.asOwner, "put", `/api/projects/${ids.otherProject}/job`, { crewUserId: crewB.user.id, scheduledFor: "2026-12-09" });
    expect(b.status).toBe(200);
    Object.assign(ids, { job: a.body.job.id, otherJob: b.body.job.id });
    const listA = (await crewA.agent.get("/api/jobs").expect(200)).body.jobs;
    expect(listA.map((j: { id: string; title: string; scheduledFor: string }) => [j.id, j.title, j.scheduledFor])).toEqual([[ids.job, "Farrant attic", "2026-12-08"]]);
    const listB = (await crewB.agent.get("/api/jobs").expect(200)).body.jobs;
    expect(listB.map((j: { id: string }) => j.id)).toEqual([ids.otherJob]);
    expect((await team.asSales.get("/api/jobs").expect(200)).body.jobs).toHaveLength(2);
  });
});

/** Bodies that would be accepted on the crew's own job, so only the assignment check can refuse them. */
const VALID_BODIES: Record<string, object> = { "put /api/jobs/:id/items/:itemId": { isDone: false } };

describe("the crew sees nothing outside its jobs (generated from the declared routes)", () => {
  it("when a crew member calls every declared route, then each route without its permission answers 403 and each job route with another crew's job answers 404", async () => {
    const declared = t.app.locals.routes as RouteInfo[];
    const photo = await team.asOwner.post(`/api/projects/${ids.otherProject}/photos`).set("origin", ORIGIN).attach("file", png, "p.png");
    let checked = 0;
    for (const route of declared) {
      // Public routes have no role; the caller's own account routes (sign-out everywhere would end this session) are in auth.test.ts.
      if (route.access === "public" || route.path.startsWith("/api/auth/")) continue;
      const key = `${route.method} ${route.path}`;
      const url = route.path.replace(/:(\w+)/g, (_m, p: string) => {
        if (p === "itemId") return "w1";
        if (p === "photoId") return photo.body.photo.id;
        if (route.path.startsWith("/api/jobs/")) return ids.otherJob!;
        return ids.otherProject!;
      });
      const allowed = route.access === "signed-in" || can("crew", route.access);
      const res = await crewA.agent[route.method](url).set("origin", ORIGIN).send(route.method === "get" ? undefined : VALID_BODIES[key] ?? {});
      if (!allowed) expect(res.status, key).toBe(403);
      else if (route.idParams?.length) expect(res.status, key).toBe(404);
      else expect(JSON.stringify(res.body), key).not.toContain(ids.otherJob);
      checked++;
    }
    expect(checked).toBeGreaterThan(40);
    // Nothing the crew tried changed the other job.
    const other = (await team.asOwner.get(`/api/jobs/${ids.otherJob}`).expect(200)).body;
    expect(other.job.status).toBe("assigned");
    expect(other.checklist.every((i: { isTicked: boolean }) => !i.isTicked)).toBe(true);
  });

  it("when the crew opens its own sheet, then no price, total or balance is in it; when the owner allows prices, the money appears", async () => {
    const sheet = (await crewA.agent.get(`/api/jobs/${ids.job}`).expect(200)).body;
    expect(sheet.money).toBeNull();
    expect(JSON.stringify(sheet)).not.toMatch(/Cents"/);
    await send(team.asOwner, "patch", "/api/company", { isCrewShownPrices: true }).expect(200);
    const priced = (await crewA.agent.get(`/api/jobs/${ids.job}`).expect(200)).body;
    expect(priced.money).toMatchObject({ jobTotalCents: expect.any(Number), balanceCents: expect.any(Number) });
    await send(team.asOwner, "patch", "/api/company", { isCrewShownPrices: false }).expect(200);
  });
});

describe("the job sheet", () => {
  it("when the crew opens the job, then it shows where, who, the signed scope with the signed change order only, what to load and the cautions", async () => {
    const sheet = (await crewA.agent.get(`/api/jobs/${ids.job}`).expect(200)).body;
    expect(sheet.site).toMatchObject({ address: "3 Larch Row, Marrow Creek", mapUrl: "https://www.openstreetmap.org/search?query=3%20Larch%20Row%2C%20Marrow%20Creek" });
    expect(sheet.homeowner).toMatchObject({ name: "Odile Farrant", phone: "555-0142", email: homeowner });
    expect(sheet.scope.optionName).toBe("Soffit strip, fan out");
    expect(sheet.scope.changeOrders.map((c: { number: number; reason: string }) => [c.number, c.reason])).toEqual([[1, "Garage side soffit found closed"]]);
    expect(JSON.stringify(sheet)).not.toMatch(/Gold-plated|Secret draft/);
    // 40 ft signed + 16 ft from the signed change order = 56 ft, bought as 7 pieces of 8 ft (56 ÷ 8 = 7).
    expect(sheet.materials).toEqual([expect.objectContaining({ catalogItemId: ids.strip, quantity: 56, buyCount: 7, buyUnit: "pieces of 8 ft" })]);
    expect(sheet.after[0].picture).toBeTruthy();
    // The fan is removed (prove dead first); the attic has a gas appliance but no powered fan stays, so no combustion caution.
    expect(sheet.cautions).toEqual(expect.arrayContaining([ATTIC_SAFETY_CAUTION, FAN_SAFETY_CAUTION]));
    expect(sheet.cautions).not.toContain(COMBUSTION_SAFETY_CAUTION);
    expect(sheet.deferral).toMatch(/local codes/);
    expect(sheet.checklist.map((i: { id: string; isAirflowChange: boolean }) => [i.id, i.isAirflowChange])).toEqual([["w1", true], [`m-${ids.strip}`, true], ["co1-l1", true]]);
  });
});

describe("checklist and completion", () => {
  it("when an airflow step is ticked without a photo, then 409 asks for one; with a photo it ticks", async () => {
    const res = await send(crewA.agent, "put", `/api/jobs/${ids.job}/items/w1`, { isDone: true });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: "photo-required" });
    const photo = await crewA.agent.post(`/api/jobs/${ids.job}/items/w1/photos`).set("origin", ORIGIN).attach("file", png, "after.png");
    expect(photo.status, JSON.stringify(photo.body)).toBe(201);
    expect((await crewA.agent.get(photo.body.photo.url)).status).toBe(200);
    const ticked = await send(crewA.agent, "put", `/api/jobs/${ids.job}/items/w1`, { isDone: true });
    expect(ticked.status).toBe(200);
    expect(ticked.body.checklist[0]).toMatchObject({ id: "w1", isTicked: true, photos: [expect.objectContaining({ id: photo.body.photo.id })] });
  });

  it("when steps are still open, then completing answers 409 naming each; the office's pipeline still shows the job sold", async () => {
    const res = await send(crewA.agent, "post", `/api/jobs/${ids.job}/complete`);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("checklist-incomplete");
    expect(Object.keys(res.body.error.fields).sort()).toEqual([`checklist.co1-l1`, `checklist.m-${ids.strip}`].sort());
    const [row] = await t.db.select({ status: projects.status }).from(projects).where(eq(projects.id, ids.project!));
    expect(row!.status).toBe("sold");
  });

  it("when every step is ticked with its photo and the crew completes, then the project is completed and the homeowner's e-mail with the report and an APP_ORIGIN link is in the outbox once", async () => {
    for (const itemId of [`m-${ids.strip}`, "co1-l1"]) {
      expect((await crewA.agent.post(`/api/jobs/${ids.job}/items/${itemId}/photos`).set("origin", ORIGIN).attach("file", png, "after.png")).status).toBe(201);
      expect((await send(crewA.agent, "put", `/api/jobs/${ids.job}/items/${itemId}`, { isDone: true })).status).toBe(200);
    }
    const done = await crewA.agent.post(`/api/jobs/${ids.job}/complete`).set("origin", ORIGIN).set("host", "attacker.example").set("x-forwarded-host", "attacker.example").send({});
    expect(done.status, JSON.stringify(done.body)).toBe(200);
    expect(done.body.sheet.job.status).toBe("completed");
    const [row] = await t.db.select({ status: projects.status }).from(projects).where(eq(projects.id, ids.project!));
    expect(row!.status).toBe("completed");
    const mail = await t.waitForMail(homeowner, { subjectIncludes: "finished" });
    const link = /(https?:\/\/\S+\/done\/[A-Za-z0-9_-]+)/.exec(mail.text ?? "")?.[1];
    expect(link?.startsWith(`${ORIGIN}/done/`)).toBe(true);
    expect(mail.text).not.toContain("attacker.example");
    expect(mail.text).toMatch(/Balance due: \$/);
    const stored = await t.db.select().from(outboxMessages).where(eq(outboxMessages.toAddress, homeowner));
    expect(stored.filter((m) => m.subject.includes("finished"))).toHaveLength(1);
    // The fake relay files text only; the queued message shows the report went with it.
    const [queued] = await t.db.select().from(proposalMails).where(eq(proposalMails.dedupeKey, `job-completed:${ids.job}`));
    expect(queued!.payload!.attachments).toEqual([expect.objectContaining({ filename: "completion-report.pdf", contentType: "application/pdf" })]);

    const token = link!.split("/done/")[1]!;
    const page = await t.request().get(`/api/public/completion/${token}`).expect(200);
    expect(page.body.report.installed).toEqual(expect.arrayContaining([expect.stringMatching(/^Change order 1: added/)]));
    expect(page.body.report.balanceCents).toBeGreaterThan(0);
    expect(page.body.photos).toHaveLength(3);
    const pdf = await t.request().get(`/api/public/completion/${token}/pdf`).buffer(true).parse((res, cb) => { const c: Buffer[] = []; res.on("data", (d: Buffer) => c.push(d)); res.on("end", () => cb(null, Buffer.concat(c))); });
    expect(pdf.status).toBe(200);
    expect(pdf.headers["content-type"]).toBe("application/pdf");
    expect((pdf.body as Buffer).subarray(0, 5).toString()).toBe("%PDF-");
    // Kept for a look (pdftoppm): the report is one page.
    mkdirSync(".var/screenshots", { recursive: true });
    writeFileSync(".var/screenshots/completion-report.pdf", pdf.body as Buffer);
    expect(/\/Type\s*\/Page[^s]/.exec((pdf.body as Buffer).toString("latin1"))).not.toBeNull();
    expect((await t.request().get(`/api/public/completion/${"x".repeat(43)}`)).status).toBe(404);
  });

  it("when the job is completed, then ticking, adding photos, completing again and reassigning are refused with 409", async () => {
    expect((await send(crewA.agent, "put", `/api/jobs/${ids.job}/items/w1`, { isDone: false })).status).toBe(409);
    expect((await crewA.agent.post(`/api/jobs/${ids.job}/items/w1/photos`).set("origin", ORIGIN).attach("file", png, "late.png")).status).toBe(409);
    expect((await send(crewA.agent, "post", `/api/jobs/${ids.job}/complete`)).status).toBe(409);
    expect((await send(team.asSales, "put", `/api/projects/${ids.project}/job`, { crewUserId: crewB.user.id, scheduledFor: "2026-12-10" })).status).toBe(409);
  });
});
