import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import { changeOrders } from "../../server/db/schema/index.ts";
import { ESIGN_CONSENT_VERSION } from "../../shared/proposals/disclosures.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createProject, createSpace, mainAttic, makeTeam, send, type Team } from "../setup/survey-fixtures.ts";

/**
 * Issue 14, "change orders": after acceptance, sales drafts a change against the signed work, sends
 * it as its own short PDF through a homeowner link, and the homeowner signs or declines it with the
 * same e-sign consent and trail. Only a signed one changes the crew's list and the job total.
 */
let t: TestApp;
let team: Team;
const ids: Record<string, string> = {};
const homeowner = `odile-co-${Date.now()}@homeowner.example`;
/** 40 ft of strip at $4.00 + 3 h at $90.00 = $430.00, tax 8.25 % = $35.48: $465.48 signed. */
const SIGNED_TOTAL_CENTS = 46_548;

const pub = (url: string) => t.request().post(url).set("origin", ORIGIN);
const signBody = (extra: Record<string, unknown> = {}) => ({ signerName: "Odile Farrant", signature: { typed: "Odile Farrant" }, consent: { esign: true, consentTextVersion: ESIGN_CONSENT_VERSION }, ...extra });
const materials = async () => (await team.asOwner.get(`/api/options/${ids.option}/materials`).expect(200)).body;
const historyOf = async () => (await team.asOwner.get(`/api/proposals/${ids.proposal}/change-orders`).expect(200)).body;

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Tallgrass Exteriors (change orders)");
  await send(team.asSales, "put", "/api/auth/me/signature", { typed: "Test sales" }).expect(200);
  await send(team.asOwner, "patch", "/api/company", { name: "Tallgrass Exteriors", taxRateBasisPoints: 825 }).expect(200);
  const customer = await send(team.asOwner, "post", "/api/customers", { name: "Odile Farrant", email: homeowner });
  const project = await createProject(team.asEstimator, customer.body.customer.id, { title: "Change order attic", siteAddress: "3 Larch Row, Marrow Creek" });
  const space = await createSpace(team.asEstimator, project.id, mainAttic);
  const strip = await send(team.asOwner, "post", "/api/catalog", { sku: "SS-8", name: "Continuous soffit strip, 8 ft", kind: "soffit-continuous", unit: "linear-ft", nfaSqInPerFt: 9, soldInLengthFt: 8, materialCostCents: 150, sellPriceCents: 400 });
  const option = await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, {
    name: "Soffit strip", spaces: [{ spaceId: space.id, ventActions: {}, added: [{ id: "a1", catalogItemId: strip.body.item.id, quantity: 40 }] }],
    laborLines: [{ id: "l1", description: "Cut the soffit slot", hours: 3, rateCents: 9_000 }],
  });
  const draft = await send(team.asSales, "post", `/api/projects/${project.id}/proposals`, { optionIds: [option.body.option.id] });
  Object.assign(ids, { project: project.id, strip: strip.body.item.id, option: option.body.option.id, proposal: draft.body.proposal.id });
});
afterAll(async () => t?.close());

const decking = { id: "l1", action: "add", description: "Replace rotted roof decking under the ridge", quantity: 32, unit: "sq ft", unitPriceCents: 450 };
const lessStrip = () => ({ id: "l2", action: "remove", catalogItemId: ids.strip, quantity: 8 });

