import { afterAll, beforeAll, describe, expect, it } from "vitest";
import AxeBuilder from "@axe-core/playwright";
import { mkdirSync } from "node:fs";
import path from "node:path";
import type { APIRequestContext, Browser, Page } from "playwright-core";
import { ESIGN_CONSENT_VERSION } from "../../shared/proposals/disclosures.ts";
import { BASE_URL, launchBrowser, newPage, signInAs, SHOTS_DIR } from "../setup/browser.ts";

/**
 * Issue 14, items 5 and 6 in the browser: the public document check a homeowner can use (choose or
 * drop a PDF, read the answer), and the homeowner's view of a link the company revoked or replaced.
 * At 390 and 1280 px, by keyboard, with axe.
 */
let browser: Browser;
let close: () => Promise<void>;
const OWNER = "owner@tallgrass.example";
const PHONE = { width: 390, height: 844 };
const DESK = { width: 1280, height: 900 };
const shot = (page: Page, name: string) => page.screenshot({ path: path.join(SHOTS_DIR, `${name}.png`), fullPage: true });

async function api<T>(request: APIRequestContext, method: "get" | "post" | "put", url: string, data?: unknown): Promise<T> {
  const res = await request[method](url, { headers: { origin: BASE_URL }, ...(data === undefined ? {} : { data }) });
  if (!res.ok()) throw new Error(`${method} ${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}
async function waitFor<T>(what: string, read: () => Promise<T>, isDone: (v: T) => boolean, timeoutMs = 90_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (isDone(value)) return value;
    if (Date.now() > deadline) throw new Error(`${what} did not happen in time`);
    await new Promise((r) => setTimeout(r, 500));
  }
}

/** Its own customer, attic, option and sent proposal, so other files' rows are untouched. */
async function sentProposal(request: APIRequestContext, name: string) {
  const stamp = `${Date.now()}-${Math.round(Math.random() * 1e6)}`;
  const customer = await api<{ customer: { id: string } }>(request, "post", "/api/customers", { name, email: `verify-${stamp}@homeowner.example` });
  const project = await api<{ project: { id: string } }>(request, "post", "/api/projects", { customerId: customer.customer.id, title: `${name} attic ${stamp}`, siteAddress: "14 Sorrel Court, Marrow Creek", climateZone: 5 });
  const space = await api<{ space: { id: string } }>(request, "post", `/api/projects/${project.project.id}/spaces`, {
    name: "Main attic", roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 40, eaveLengthFt: 80 }, sections: [{ kind: "rect", lengthFt: 40, widthFt: 28 }],
    vents: [{ id: "soffit-1", kind: "soffit-individual", location: "lower", quantity: 10, nfaSqInPerUnit: 50 }], site: {}, notes: null,
  });
  const catalog = await api<{ items: { id: string; kind: string; soldInLengthFt: number | null }[] }>(request, "get", "/api/catalog");
  const ridge = catalog.items.find((i) => i.kind === "ridge" && i.soldInLengthFt)!;
  const option = await api<{ option: { id: string } }>(request, "post", `/api/projects/${project.project.id}/options`, {
    name: "Ridge vent run", spaces: [{ spaceId: space.space.id, ventActions: {}, added: [{ id: "a1", catalogItemId: ridge.id, quantity: 36 }] }],
  });
  const proposal = await api<{ proposal: { id: string } }>(request, "post", `/api/projects/${project.project.id}/proposals`, { optionIds: [option.option.id] });
  await api(request, "put", "/api/auth/me/signature", { typed: "Marit Okonjo" });
  const sent = await api<{ link: string }>(request, "post", `/api/proposals/${proposal.proposal.id}/send`);
  return { token: sent.link.split("/p/")[1]!, proposalId: proposal.proposal.id, optionId: option.option.id };
}

async function seriousViolations(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "best-practice"]).analyze();
  expect(results.passes.length).toBeGreaterThan(10);
  return results.violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .flatMap((v) => v.nodes.map((n) => `${v.id}: ${n.target.join(" ")}`));
}
async function noHorizontalScroll(page: Page, widthPx: number) {
  const widest = await page.evaluate(() => Math.max(...[...document.querySelectorAll("body *")].map((el) => el.getBoundingClientRect().right)));
  expect(widest).toBeLessThanOrEqual(widthPx);
}

let signedPdf: Buffer;
let ownerRequest: APIRequestContext;
let closeOwner: () => Promise<void>;

beforeAll(async () => {
  ({ browser, close } = await launchBrowser());
  mkdirSync(SHOTS_DIR, { recursive: true });
  const owner = await newPage(browser);
  owner.page.setDefaultNavigationTimeout(60_000);
  await signInAs(owner.page, OWNER);
  await owner.page.waitForURL(/\/projects/);
  ownerRequest = owner.context.request;
  closeOwner = () => owner.context.close();
  const p = await sentProposal(ownerRequest, "Ilse Varga");
  await api(ownerRequest, "post", `/api/public/proposals/${p.token}/accept`, {
    optionId: p.optionId, signerName: "Ilse Varga", signature: { typed: "Ilse Varga" }, consent: { esign: true, consentTextVersion: ESIGN_CONSENT_VERSION },
  });
  await waitFor("the signed PDF", () => api<{ proposal: { signedRender: { status: string } } }>(ownerRequest, "get", `/api/proposals/${p.proposalId}`), (d) => d.proposal.signedRender.status === "ready");
  const res = await ownerRequest.get(`/api/proposals/${p.proposalId}/pdf?kind=signed`);
  expect(res.status()).toBe(200);
  signedPdf = Buffer.from(await res.body());
}, 180_000);
afterAll(async () => {
  await closeOwner?.();
  await close?.();
});

describe("the public document check", () => {
  for (const size of [PHONE, DESK]) {
    it(`when a homeowner chooses their signed PDF by keyboard at ${size.width} px, then the page says it is the signed original; a changed copy says no match; a dropped file is checked the same way`, async () => {
      const { context, page } = await newPage(browser, size);
      const errors: string[] = [];
      page.on("pageerror", (e) => errors.push(e.message));
      try {
        await page.goto("/verify");
        await page.getByRole("heading", { name: "Is this the document that was signed?" }).waitFor();
        expect(await seriousViolations(page)).toEqual([]);

        // Keyboard only: Tab reaches the button, Enter opens the file chooser. Listening starts well
        // before the key press: Playwright turns on its file-chooser interception asynchronously.
        const chooserOpened = page.waitForEvent("filechooser", { timeout: 30_000 });
        await page.keyboard.press("Tab");
        const choose = page.getByRole("button", { name: "Choose the PDF" });
        await expect.poll(() => choose.evaluate((el) => el === document.activeElement)).toBe(true);
        const box = await choose.boundingBox();
        expect(box!.height).toBeGreaterThanOrEqual(44);
        await page.keyboard.press("Enter");
        const chooser = await chooserOpened;
        await chooser.setFiles({ name: "signed-proposal-rev-1.pdf", mimeType: "application/pdf", buffer: signedPdf });
        const result = page.locator("[data-verify-result]");
        await expect.poll(() => result.getAttribute("data-verify-result"), { timeout: 20_000 }).toBe("match");
        const text = await result.innerText();
        expect(text).toContain("This is the signed original");
        expect(text).toMatch(/Proposal revision 1 from Tallgrass Exteriors, sent /);
        expect(text).toMatch(/It was signed on /);
        // The answer takes the focus, so a screen reader reads it next.
        expect(await result.evaluate((el) => el === document.activeElement)).toBe(true);
        await noHorizontalScroll(page, size.width);
        expect(await seriousViolations(page)).toEqual([]);
        await shot(page, `verify-signed-${size.width}`);

        const changed = Buffer.from(signedPdf);
        const middle = changed.length >> 1;
        changed[middle] = changed[middle]! ^ 0x01;
        await page.locator("input[type=file]").setInputFiles({ name: "edited.pdf", mimeType: "application/pdf", buffer: changed });
        await expect.poll(() => result.getAttribute("data-verify-result"), { timeout: 20_000 }).toBe("no-match");
        const noMatch = await result.innerText();
        expect(noMatch).toContain("No match: this file is not a document on record");
        expect(noMatch).not.toMatch(/Tallgrass|revision \d/);
        expect(await seriousViolations(page)).toEqual([]);
        await shot(page, `verify-no-match-${size.width}`);

        // Dropped on the page instead of chosen: the same check.
        await page.locator("[data-drop-zone]").evaluate((zone, base64) => {
          const bytes = Uint8Array.from(atob(base64), (c) => c.charCodeAt(0));
          const transfer = new DataTransfer();
          transfer.items.add(new File([bytes], "dropped.pdf", { type: "application/pdf" }));
          zone.dispatchEvent(new DragEvent("dragover", { dataTransfer: transfer, bubbles: true, cancelable: true }));
          zone.dispatchEvent(new DragEvent("drop", { dataTransfer: transfer, bubbles: true, cancelable: true }));
        }, signedPdf.toString("base64"));
        await expect.poll(() => result.getAttribute("data-verify-result"), { timeout: 20_000 }).toBe("match");
        expect(await page.getByText("File: dropped.pdf").count()).toBe(1);
        expect(errors).toEqual([]);
      } finally {
        await context.close();
      }
    }, 120_000);
  }
});

describe("the homeowner on a revoked or replaced link", () => {
  it("when sales revokes the link on the proposal page, then the homeowner's old link explains it plainly with nothing of the proposal; a new link works and the old one still says withdrawn", async () => {
    const p = await sentProposal(ownerRequest, "Tobias Wren");
    const sales = await newPage(browser, PHONE);
    sales.page.setDefaultNavigationTimeout(60_000);
    const errors: string[] = [];
    sales.page.on("pageerror", (e) => errors.push(e.message));
    try {
      // Before: the homeowner's link opens the proposal.
      const before = await newPage(browser, PHONE);
      await before.page.goto(`/p/${p.token}`);
      await before.page.getByRole("heading", { name: /Hello Tobias/ }).waitFor();
      await before.context.close();

      await signInAs(sales.page, "sales@tallgrass.example");
      await sales.page.waitForURL(/\/projects/);
      const detail = await api<{ proposal: { projectId: string } }>(ownerRequest, "get", `/api/proposals/${p.proposalId}`);
      await sales.page.goto(`/projects/${detail.proposal.projectId}/proposals/${p.proposalId}`);
      await sales.page.getByRole("button", { name: "Revoke the link" }).click();
      await sales.page.getByRole("dialog").getByRole("button", { name: "Revoke the link" }).click();
      await sales.page.getByText(/Link revoked .*withdrew it/).waitFor();
      await shot(sales.page, "link-revoked-staff-390");

      for (const size of [PHONE, DESK]) {
        const home = await newPage(browser, size);
        home.page.on("pageerror", (e) => errors.push(e.message));
        await home.page.goto(`/p/${p.token}`);
        await home.page.getByRole("heading", { name: "This link was withdrawn" }).waitFor();
        const text = await home.page.locator("body").innerText();
        expect(text).toMatch(/Anything you already signed stays as it was/);
        // Nothing of the proposal: no name, address, price or company.
        expect(text).not.toMatch(/Tobias|Sorrel Court|Ridge vent run|\$\d|Tallgrass/);
        expect(await seriousViolations(home.page)).toEqual([]);
        await noHorizontalScroll(home.page, size.width);
        await shot(home.page, `link-revoked-homeowner-${size.width}`);
        await home.context.close();
      }

      // Sales sends a new link from the same panel; it is shown once and opens the proposal.
      await sales.page.getByRole("button", { name: "Send a new link" }).click();
      await sales.page.getByRole("dialog").getByRole("button", { name: "Send the new link" }).click();
      const fresh = await sales.page.locator("[data-proposal-link]").inputValue();
      expect(fresh).toMatch(/\/p\/[A-Za-z0-9_-]{40,}$/);
      await shot(sales.page, "link-reissued-staff-390");
      const home = await newPage(browser, PHONE);
      await home.page.goto(new URL(fresh).pathname);
      await home.page.getByRole("heading", { name: /Hello Tobias/ }).waitFor();
      await home.page.goto(`/p/${p.token}`);
      await home.page.getByRole("heading", { name: "This link was withdrawn" }).waitFor();
      await home.context.close();
      expect(errors).toEqual([]);
    } finally {
      await sales.context.close();
    }
  }, 180_000);

  it("when a link was replaced by a new one, then the old link says so", async () => {
    const p = await sentProposal(ownerRequest, "Alma Reyes");
    await api(ownerRequest, "post", `/api/proposals/${p.proposalId}/reissue-link`, {});
    const { context, page } = await newPage(browser, PHONE);
    try {
      await page.goto(`/p/${p.token}`);
      await page.getByRole("heading", { name: "This link was replaced by a new one" }).waitFor();
      expect(await page.locator("body").innerText()).toMatch(/newest e-mail/);
      expect(await seriousViolations(page)).toEqual([]);
      await shot(page, "link-replaced-homeowner-390");
    } finally {
      await context.close();
    }
  });
});
