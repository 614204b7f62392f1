import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import sharp from "sharp";
import type { APIRequestContext, Browser, BrowserContext, Page } from "playwright-core";
import { BASE_URL, launchBrowser, newPage, signInAs, SHOTS_DIR } from "../setup/browser.ts";

/**
 * Issue 9, "XSS": markup typed into user fields is shown as text on the pages that display it and
 * never runs. Each payload would open a dialog or set a global if the browser ever executed it.
 */
const PAYLOADS = [
  `<script>window.__xss = 1; alert("xss")</script>`,
  `<img src=x onerror="window.__xss = 2; alert('xss')">`,
  `"><svg onload="window.__xss = 3">`,
];

let browser: Browser;
let close: () => Promise<void>;
let estimator: { context: BrowserContext; page: Page };
const dialogs: string[] = [];
const watchDialogs = (page: Page) =>
  page.on("dialog", (d) => {
    dialogs.push(d.message());
    void d.dismiss();
  });

beforeAll(async () => {
  ({ browser, close } = await launchBrowser());
  estimator = await newPage(browser);
  watchDialogs(estimator.page);
  await signInAs(estimator.page, "estimator@tallgrass.example");
  await estimator.page.waitForURL(/\/projects/);
});
afterAll(async () => {
  await estimator?.context.close();
  await close?.();
});

describe("markup in user-typed fields", () => {
  it("when a customer, project and attic space are named with markup, then the lists and the project page show it as text and nothing runs", async () => {
    const { page } = estimator;
    const post = (url: string, data: unknown) => page.request.post(url, { data, headers: { origin: BASE_URL } });
    const stamp = Date.now();
    const [name, title, spaceName] = PAYLOADS.map((p) => `${p} ${stamp}`);
    const customer = await post("/api/customers", { name, notes: PAYLOADS.join(" ") });
    expect(customer.status()).toBe(201);
    const customerId = ((await customer.json()) as { customer: { id: string } }).customer.id;
    const project = await post("/api/projects", { customerId, title, siteAddress: `${PAYLOADS[1]} Marrow Creek`, climateZone: 4 });
    expect(project.status()).toBe(201);
    const projectId = ((await project.json()) as { project: { id: string } }).project.id;
    expect((await post(`/api/projects/${projectId}/spaces`, { name: spaceName })).status()).toBe(201);

    await page.goto(`/customers?q=${stamp}`);
    await page.getByText(name!, { exact: true }).first().waitFor();
    await page.goto(`/projects?q=${stamp}`);
    await page.getByText(title!, { exact: true }).first().waitFor();
    await page.goto(`/projects/${projectId}`);
    await page.getByRole("heading", { name: title!, exact: true }).first().waitFor();
    await page.getByText(spaceName!, { exact: false }).first().waitFor();

    expect(await page.evaluate(() => (window as { __xss?: number }).__xss)).toBeUndefined();
    expect(dialogs).toEqual([]);
    // The markup is text in the document, not elements.
    expect(await page.locator("script:not([src]):not([type])").count()).toBe(0);
    expect(await page.locator('img[src="x"]').count()).toBe(0);
  });
});

// ——— A whole job typed with markup: survey, catalog, option, company, proposal, the homeowner's page and the PDF ———

const STAMP = Date.now().toString(36);
/** A field's value: one of the payloads, then words naming the field, so each value is unique and can be found. */
const typed = (i: number, field: string) => `${PAYLOADS[i % PAYLOADS.length]} ${field} ${STAMP}`;