describe("change orders", () => {
  it("when the proposal is not accepted yet, then a change order is refused with 409 and says to revise instead", async () => {
    const res = await send(team.asSales, "post", `/api/proposals/${ids.proposal}/change-orders`, { reason: "Rotted decking found under the ridge", lines: [decking] });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: "not-accepted", message: expect.stringMatching(/revise/) });
    const sent = await send(team.asSales, "post", `/api/proposals/${ids.proposal}/send`);
    ids.token = (sent.body.link as string).split("/p/")[1]!;
    const accepted = await pub(`/api/public/proposals/${ids.token}/accept`).send({ optionId: ids.option, ...signBody() });
    expect(accepted.status, JSON.stringify(accepted.body)).toBe(200);
    expect((await historyOf()).original).toMatchObject({ revision: 1, totalCents: SIGNED_TOTAL_CENTS });
  });

  it("when a change order is drafted with bad lines, then each problem is a clear 400 and nothing is saved", async () => {
    const noPrice = await send(team.asSales, "post", `/api/proposals/${ids.proposal}/change-orders`, { reason: "Rot", lines: [{ id: "x", action: "add", description: "Something", quantity: 1 }] });
    expect(noPrice.status).toBe(400);
    expect(noPrice.body.error.fields).toHaveProperty("lines.0.unitPriceCents");
    const noReason = await send(team.asSales, "post", `/api/proposals/${ids.proposal}/change-orders`, { reason: "", lines: [decking] });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.fields).toHaveProperty("reason");
    const foreignItem = await send(team.asSales, "post", `/api/proposals/${ids.proposal}/change-orders`, { reason: "Rot", lines: [{ ...lessStrip(), catalogItemId: "00000000-0000-4000-8000-000000000000" }] });
    expect(foreignItem.status).toBe(400);
    expect((await historyOf()).changeOrders).toEqual([]);
  });

  it("when a change order is drafted and sent, then nothing changes until it is signed, the homeowner gets a link and a PDF with the totals", async () => {
    const before = await materials();
    const draft = await send(team.asSales, "post", `/api/proposals/${ids.proposal}/change-orders`, { reason: "Rotted decking found under the ridge", lines: [decking, lessStrip()] });
    expect(draft.status, JSON.stringify(draft.body)).toBe(201);
    expect(draft.body.changeOrder).toMatchObject({ number: 1, status: "draft" });
    ids.changeOrder = draft.body.changeOrder.id;
    const sent = await send(team.asSales, "post", `/api/change-orders/${ids.changeOrder}/send`);
    expect(sent.status, JSON.stringify(sent.body)).toBe(200);
    expect(sent.body.link).toMatch(new RegExp(`^${ORIGIN}/c/[A-Za-z0-9_-]{20,}$`));
    ids.coToken = (sent.body.link as string).split("/c/")[1]!;
    // Added: 32 × $4.50 = $144.00; removed: 8 ft × $4.00 = $32.00; tax 8.25 %: $11.88 − $2.64 = $9.24; change $121.24.
    expect(sent.body.changeOrder).toMatchObject({
      status: "sent", totals: { addedCents: 14_400, removedCents: 3_200, taxChangeCents: 924, changeCents: 12_124 },
      previousTotalCents: SIGNED_TOTAL_CENTS, newTotalCents: SIGNED_TOTAL_CENTS + 12_124,
    });
    const mail = await t.waitForMail(homeowner, { subjectIncludes: "Change order 1" });
    expect(mail.text).toContain(sent.body.link);
    expect(mail.text).toContain("Rotted decking found under the ridge");

    const pdf = await team.asSales.get(`/api/change-orders/${ids.changeOrder}/pdf`).buffer(true).parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => cb(null, Buffer.concat(chunks)));
    });
    expect(pdf.status).toBe(200);
    expect(pdf.headers["x-content-sha256"]).toBe(sent.body.changeOrder.pdfSha256);
    const file = path.join(mkdtempSync(path.join(tmpdir(), "co-pdf-")), "co.pdf");
    if (process.env.KEEP_PDF) writeFileSync(process.env.KEEP_PDF, pdf.body as Buffer);
    writeFileSync(file, pdf.body as Buffer);
    const text = execFileSync("pdftotext", ["-layout", file, "-"]).toString();
    expect(text).toContain("Change order 1");
    expect(text).toMatch(/Job total before this change\s+\$465\.48/);
    expect(text).toMatch(/New job total\s+\$586\.72/);
    expect(text).toContain(`${ORIGIN}/verify`);

    // Sent is frozen; unsigned, it changes nothing.
    const edit = await team.asSales.put(`/api/change-orders/${ids.changeOrder}`).set("origin", ORIGIN).send({ version: sent.body.changeOrder.version, reason: "Other", lines: [decking] });
    expect(edit.status).toBe(409);
    expect(edit.body.error.code).toBe("accepted-locked");
    expect(await materials()).toEqual(before);
    expect((await historyOf()).current.totalCents).toBe(SIGNED_TOTAL_CENTS);
  });

  it("when the homeowner signs it, then the crew's list and the job total change, and the trail records it", async () => {
    const view = await t.request().get(`/api/public/change-orders/${ids.coToken}`).expect(200);
    expect(view.body.snapshot).toMatchObject({ number: 1, reason: "Rotted decking found under the ridge", newTotalCents: SIGNED_TOTAL_CENTS + 12_124 });
    expect(JSON.stringify(view.body)).not.toContain("storageKey");
    const badConsent = await pub(`/api/public/change-orders/${ids.coToken}/sign`).send(signBody({ consent: { esign: false, consentTextVersion: ESIGN_CONSENT_VERSION } }));
    expect(badConsent.status).toBe(400);
    const signed = await pub(`/api/public/change-orders/${ids.coToken}/sign`).set("user-agent", "HomeownerPhone/1.0").send(signBody());
    expect(signed.status, JSON.stringify(signed.body)).toBe(200);
    expect(signed.body.changeOrder).toMatchObject({ status: "signed", signerName: "Odile Farrant" });
    expect((await pub(`/api/public/change-orders/${ids.coToken}/sign`).send(signBody())).status).toBe(409);

    const after = await materials();
    // 40 − 8 = 32 ft of 8 ft strip: 4 pieces (was 5).
    expect(after.materials.items).toEqual([expect.objectContaining({ sku: "SS-8", quantity: 32, buyCount: 4 })]);
    expect(after.materials.work.map((w: { description: string }) => w.description)).toContain("Change order 1: add Replace rotted roof decking under the ridge (32 sq ft).");
    expect(after.release).toMatchObject({ proposalId: ids.proposal, changeOrders: [1] });
    // The public check knows the change order's PDF: which one, of which revision, and that it is signed.
    const pdfSha = (await historyOf()).changeOrders[0].pdfSha256 as string;
    const verified = await t.request().get(`/api/public/verify?sha256=${pdfSha}`).expect(200);
    expect(verified.body).toMatchObject({ matches: true, document: { kind: "change-order", changeOrderNumber: 1, revision: 1, status: "signed" } });
    const history = await historyOf();
    expect(history.current).toEqual({ totalCents: SIGNED_TOTAL_CENTS + 12_124, signedChangeOrders: [1] });
    const events = (await team.asOwner.get(`/api/proposals/${ids.proposal}`)).body.events.map((e: { event: string }) => e.event);
    expect(events).toEqual(expect.arrayContaining(["accepted", "change-order-drafted", "change-order-sent", "change-order-signed"]));
    const signedEvent = (await team.asOwner.get(`/api/proposals/${ids.proposal}`)).body.events.find((e: { event: string }) => e.event === "change-order-signed");
    expect(signedEvent).toMatchObject({ userAgent: "HomeownerPhone/1.0", consentTextVersion: ESIGN_CONSENT_VERSION, detail: { number: 1, esignConsent: true } });
  });

  it("when a second change order is declined, then the crew's list and the total stay as the first one left them", async () => {
    const before = await materials();
    const draft = await send(team.asSales, "post", `/api/proposals/${ids.proposal}/change-orders`, { reason: "Add a second ridge run", lines: [{ id: "l1", action: "add", catalogItemId: ids.strip, quantity: 24 }] });
    expect(draft.body.changeOrder.number).toBe(2);
    const sent = await send(team.asSales, "post", `/api/change-orders/${draft.body.changeOrder.id}/send`);
    const token = (sent.body.link as string).split("/c/")[1]!;
    expect(sent.body.changeOrder.previousTotalCents).toBe(SIGNED_TOTAL_CENTS + 12_124);
    const declined = await pub(`/api/public/change-orders/${token}/decline`).send({ reason: "Not now." });
    expect(declined.status).toBe(200);
    expect((await pub(`/api/public/change-orders/${token}/sign`).send(signBody())).status).toBe(409);
    expect(await materials()).toEqual(before);
    expect((await historyOf()).current.totalCents).toBe(SIGNED_TOTAL_CENTS + 12_124);
  });

  it("when code other than the API writes to a signed change order, then the database refuses it", async () => {
    const refusal = await t.db.update(changeOrders).set({ reason: "changed" }).where(eq(changeOrders.id, ids.changeOrder!)).then(() => "written", (err: { cause?: { code?: string } }) => err.cause?.code);
    expect(refusal).toBe("23001");
  });
});
