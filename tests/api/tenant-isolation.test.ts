import { afterAll, beforeAll, describe, expect, it } from "vitest";
import sharp from "sharp";
import type { RouteInfo } from "../../server/lib/routes.ts";
import { eq } from "drizzle-orm";
import { changeOrders, payments, proposals } from "../../server/db/schema/index.ts";
import { can, ROLES } from "../../shared/schemas/roles.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, createSpace, mainAttic, makeTeam, type Agent, type Team } from "../setup/survey-fixtures.ts";

let t: TestApp;
let tallgrass: Team;
let bluestem: Team;
const ids: Record<string, string> = {};
let png: Buffer;

beforeAll(async () => {
  t = await startTestApp();
  [tallgrass, bluestem] = await Promise.all([makeTeam(t, "Tallgrass-like"), makeTeam(t, "Bluestem-like")]);
  png = await sharp({ create: { width: 8, height: 8, channels: 3, background: "#888" } }).png().toBuffer();
  const customer = await createCustomer(tallgrass.asOwner, { name: "Zephyrine Oddly-Unique" });
  const project = await createProject(tallgrass.asOwner, customer.id, { title: "Qwertyuiop attic" });
  const space = await createSpace(tallgrass.asOwner, project.id, mainAttic);
  const second = await createSpace(tallgrass.asOwner, project.id, mainAttic);
  const photo = await tallgrass.asOwner.post(`/api/projects/${project.id}/photos`).set("origin", ORIGIN).attach("file", png, "p.png");
  const invite = await tallgrass.asOwner.post("/api/team/invites").set("origin", ORIGIN).send({ email: `pending-${Date.now()}@test.example`, role: "estimator" });
  const item = await tallgrass.asOwner.post("/api/catalog").set("origin", ORIGIN)
    .send({ sku: "QW-RIDGE", name: "Qwerty ridge vent", kind: "ridge", unit: "linear-ft", nfaSqInPerFt: 18, soldInLengthFt: 4, materialCostCents: 300, sellPriceCents: 900 });
  const option = await tallgrass.asOwner.post(`/api/projects/${project.id}/options`).set("origin", ORIGIN).send({
    name: "Qwerty option",
    spaces: [{ spaceId: space.id, ventActions: { "fan-1": "remove" }, added: [{ id: "a1", catalogItemId: item.body.item.id, quantity: 12 }] }],
  });
  // A rendered draft proposal (so its PDF reads 200) and a company logo, for the proposal routes.
  await tallgrass.asOwner.post("/api/company/logo").set("origin", ORIGIN).attach("file", png, "logo.png");
  const proposal = await tallgrass.asOwner.post(`/api/projects/${project.id}/proposals`).set("origin", ORIGIN).send({ optionIds: [option.body.option.id] });
  await tallgrass.asOwner.post(`/api/proposals/${proposal.body.proposal.id}/render`).set("origin", ORIGIN).send({});
  for (let i = 0; i < 100; i++) {
    const status = (await tallgrass.asOwner.get(`/api/proposals/${proposal.body.proposal.id}/render-status`)).body.render?.status;
    if (status === "ready" || status === "failed") break;
    await new Promise((r) => setTimeout(r, 200));
  }
  ids.proposal = proposal.body.proposal.id;
  // A paid deposit row of the first company (as a webhook would leave it), for the payment routes.
  const [payment] = await t.db.insert(payments).values({ companyId: tallgrass.company.id, proposalId: proposal.body.proposal.id as string, optionId: option.body.option.id, amountCents: 10_000, status: "paid", paymentIntentId: "pi_test_tenant_matrix" }).returning();
  ids.payment = payment!.id;
  // A sent change order row of the first company (its PDF is the rendered proposal's file), for the change-order routes.
  const [rendered] = await t.db.select().from(proposals).where(eq(proposals.id, ids.proposal!));
  const [changeOrder] = await t.db.insert(changeOrders).values({
    companyId: tallgrass.company.id, projectId: project.id, proposalId: ids.proposal!, number: 1, status: "sent", reason: "Qwerty change", pdfKey: rendered!.pdfKey, pdfSha256: `co-${rendered!.pdfSha256}`,
  }).returning();
  ids.changeOrder = changeOrder!.id;
  Object.assign(ids, {
    customer: customer.id, project: project.id, space: space.id, secondSpace: second.id, photo: photo.body.photo.id, invite: invite.body.invite.id,
    catalogItem: item.body.item.id, option: option.body.option.id,
  });
});
afterAll(async () => t?.close());