const V = {
  customer: typed(0, "customer"),
  title: typed(1, "job"),
  siteAddress: typed(2, "site"),
  projectNotes: typed(0, "project notes"),
  space: typed(1, "space"),
  spaceNotes: typed(2, "space notes"),
  sectionLabel: typed(0, "section"),
  ridgeLabel: typed(1, "ridge label"),
  fanLabel: typed(2, "fan label"),
  caption: typed(0, "caption"),
  item: typed(1, "catalog item"),
  option: typed(2, "option"),
  optionNotes: typed(0, "option notes"),
  labour: typed(1, "labour"),
  company: typed(2, "company"),
  companyAddress: typed(0, "company address"),
  licence: typed(1, "licence"),
  // A phone number is free text of at most 40 characters.
  phone: `<svg onload=alert(5)> 555-0142`,
  defaultTerms: typed(2, "default terms"),
  ownerName: typed(0, "owner"),
  // As long as a typed signature may be (120 characters), so the PDF must make room for all of it.
  sellerSignature: typed(1, "seller signature").padEnd(120, " Halloway").slice(0, 120).trimEnd(),
  coverNote: typed(2, "cover note"),
  scope: typed(0, "scope line"),
  terms: typed(1, "terms"),
  signerName: typed(2, "signer"),
  // Short enough for the signature line at its size: the PDF draws it whole.
  signature: `<img src=x onerror=alert(4)> ${STAMP}`,
  declineReason: typed(1, "decline reason"),
};

const OWNER = "owner@tallgrass.example";
let owner: { context: BrowserContext; page: Page };
let homeowner: { context: BrowserContext; page: Page };
let job: {
  projectId: string; itemId: string; optionId: string; draftId: string;
  accepted: { id: string; token: string }; declined: { id: string; token: string };
};
/** What the test changed on the demo company and the owner, put back afterwards so other files see the demo as seeded. */
let restore: { company: Record<string, unknown>; ownerName: string; signature: { typed: string | null; drawnPngDataUrl: string | null } | null };
const work = mkdtempSync(path.join(tmpdir(), "eavesight-xss-"));
mkdirSync(SHOTS_DIR, { recursive: true });

