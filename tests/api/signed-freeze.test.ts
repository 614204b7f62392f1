import { afterAll, beforeAll, describe, expect, it } from "vitest";
import sharp from "sharp";
import { eq, sql } from "drizzle-orm";
import type { RouteInfo } from "../../server/lib/routes.ts";
import { designOptions, proposals } from "../../server/db/schema/index.ts";
import { ESIGN_CONSENT_VERSION } from "../../shared/proposals/disclosures.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createProject, createSpace, mainAttic, makeTeam, send, type Team } from "../setup/survey-fixtures.ts";

/**
 * Issue 14, "signed stays signed": once the homeowner accepts, the accepted option, the accepted
 * revision and the crew's materials list are read-only on every route. The routes come from the
 * app's own declared list (DEVELOPERS.md decision 7), so a write route added later fails here
 * until someone says whether it can touch signed work.
 */
let t: TestApp;
let team: Team;
const ids: Record<string, string> = {};
let token = "";
let png: Buffer;

const acceptBody = (optionId: string) => ({ optionId, signerName: "Odile Farrant", signature: { typed: "Odile Farrant" }, consent: { esign: true, consentTextVersion: ESIGN_CONSENT_VERSION } });
const pub = (url: string) => t.request().post(url).set("origin", ORIGIN);

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Tallgrass Exteriors (freeze test)");
  png = await sharp({ create: { width: 16, height: 16, channels: 3, background: "#445566" } }).png().toBuffer();
  await send(team.asSales, "put", "/api/auth/me/signature", { typed: "Test sales" }).expect(200);
  const customer = await send(team.asOwner, "post", "/api/customers", { name: "Odile Farrant", email: `odile-${Date.now()}@homeowner.example` });
  const project = await createProject(team.asEstimator, customer.body.customer.id, { title: "Frozen attic", siteAddress: "3 Larch Row, Marrow Creek" });
  const space = await createSpace(team.asEstimator, project.id, mainAttic);
  const second = await createSpace(team.asEstimator, project.id, { ...mainAttic, name: "Garage attic" });
  const strip = await send(team.asOwner, "post", "/api/catalog", { sku: "SS-8", name: "Continuous soffit strip, 8 ft", kind: "soffit-continuous", unit: "linear-ft", nfaSqInPerFt: 9, soldInLengthFt: 8, materialCostCents: 150, sellPriceCents: 400 });
  const ridge = await send(team.asOwner, "post", "/api/catalog", { sku: "RV-4", name: "Shingle-over ridge vent, 4 ft", kind: "ridge", unit: "linear-ft", nfaSqInPerFt: 18, soldInLengthFt: 4, materialCostCents: 300, sellPriceCents: 900 });
  const chosen = await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, {
    name: "Soffit strip, fan removed",
    spaces: [{ spaceId: space.id, ventActions: { "fan-1": "remove" }, added: [{ id: "a1", catalogItemId: strip.body.item.id, quantity: 40 }] }],
    laborLines: [{ id: "l1", description: "Cut the soffit slot", hours: 3, rateCents: 9_000 }],
    discount: { kind: "percent", basisPoints: 500 },
  });
  const other = await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, {
    name: "Ridge vent only", spaces: [{ spaceId: space.id, ventActions: {}, added: [{ id: "a1", catalogItemId: ridge.body.item.id, quantity: 36 }] }],
  });
  expect(chosen.status, JSON.stringify(chosen.body)).toBe(201);
  expect(other.status, JSON.stringify(other.body)).toBe(201);
  const photo = await team.asEstimator.post(`/api/projects/${project.id}/photos`).set("origin", ORIGIN).attach("file", png, "eave.png");
  expect(photo.status, JSON.stringify(photo.body)).toBe(201);
  const draft = await send(team.asSales, "post", `/api/projects/${project.id}/proposals`, { optionIds: [chosen.body.option.id, other.body.option.id] });
  const withPhoto = await send(team.asSales, "patch", `/api/proposals/${draft.body.proposal.id}`, { version: draft.body.proposal.version, photoIds: [photo.body.photo.id] });
  expect(withPhoto.status, JSON.stringify(withPhoto.body)).toBe(200);
  const sent = await send(team.asSales, "post", `/api/proposals/${draft.body.proposal.id}/send`);
  expect(sent.status, JSON.stringify(sent.body)).toBe(200);
  token = (sent.body.link as string).split("/p/")[1]!;
  const accepted = await pub(`/api/public/proposals/${token}/accept`).send(acceptBody(chosen.body.option.id));
  expect(accepted.status, JSON.stringify(accepted.body)).toBe(200);
  Object.assign(ids, {
    project: project.id, space: space.id, secondSpace: second.id, strip: strip.body.item.id, ridge: ridge.body.item.id,
    chosen: chosen.body.option.id, other: other.body.option.id, photo: photo.body.photo.id, proposal: draft.body.proposal.id, customer: customer.body.customer.id,
  });
});
afterAll(async () => t?.close());