/** A body that would be accepted from the owner company, so only the tenant check can refuse it. */
const BODIES: Record<string, () => Record<string, unknown> | "multipart" | undefined> = {
  "get /api/customers/:id": () => undefined,
  "patch /api/customers/:id": () => ({ name: "Taken over" }),
  "delete /api/customers/:id": () => undefined,
  "get /api/projects/:id": () => undefined,
  "patch /api/projects/:id": () => ({ version: 1, title: "Taken over" }),
  "get /api/projects/:id/analysis": () => undefined,
  "post /api/projects/:id/spaces": () => ({ name: "Intruder attic" }),
  "put /api/projects/:id/spaces/:spaceId": () => ({ ...mainAttic, version: 1 }),
  "delete /api/projects/:id/spaces/:spaceId": () => undefined,
  "post /api/projects/:id/spaces/:spaceId/copy-vents": () => ({ fromSpaceId: ids.secondSpace }),
  "post /api/projects/:id/photos": () => "multipart",
  "get /api/photos/:id": () => undefined,
  "patch /api/photos/:id": () => ({ caption: "Taken over" }),
  "delete /api/photos/:id": () => undefined,
  "patch /api/team/users/:id": () => ({ role: "sales" }),
  "post /api/team/users/:id/deactivate": () => undefined,
  "post /api/team/users/:id/reactivate": () => undefined,
  "delete /api/team/invites/:id": () => undefined,
  "patch /api/catalog/:id": () => ({ sellPriceCents: 1, isActive: false }),
  "get /api/projects/:id/options": () => undefined,
  "post /api/projects/:id/options": () => ({ name: "Intruder option" }),
  "post /api/projects/:id/options/generate": () => ({}),
  "get /api/options/:id": () => undefined,
  "patch /api/options/:id": () => ({ version: 1, name: "Taken over" }),
  "delete /api/options/:id": () => undefined,
  "post /api/options/:id/copy": () => undefined,
  "get /api/options/:id/materials": () => undefined,
  "get /api/projects/:id/proposals": () => undefined,
  "post /api/projects/:id/proposals": () => ({ optionIds: [ids.option] }),
  "get /api/proposals/:id": () => undefined,
  "patch /api/proposals/:id": () => ({ version: 1, coverNote: "Taken over" }),
  "post /api/proposals/:id/render": () => undefined,
  "get /api/proposals/:id/render-status": () => undefined,
  "get /api/proposals/:id/pdf": () => undefined,
  "post /api/proposals/:id/send": () => undefined,
  "post /api/proposals/:id/revoke-link": () => undefined,
  "post /api/proposals/:id/resend": () => ({}),
  "post /api/proposals/:id/reissue-link": () => ({}),
  "get /api/proposals/:id/payments": () => undefined,
  "post /api/payments/:id/refund": () => undefined,
  "get /api/proposals/:id/change-orders": () => undefined,
  "post /api/proposals/:id/change-orders": () => ({ reason: "Taken over", lines: [{ id: "l1", action: "add", description: "x", quantity: 1, unitPriceCents: 100 }] }),
  "put /api/change-orders/:id": () => ({ version: 1, reason: "Taken over", lines: [{ id: "l1", action: "add", description: "x", quantity: 1, unitPriceCents: 100 }] }),
  "post /api/change-orders/:id/send": () => undefined,
  "get /api/change-orders/:id/pdf": () => undefined,
};

function urlFor(route: RouteInfo, id: (param: string, route: RouteInfo) => string) {
  return route.path.replace(/:(\w+)/g, (_, param: string) => id(param, route));
}
const realId = (param: string, route: RouteInfo) => {
  if (param === "spaceId") return ids.space!;
  if (route.path.startsWith("/api/customers")) return ids.customer!;
  if (route.path.startsWith("/api/photos")) return ids.photo!;
  if (route.path.startsWith("/api/team/users")) return tallgrass.sales.id;
  if (route.path.startsWith("/api/team/invites")) return ids.invite!;
  if (route.path.startsWith("/api/catalog")) return ids.catalogItem!;
  if (route.path.startsWith("/api/options")) return ids.option!;
  if (route.path.startsWith("/api/proposals")) return ids.proposal!;
  if (route.path.startsWith("/api/payments")) return ids.payment!;
  if (route.path.startsWith("/api/change-orders")) return ids.changeOrder!;
  return ids.project!;
};

function call(agent: Agent, route: RouteInfo, url: string) {
  const body = BODIES[`${route.method} ${route.path}`]!();
  const req = agent[route.method](url).set("origin", ORIGIN);
  if (body === "multipart") return req.attach("file", png, "p.png");
  return body ? req.send(body) : req;
}

const idRoutes = () => (t.app.locals.routes as RouteInfo[]).filter((r) => r.idParams?.length);