async function api<T>(request: APIRequestContext, method: "get" | "post" | "put" | "patch", url: string, data?: unknown): Promise<T> {
  const res = await request[method](url, { headers: { origin: BASE_URL }, ...(data === undefined ? {} : { data }) });
  if (!res.ok()) throw new Error(`${method} ${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

/** Sends a drafted proposal and answers its homeowner token. */
async function sendProposal(request: APIRequestContext, id: string): Promise<string> {
  const sent = await api<{ link: string }>(request, "post", `/api/proposals/${id}/send`);
  return new URL(sent.link).pathname.split("/").at(-1)!;
}

/** The payload texts are on the page (visible), the page ran none of them, and no element came out of them. */
async function expectShownAsText(page: Page, texts: string[]) {
  for (const text of texts) await page.getByText(text).filter({ visible: true }).first().waitFor();
  await expectNothingRan(page);
}

async function expectNothingRan(page: Page) {
  expect(await page.evaluate(() => (window as { __xss?: number }).__xss), `window.__xss on ${page.url()}`).toBeUndefined();
  expect(dialogs, `dialogs opened on ${page.url()}`).toEqual([]);
  const injected = await page.locator('img[src="x"], svg[onload], [onerror], [onload], script:not([src]):not([type])').count();
  expect(injected, `elements made from markup on ${page.url()}`).toBe(0);
}

const valueOf = (page: Page, name: string | RegExp) => page.getByRole("textbox", { name, exact: typeof name === "string" }).first().inputValue();

/** The PDF as text, whitespace collapsed (lines wrap at spaces), via Debian's pdftotext. */
function pdfText(bytes: Buffer, name: string): string {
  const file = path.join(work, `${name}.pdf`);
  writeFileSync(file, bytes);
  const r = spawnSync("pdftotext", ["-enc", "UTF-8", file, "-"], { encoding: "utf8" });
  if (r.error) throw new Error(`pdftotext could not run (Debian package poppler-utils): ${r.error.message}`);
  if (r.status !== 0) throw new Error(`pdftotext failed (${r.status}): ${r.stderr}`);
  return r.stdout.replace(/\s+/g, " ");
}

async function pdfBytes(request: APIRequestContext, url: string): Promise<Buffer> {
  const res = await request.get(url);
  expect(res.status(), `${url}: ${res.status()}`).toBe(200);
  const bytes = await res.body();
  expect(bytes.subarray(0, 5).toString("latin1")).toBe("%PDF-");
  return bytes;
}

describe("markup in every field of a job, from the survey to the signed PDF", () => {
  beforeAll(async () => {
    owner = await newPage(browser);
    homeowner = await newPage(browser, { width: 390, height: 844 });
    watchDialogs(owner.page);
    watchDialogs(homeowner.page);
    await signInAs(owner.page, OWNER);
    await owner.page.waitForURL(/\/projects/);
    const rq = owner.context.request;

    const company = (await api<{ company: Record<string, unknown> }>(rq, "get", "/api/company")).company;
    const me = await api<{ user: { name: string } }>(rq, "get", "/api/auth/me");
    const signature = (await api<{ signature: { typed: string | null; drawnPngDataUrl: string | null } | null }>(rq, "get", "/api/auth/me/signature")).signature;
    restore = {
      company: { name: company.name, addressLine: company.addressLine, licenseNumber: company.licenseNumber, phone: company.phone, defaultTerms: company.defaultTerms },
      ownerName: me.user.name,
      signature,
    };
    await api(rq, "patch", "/api/company", { name: V.company, addressLine: V.companyAddress, licenseNumber: V.licence, phone: V.phone, defaultTerms: V.defaultTerms });
    await api(rq, "patch", "/api/auth/me", { name: V.ownerName });
    await api(rq, "put", "/api/auth/me/signature", { typed: V.sellerSignature });

    const customer = await api<{ customer: { id: string } }>(rq, "post", "/api/customers", { name: V.customer, email: `xss-${STAMP}@homeowner.example` });
    const project = await api<{ project: { id: string } }>(rq, "post", "/api/projects", {
      customerId: customer.customer.id, title: V.title, siteAddress: V.siteAddress, climateZone: 4, notes: V.projectNotes,
    });
    const projectId = project.project.id;
    // A ridge vent beside a powered fan: the analysis's short-circuit finding names the ridge vent by its label.
    const space = await api<{ space: { id: string } }>(rq, "post", `/api/projects/${projectId}/spaces`, {
      name: V.space, notes: V.spaceNotes,
      roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 40, eaveLengthFt: 80 },
      sections: [{ kind: "rect", lengthFt: 40, widthFt: 30, label: V.sectionLabel }],
      vents: [
        { id: "ridge-1", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18, label: V.ridgeLabel },
        { id: "fan-1", kind: "powered-roof", location: "upper", dropBelowRidgeFt: 2, cfm: 1_000, label: V.fanLabel },
        { id: "soffit-1", kind: "soffit-individual", location: "lower", quantity: 6, nfaSqInPerUnit: 50 },
      ],
      site: {},
    });
    const png = await sharp({ create: { width: 64, height: 48, channels: 3, background: { r: 90, g: 120, b: 160 } } }).png().toBuffer();
    const photoRes = await rq.post(`/api/projects/${projectId}/photos`, {
      headers: { origin: BASE_URL },
      multipart: { file: { name: "attic.png", mimeType: "image/png", buffer: png }, spaceId: space.space.id, caption: V.caption },
    });
    expect(photoRes.status(), await photoRes.text()).toBe(201);
    const photoId = ((await photoRes.json()) as { photo: { id: string } }).photo.id;

    // Kind "other" is never picked by the option generator, so the demo projects' suggestions stay as they were.
    const item = await api<{ item: { id: string } }>(rq, "post", "/api/catalog", {
      sku: `XSS-${STAMP}`, name: V.item, kind: "other", unit: "each", materialCostCents: 500, sellPriceCents: 2_500,
    });
    const option = await api<{ option: { id: string } }>(rq, "post", `/api/projects/${projectId}/options`, {
      name: V.option, notes: V.optionNotes,
      spaces: [{ spaceId: space.space.id, ventActions: { "fan-1": "remove" }, added: [{ id: "a1", catalogItemId: item.item.id, quantity: 2 }] }],
      laborLines: [{ id: "l1", description: V.labour, hours: 3, rateCents: 9_000 }],
    });
    const optionId = option.option.id;

    const draft = async () => {
      const p = (await api<{ proposal: { id: string; version: number } }>(rq, "post", `/api/projects/${projectId}/proposals`, { optionIds: [optionId] })).proposal;
      await api(rq, "patch", `/api/proposals/${p.id}`, { version: p.version, coverNote: V.coverNote, terms: V.terms, scopes: { [optionId]: [V.scope] }, photoIds: [photoId] });
      return p.id;
    };
    // One stays a draft (the builder), one is accepted with a typed signature, one is declined later with a reason.
    const [draftId, acceptedId, declinedId] = [await draft(), await draft(), await draft()];
    const acceptedToken = await sendProposal(rq, acceptedId);
    const declinedToken = await sendProposal(rq, declinedId);
    const hq = homeowner.context.request;
    const view = await api<{ esign: { version: string } }>(hq, "get", `/api/public/proposals/${acceptedToken}`);
    await api(hq, "post", `/api/public/proposals/${acceptedToken}/accept`, {
      optionId, signerName: V.signerName, signature: { typed: V.signature }, consent: { esign: true, consentTextVersion: view.esign.version },
    });
    job = {
      projectId, itemId: item.item.id, optionId, draftId,
      accepted: { id: acceptedId, token: acceptedToken }, declined: { id: declinedId, token: declinedToken },
    };
  });

  afterAll(async () => {
    const rq = owner?.context.request;
    if (rq && restore) {
      await api(rq, "patch", "/api/company", restore.company).catch(() => undefined);
      await api(rq, "patch", "/api/auth/me", { name: restore.ownerName }).catch(() => undefined);
      const sig = restore.signature;
      await api(rq, "put", "/api/auth/me/signature", sig?.drawnPngDataUrl ? { drawnPngDataUrl: sig.drawnPngDataUrl } : { typed: sig?.typed ?? restore.ownerName }).catch(() => undefined);
      if (job) await api(rq, "patch", `/api/catalog/${job.itemId}`, { isActive: false }).catch(() => undefined);
    }
    await owner?.context.close();
    await homeowner?.context.close();
    rmSync(work, { recursive: true, force: true });
  });

  it("when vent labels, a section name, notes and a photo caption carry markup, then the survey page and its analysis show them as text", async () => {
    const { page } = owner;
    await page.goto(`/projects/${job.projectId}`);
    await expectShownAsText(page, [
      `Vent 1 (${V.ridgeLabel})`,
      `Vent 2 (${V.fanLabel})`,
      `Section 1 (${V.sectionLabel})`,
      V.caption,
      // The analysis panel's finding names the ridge vent by the label typed for it.
      `the ridge vent "${V.ridgeLabel}"`,
    ]);
    const panel = page.getByRole("tabpanel", { name: /Analysis/ });
    await panel.locator('[data-finding="powered-with-passive-exhaust"]').getByText(V.ridgeLabel).waitFor();
    expect(await valueOf(page, /^Notes on this space/)).toBe(V.spaceNotes);
    expect(await valueOf(page, /^Where it is/)).toBe(V.ridgeLabel);
    expect(await page.getByRole("img", { name: V.caption }).count()).toBe(1);
    await page.getByRole("button", { name: /Project details/ }).click();
    expect(await valueOf(page, /^Project notes/)).toBe(V.projectNotes);
    await expectNothingRan(page);
  });

  it("when a catalog item, an option and its labour line carry markup, then the catalog, options, compare, option editor and materials list show them as text", async () => {
    const { page } = owner;
    await page.goto("/catalog");
    await page.getByLabel("Search").fill(STAMP);
    await expectShownAsText(page, [V.item]);

    await page.goto(`/projects/${job.projectId}/options`);
    await expectShownAsText(page, [V.option]);
    await page.goto(`/projects/${job.projectId}/options/compare`);
    await expectShownAsText(page, [V.option]);

    await page.goto(`/projects/${job.projectId}/options/${job.optionId}`);
    await page.getByRole("heading", { name: V.option, level: 1 }).waitFor();
    // Price lines name the item and the labour line as typed.
    await expectShownAsText(page, [`${V.item}:`, `${V.labour}:`]);
    expect(await valueOf(page, /^Notes/)).toBe(V.optionNotes);
    expect(await valueOf(page, "Work")).toBe(V.labour);
    expect(await page.getByLabel("Item", { exact: true }).first().evaluate((el: HTMLSelectElement) => el.selectedOptions[0]?.textContent ?? "")).toContain(V.item);

    await page.goto(`/projects/${job.projectId}/options/${job.optionId}/materials`);
    await expectShownAsText(page, [V.item, `${V.labour}: 3 h.`, `powered roof fan "${V.fanLabel}"`, V.space]);
  });

  it("when the company profile, the owner's name and signature and a proposal carry markup, then the staff pages, the homeowner's page and the decisions read back show them as text", async () => {
    const { page } = owner;
    await page.goto("/settings/company");
    await page.getByRole("heading", { name: "Company profile", level: 1 }).waitFor();
    expect(await valueOf(page, "Company name")).toBe(V.company);
    expect(await valueOf(page, /^Address/)).toBe(V.companyAddress);
    expect(await valueOf(page, /^Licence number/)).toBe(V.licence);
    expect(await valueOf(page, /^Phone/)).toBe(V.phone);
    expect(await valueOf(page, /^Default terms/)).toBe(V.defaultTerms);
    // The header names the signed-in person and the company.
    await expectShownAsText(page, [V.ownerName, V.company]);
    await page.goto("/settings/team");
    await expectShownAsText(page, [V.ownerName]);

    // The draft builder: the option's name in titles and choices, the typed texts in their boxes, the seller's typed signature.
    await page.goto(`/projects/${job.projectId}/proposals`);
    await expectShownAsText(page, [V.option]);
    await page.goto(`/projects/${job.projectId}/proposals/${job.draftId}`);
    await expectShownAsText(page, [`Option 1: ${V.option}`, V.sellerSignature]);
    expect(await valueOf(page, /^Cover note/)).toBe(V.coverNote);
    expect(await valueOf(page, `Scope of work for ${V.option}`)).toBe(V.scope);
    expect(await valueOf(page, /^Terms of this proposal/)).toBe(V.terms);

    // The homeowner's page, still open, shows everything it carries as text.
    const hp = homeowner.page;
    const { customer } = await api<{ customer: { firstName: string } }>(homeowner.context.request, "get", `/api/public/proposals/${job.declined.token}`);
    expect(customer.firstName.startsWith("<script>")).toBe(true);
    await hp.goto(`/p/${job.declined.token}`);
    // The details are folded away on the page: open them all, and open the accept form with "Choose option 1".
    await hp.getByRole("button", { name: "Choose option 1" }).click();
    await hp.locator("details").evaluateAll((all) => all.forEach((d) => ((d as HTMLDetailsElement).open = true)));
    await expectShownAsText(hp, [
      V.company, V.companyAddress, `Licence ${V.licence}`, V.phone, `Hello ${customer.firstName},`, V.siteAddress, V.ownerName,
      V.coverNote, V.option, V.scope, V.optionNotes, V.terms, V.caption, `the ridge vent "${V.ridgeLabel}"`,
    ]);
    expect(await hp.getByRole("radio", { name: `Option 1: ${V.option}` }).count()).toBe(1);
    // Text inside a closed "details" is in the document as words too.
    expect(await hp.locator("main").textContent()).toContain(V.labour);
    await api(homeowner.context.request, "post", `/api/public/proposals/${job.declined.token}/decline`, { reason: V.declineReason });
    await hp.goto(`/p/${job.accepted.token}`);
    await expectShownAsText(hp, ["Thank you — accepted", `“${V.option}”`, `${V.ownerName} of ${V.company} will be in touch`]);

    // Read back to staff: the signer on the accepted one, the reason on the declined one, both in the pipeline and the outbox.
    await page.goto(`/projects/${job.projectId}/proposals/${job.accepted.id}`);
    await page.locator('[data-status="accepted"]').first().waitFor();
    await expectShownAsText(page, [V.customer, V.coverNote, V.scope, V.terms, `Signed by ${V.signerName} (typed signature)`]);
    await page.goto(`/projects/${job.projectId}/proposals/${job.declined.id}`);
    await page.locator('[data-status="declined"]').first().waitFor();
    await expectShownAsText(page, [`Reason: “${V.declineReason}”`, `Reason given: “${V.declineReason}”`]);
    await page.goto("/pipeline");
    await page.locator('[data-stage="accepted"]').getByText(V.customer).first().waitFor();
    await page.locator('[data-stage="declined"]').getByText(V.customer).first().waitFor();
    await expectNothingRan(page);
    await page.goto("/settings/outbox");
    await expectShownAsText(page, [`Your attic ventilation proposal from ${V.company}`]);
  });

  it("when the proposal with markup in every field is rendered and signed, then both PDFs carry each payload literally as text", async () => {
    const rq = owner.context.request;
    // Sending queued the PDF and accepting queued the signed copy (both in the set-up); each ends ready or failed.
    const renders = () => api<{ proposal: { render: { status: string }; signedRender: { status: string } } }>(rq, "get", `/api/proposals/${job.accepted.id}`)
      .then((d) => `${d.proposal.render.status} / ${d.proposal.signedRender.status}`);
    await expect.poll(renders, { timeout: 45_000, interval: 250 }).toMatch(/^(ready|failed) \/ (ready|failed)$/);
    expect(await renders()).toBe("ready / ready");

    const original = pdfText(await pdfBytes(rq, `/api/proposals/${job.accepted.id}/pdf?kind=original`), "original");
    // Not printed, so not listed: the space's name (the PDF names spaces only when there are several)
    // and the catalog item (the materials list is the crew's; the homeowner reads the scope).
    const shown = [
      V.company, V.companyAddress, V.licence, V.phone, V.customer, V.siteAddress, V.title, V.ownerName,
      V.coverNote, V.option, V.optionNotes, V.scope, V.terms, V.caption, `the ridge vent "${V.ridgeLabel}"`,
    ];
    const missing = shown.filter((s) => !original.includes(s));
    expect(missing, `not found as text in the sent PDF:\n${original.slice(0, 3_000)}`).toEqual([]);

    const signed = pdfText(await pdfBytes(homeowner.context.request, `/api/public/proposals/${job.accepted.token}/pdf`), "signed");
    const signedMissing = [...shown, V.signerName, V.signature].filter((s) => !signed.includes(s));
    expect(signedMissing, "not found as text in the signed PDF").toEqual([]);
    expect(signed).toContain("Signing certificate");
  });

  it("when the seller's typed signature is as long as the profile allows, then the sent PDF shows all of it, markup and all", async () => {
    const rq = owner.context.request;
    const render = () => api<{ render: { status: string } }>(rq, "get", `/api/proposals/${job.accepted.id}/render-status`).then((r) => r.render.status);
    await expect.poll(render, { timeout: 45_000, interval: 250 }).toMatch(/^(ready|failed)$/);
    const original = pdfText(await pdfBytes(rq, `/api/proposals/${job.accepted.id}/pdf?kind=original`), "original-signature");
    expect(V.sellerSignature.length).toBe(120);
    // The signature block, as a picture for a person to look at.
    const lastPage = /Page \d+ of (\d+)/.exec(original)?.[1] ?? "1";
    spawnSync("pdftoppm", ["-png", "-r", "60", "-f", lastPage, "-l", lastPage, path.join(work, "original-signature.pdf"), path.join(SHOTS_DIR, "xss-pdf-signatures")]);
    const signatures = original.slice(original.lastIndexOf("Signatures"));
    expect(signatures, "the signature block of the sent PDF").toContain(V.sellerSignature);
  });
});