/** Everything the homeowner signed and the crew works from, as the API shows it. */
async function signedState() {
  const option = async (id: string) => {
    const o = (await team.asOwner.get(`/api/options/${id}`).expect(200)).body.option;
    // The live price follows today's catalog; the lock carries the price the homeowner signed.
    return { name: o.name, notes: o.notes, spaces: o.spaces, laborLines: o.laborLines, discount: o.discount, version: o.version, lock: o.lock };
  };
  const materials = (await team.asOwner.get(`/api/options/${ids.chosen}/materials`).expect(200)).body;
  const detail = (await team.asOwner.get(`/api/proposals/${ids.proposal}`).expect(200)).body;
  return {
    chosen: await option(ids.chosen!),
    other: await option(ids.other!),
    materials: { items: materials.materials.items, work: materials.materials.work, release: materials.release },
    proposal: { status: detail.proposal.status, revision: detail.proposal.revision, snapshotSha256: detail.proposal.snapshotSha256, acceptance: detail.proposal.acceptance, supersededBy: detail.proposal.supersededBy, optionIds: detail.proposal.optionIds },
    snapshot: detail.snapshot,
  };
}

type Call = () => PromiseLike<{ status: number; body: { error?: { code: string; message: string } } }>;
/**
 * Every write route of the app: either it can touch signed work and must refuse (each call listed
 * answers 409), or it cannot, and the calls listed (aimed as close to the signed work as the route
 * allows) must leave it exactly as it was.
 */