describe("tenant isolation (generated from the declared routes)", () => {
  it("when a route takes an id, then this test has a request body for it (so a new route cannot skip the check)", () => {
    const declared = idRoutes().map((r) => `${r.method} ${r.path}`);
    expect(declared.length).toBeGreaterThanOrEqual(18);
    expect(declared.filter((key) => !(key in BODIES))).toEqual([]);
  });

  it("when another company's owner uses the first company's ids on every id-taking route, then each answers 404 and nothing changes", async () => {
    for (const route of idRoutes()) {
      const res = await call(bluestem.asOwner, route, urlFor(route, realId));
      expect(res.status, `${route.method} ${route.path}`).toBe(404);
      expect(res.body.error?.code, `${route.method} ${route.path}`).toMatch(/not-found/);
    }
    const detail = await tallgrass.asOwner.get(`/api/projects/${ids.project}`).expect(200);
    expect(detail.body.project).toMatchObject({ title: "Qwertyuiop attic", version: 1 });
    expect(detail.body.customer.name).toBe("Zephyrine Oddly-Unique");
    expect(detail.body.spaces.map((s: { version: number; vents: unknown[] }) => [s.version, s.vents.length])).toEqual([[1, 3], [1, 3]]);
    expect(detail.body.photos).toHaveLength(1);
    expect(detail.body.photos[0].caption).toBeNull();
    const catalog = (await tallgrass.asOwner.get("/api/catalog").expect(200)).body.items;
    expect(catalog.map((i: { id: string; sellPriceCents: number; isActive: boolean }) => [i.id, i.sellPriceCents, i.isActive])).toEqual([[ids.catalogItem, 900, true]]);
    const options = (await tallgrass.asOwner.get(`/api/projects/${ids.project}/options`).expect(200)).body.options;
    expect(options.map((o: { id: string; name: string; version: number }) => [o.id, o.name, o.version])).toEqual([[ids.option, "Qwerty option", 1]]);
  });

  it("when an id in the path is malformed or path-like, then every id-taking route answers 404 too", async () => {
    for (const route of idRoutes()) {
      const res = await call(tallgrass.asOwner, route, urlFor(route, () => "..%2F..%2Fetc%2Fpasswd"));
      expect(res.status, `${route.method} ${route.path}`).toBe(404);
    }
  });

  it("when the other company lists and searches, then none of the first company's rows appear", async () => {
    expect((await bluestem.asOwner.get("/api/projects?q=qwertyuiop")).body).toMatchObject({ items: [], total: 0 });
    expect((await bluestem.asOwner.get("/api/projects")).body.total).toBe(0);
    expect((await bluestem.asOwner.get("/api/customers?q=zephyrine")).body).toMatchObject({ items: [], total: 0 });
    const users = (await bluestem.asOwner.get("/api/users")).body.map((u: { id: string }) => u.id);
    expect(users.sort()).toEqual([bluestem.owner.id, bluestem.estimator.id, bluestem.sales.id].sort());
    expect((await bluestem.asOwner.get(`/api/projects?estimatorId=${tallgrass.estimator.id}`)).body.total).toBe(0);
    expect((await bluestem.asOwner.get("/api/catalog?q=qwerty&includeInactive=true")).body.items).toEqual([]);
    expect((await bluestem.asOwner.get("/api/catalog/export.csv")).text).not.toContain("QW-RIDGE");
  });
});

describe("roles (generated from the declared routes and shared/schemas/roles.ts)", () => {
  it("when each role calls each declared route of its own company, then exactly the roles without the permission get 403", async () => {
    const declared = t.app.locals.routes as RouteInfo[];
    for (const role of ROLES) {
      const agent = { owner: tallgrass.asOwner, estimator: tallgrass.asEstimator, sales: tallgrass.asSales }[role];
      // Public routes (sign-in, reset, invitations) have no role to check; they are covered in auth.test.ts.
      for (const route of declared) {
        if (route.access === "public") continue;
        const allowed = route.access === "signed-in" || can(role, route.access);
        // Writes are only tried where they must be refused, so the first company's rows stay as they are.
        if (allowed && route.method !== "get") continue;
        const key = `${route.method} ${route.path}`;
        const res = key in BODIES ? await call(agent, route, urlFor(route, realId)) : await agent[route.method](route.path).set("origin", ORIGIN).send({});
        if (allowed) expect(res.status, `${role} ${key}`).toBe(200);
        else expect(res.status, `${role} ${key}`).toBe(403);
      }
    }
    expect((await tallgrass.asOwner.get(`/api/projects/${ids.project}`)).body.project.version).toBe(1);
    const team = (await tallgrass.asOwner.get("/api/team")).body;
    expect(team.users.find((u: { id: string }) => u.id === tallgrass.sales.id)).toMatchObject({ role: "sales", isActive: true });
    expect(team.invites.map((i: { id: string }) => i.id)).toContain(ids.invite);
  });

  it("when the route list is read, then every route but the public ones names a permission or signed-in", () => {
    const declared = t.app.locals.routes as RouteInfo[];
    const keys = declared.map((r) => `${r.method} ${r.path}`);
    expect(keys).toEqual(expect.arrayContaining(["post /api/auth/sign-in", "get /api/team", "get /api/outbox", "get /api/projects"]));
    expect(new Set(keys).size).toBe(keys.length);
    const publicRoutes = declared.filter((r) => r.access === "public").map((r) => r.path);
    // The payment provider's webhook has no session either: it is verified by its signature (payments.test.ts).
    expect(publicRoutes.filter((p) => !p.startsWith("/api/auth/") && !p.startsWith("/api/public/"))).toEqual(["/api/webhooks/payments"]);
  });
});