const ROUTES: Record<string, { refuses: Call[] } | { leavesAlone: string; calls?: Call[] }> = {
  "patch /api/options/:id": { refuses: [
    () => send(team.asSales, "patch", `/api/options/${ids.chosen}`, { version: 1, spaces: [{ spaceId: ids.space, ventActions: {}, added: [{ id: "a1", catalogItemId: ids.strip, quantity: 48 }] }] }),
    () => send(team.asOwner, "patch", `/api/options/${ids.chosen}`, { version: 1, discount: { kind: "percent", basisPoints: 2_000 } }),
    () => send(team.asOwner, "patch", `/api/options/${ids.chosen}`, { version: 1, laborLines: [] }),
    () => send(team.asOwner, "patch", `/api/options/${ids.chosen}`, { version: 1, name: "Renamed" }),
    () => send(team.asOwner, "patch", `/api/options/${ids.other}`, { version: 1, spaces: [] }),
  ] },
  "delete /api/options/:id": { refuses: [() => send(team.asOwner, "delete", `/api/options/${ids.chosen}`), () => send(team.asOwner, "delete", `/api/options/${ids.other}`)] },
  "patch /api/proposals/:id": { refuses: [
    () => send(team.asSales, "patch", `/api/proposals/${ids.proposal}`, { version: 3, coverNote: "New prices." }),
    () => send(team.asSales, "patch", `/api/proposals/${ids.proposal}`, { version: 3, optionIds: [ids.other] }),
  ] },
  "post /api/proposals/:id/render": { refuses: [() => send(team.asSales, "post", `/api/proposals/${ids.proposal}/render`)] },
  "post /api/proposals/:id/send": { refuses: [() => send(team.asSales, "post", `/api/proposals/${ids.proposal}/send`)] },
  "post /api/public/proposals/:token/accept": { refuses: [() => pub(`/api/public/proposals/${token}/accept`).send(acceptBody(ids.other!))] },
  "post /api/public/proposals/:token/decline": { refuses: [() => pub(`/api/public/proposals/${token}/decline`).send({ reason: "changed my mind" })] },
  "delete /api/photos/:id": { refuses: [() => send(team.asOwner, "delete", `/api/photos/${ids.photo}`)] },

  "patch /api/catalog/:id": { leavesAlone: "prices and names apply to new work; the signed list was frozen when sent", calls: [
    () => send(team.asOwner, "patch", `/api/catalog/${ids.strip}`, { sellPriceCents: 999, name: "Renamed strip", soldInLengthFt: 4 }),
  ] },
  "put /api/projects/:id/spaces/:spaceId": { leavesAlone: "the survey records the attic; the signed work was frozen when sent", calls: [
    () => send(team.asEstimator, "put", `/api/projects/${ids.project}/spaces/${ids.space}`, { ...mainAttic, name: "Renamed attic", vents: mainAttic.vents.slice(0, 1), version: 1 }),
  ] },
  "delete /api/projects/:id/spaces/:spaceId": { leavesAlone: "as above", calls: [() => send(team.asOwner, "delete", `/api/projects/${ids.project}/spaces/${ids.secondSpace}`)] },
  "post /api/projects/:id/spaces/:spaceId/copy-vents": { leavesAlone: "as above" },
  "post /api/projects/:id/spaces": { leavesAlone: "as above" },
  "patch /api/projects/:id": { leavesAlone: "project details are not the signed document", calls: [async () => {
    const { version } = (await team.asOwner.get(`/api/projects/${ids.project}`)).body.project;
    return send(team.asOwner, "patch", `/api/projects/${ids.project}`, { version, title: "Renamed project" });
  }] },
  "patch /api/photos/:id": { leavesAlone: "captions are copied into the snapshot at sending", calls: [() => send(team.asOwner, "patch", `/api/photos/${ids.photo}`, { caption: "Changed" })] },
  "post /api/options/:id/copy": { leavesAlone: "makes a new draft option", calls: [() => send(team.asSales, "post", `/api/options/${ids.chosen}/copy`)] },
  "post /api/projects/:id/options": { leavesAlone: "makes a new draft option" },
  "post /api/proposals/:id/change-orders": { leavesAlone: "drafts a change order: only a signed one changes the work (change-orders.test.ts)", calls: [
    () => send(team.asSales, "post", `/api/proposals/${ids.proposal}/change-orders`, { reason: "Rotted decking found under the ridge", lines: [{ id: "l1", action: "add", catalogItemId: ids.strip, quantity: 16 }] }),
  ] },
  "put /api/change-orders/:id": { leavesAlone: "edits a draft change order" },
  "post /api/change-orders/:id/send": { leavesAlone: "sends a change order for signing; unsigned, it changes nothing" },
  "post /api/public/change-orders/:token/sign": { leavesAlone: "the signed change is the one way signed work changes (change-orders.test.ts)" },
  "post /api/public/change-orders/:token/decline": { leavesAlone: "a declined change order changes nothing (change-orders.test.ts)" },
  "post /api/projects/:id/options/generate": { leavesAlone: "saves nothing" },
  "post /api/projects/:id/proposals": { leavesAlone: "makes a new draft proposal" },
  "post /api/proposals/:id/resend": { leavesAlone: "an accepted proposal is not resent; a new link is issued instead (proposal-links.test.ts)", calls: [
    () => send(team.asSales, "post", `/api/proposals/${ids.proposal}/resend`),
  ] },
  "post /api/proposals/:id/revoke-link": { leavesAlone: "changes who may open the link, not what was signed (proposal-links.test.ts)", calls: [
    () => send(team.asSales, "post", `/api/proposals/${ids.proposal}/revoke-link`),
  ] },
  "post /api/proposals/:id/reissue-link": { leavesAlone: "a new link shows what was signed; the acceptance is not a link column (proposal-links.test.ts)", calls: [
    () => send(team.asSales, "post", `/api/proposals/${ids.proposal}/reissue-link`),
  ] },
  "post /api/public/proposals/:token/deposit/checkout": { leavesAlone: "payments have their own records (payments.test.ts)" },
  "post /api/webhooks/payments": { leavesAlone: "as above" },
  "post /api/payments/:id/refund": { leavesAlone: "as above" },
  "post /api/public/verify": { leavesAlone: "reads only" },
  "delete /api/customers/:id": { leavesAlone: "a customer with projects cannot be deleted", calls: [() => send(team.asOwner, "delete", `/api/customers/${ids.customer}`)] },
  "patch /api/customers/:id": { leavesAlone: "the customer's name is copied into the snapshot at sending" },
  "post /api/customers": { leavesAlone: "new rows only" },
  "post /api/projects": { leavesAlone: "new rows only" },
  "post /api/projects/:id/photos": { leavesAlone: "new rows only" },
  "post /api/catalog": { leavesAlone: "new rows only" },
  "post /api/catalog/import": { leavesAlone: "updates catalog rows like PATCH /catalog/:id" },
  "patch /api/company": { leavesAlone: "the profile is copied into the snapshot at sending" },
  "post /api/company/logo": { leavesAlone: "the logo's hash and key are copied into the snapshot at sending" },
  "put /api/auth/me/signature": { leavesAlone: "the seller's signature is copied into the snapshot at sending" },
  "post /api/auth/sign-in": { leavesAlone: "accounts" },
  "post /api/auth/sign-out": { leavesAlone: "accounts" },
  "post /api/auth/sign-out-everywhere": { leavesAlone: "accounts" },
  "patch /api/auth/me": { leavesAlone: "accounts" },
  "post /api/auth/password": { leavesAlone: "accounts" },
  "post /api/auth/password-reset/request": { leavesAlone: "accounts" },
  "post /api/auth/password-reset/confirm": { leavesAlone: "accounts" },
  "post /api/auth/invites/:token/accept": { leavesAlone: "accounts" },
  "post /api/team/invites": { leavesAlone: "accounts" },
  "delete /api/team/invites/:id": { leavesAlone: "accounts" },
  "patch /api/team/users/:id": { leavesAlone: "accounts" },
  "post /api/team/users/:id/deactivate": { leavesAlone: "accounts" },
  "post /api/team/users/:id/reactivate": { leavesAlone: "accounts" },
};

const writeRoutes = () => (t.app.locals.routes as RouteInfo[]).filter((r) => r.method !== "get").map((r) => `${r.method} ${r.path}`);

describe("signed work is frozen (routes from the declared list)", () => {
  it("when the app declares a write route, then this test says whether it can touch signed work", () => {
    expect(writeRoutes().filter((key) => !(key in ROUTES))).toEqual([]);
    expect(Object.keys(ROUTES).filter((key) => !writeRoutes().includes(key))).toEqual([]);
  });

  it("when anyone tries to change the accepted option, the offered ones, the accepted revision or its photos, then each answers 409 saying what to do, and nothing signed changes", async () => {
    const before = await signedState();
    expect(before.proposal.status).toBe("accepted");
    expect(before.materials.release).toMatchObject({ proposalId: ids.proposal, revision: 1 });
    expect(before.materials.items).toEqual([expect.objectContaining({ sku: "SS-8", quantity: 40, buyCount: 5 })]);

    for (const [key, rule] of Object.entries(ROUTES)) {
      if ("refuses" in rule) {
        for (const call of rule.refuses) {
          const res = await call();
          expect(res.status, `${key}: ${JSON.stringify(res.body)}`).toBe(409);
          if (!key.includes("/public/")) {
            expect(res.body.error?.code, key).toBe("accepted-locked");
            expect(res.body.error?.message, key).toMatch(/change order|copy/i);
          }
        }
      } else {
        for (const call of rule.calls ?? []) {
          const res = await call();
          expect(res.status, `${key}: ${JSON.stringify(res.body)}`).toBeLessThan(500);
        }
      }
    }
    expect(await signedState()).toEqual(before);
    // The PDF the homeowner signed is still served by its recorded hash (once its render has run:
    // on a loaded machine the job may still be drawing it).
    const renderDeadline = Date.now() + 60_000;
    while (Date.now() < renderDeadline && (await team.asOwner.get(`/api/proposals/${ids.proposal}/render-status`)).body.render?.status !== "ready") {
      await new Promise((r) => setTimeout(r, 250));
    }
    const pdf = await team.asOwner.get(`/api/proposals/${ids.proposal}/pdf?kind=original`);
    expect(pdf.status).toBe(200);
    expect(pdf.headers["x-content-sha256"]).toBe((await t.db.select().from(proposals).where(eq(proposals.id, ids.proposal!)))[0]!.pdfSha256);
  }, 120_000);

  it("when the accepted option is read, then it carries the lock and its reason; an offered one says to copy it", async () => {
    const chosen = (await team.asOwner.get(`/api/options/${ids.chosen}`).expect(200)).body.option;
    expect(chosen.lock).toMatchObject({ reason: "accepted", proposalId: ids.proposal, revision: 1 });
    expect(chosen.lock.message).toMatch(/change order/);
    // The card shows what was signed: 40 ft of strip at $4.00 + 3 h at $90.00, less 5 %.
    expect(chosen.lock.signedPrice).toMatchObject({ subtotalCents: 16_000 + 27_000, discountCents: 2_150, totalCents: 40_850 });
    const other = (await team.asOwner.get(`/api/options/${ids.other}`).expect(200)).body.option;
    expect(other.lock).toMatchObject({ reason: "offered", proposalId: ids.proposal, revision: 1 });
    expect(other.lock.message).toMatch(/copy/i);
    const listed = (await team.asOwner.get(`/api/projects/${ids.project}/options`).expect(200)).body.options;
    expect(listed.find((o: { id: string }) => o.id === ids.chosen).lock.reason).toBe("accepted");
  });

  it("when an offered option is copied, then the copy is a new draft that can be edited and the original stays", async () => {
    const copy = await send(team.asSales, "post", `/api/options/${ids.other}/copy`);
    expect(copy.status, JSON.stringify(copy.body)).toBe(201);
    expect(copy.body.option).toMatchObject({ name: "Ridge vent only (copy)", lock: null });
    expect(copy.body.option.id).not.toBe(ids.other);
    const edited = await send(team.asSales, "patch", `/api/options/${copy.body.option.id}`, { version: copy.body.option.version, spaces: [] });
    expect(edited.status, JSON.stringify(edited.body)).toBe(200);
  });

  it("when code other than the API writes to a released option or an accepted revision, then the database refuses it", async () => {
    /** The driver's error under Drizzle's wrapper: SQLSTATE 23001 from migration 0015's triggers. */
    const refusal = async (write: PromiseLike<unknown>) => {
      try {
        await write;
      } catch (err) {
        const cause = (err as { cause?: { code?: string; message?: string } }).cause;
        return { code: cause?.code, message: cause?.message };
      }
      return "written";
    };
    const refused = { code: "23001", message: expect.stringMatching(/signed work is read-only\); draft a change order/) };
    expect(await refusal(t.db.update(designOptions).set({ laborLines: [] }).where(eq(designOptions.id, ids.chosen!)))).toEqual(refused);
    expect(await refusal(t.db.delete(designOptions).where(eq(designOptions.id, ids.chosen!)))).toEqual(refused);
    expect(await refusal(t.db.update(proposals).set({ optionIds: [] }).where(eq(proposals.id, ids.proposal!)))).toEqual(refused);
    expect(await refusal(t.db.execute(sql`update proposals set status = 'sent' where id = ${ids.proposal}`))).toEqual(refused);
    // What may still change on an accepted revision: its signed PDF's render state and link.
    await t.db.update(proposals).set({ signedRenderError: null }).where(eq(proposals.id, ids.proposal!));
  });
});
