import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdirSync } from "node:fs";
import path from "node:path";
import sharp from "sharp";
import AxeBuilder from "@axe-core/playwright";
import type { APIRequestContext, Browser, Page } from "playwright-core";
import { ESIGN_CONSENT_VERSION } from "../../shared/proposals/disclosures.ts";
import { BASE_URL, launchBrowser, newPage, signInAs, SHOTS_DIR } from "../setup/browser.ts";

/**
 * Issue 21 end to end: sales assigns accepted work to the demo crew member, who opens the job
 * on a phone, ticks every step with a photo, completes it, and the homeowner's e-mail with the
 * completion report's link arrives in the outbox; the link opens the report on a phone.
 */
let browser: Browser;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ browser, close } = await launchBrowser());
  mkdirSync(SHOTS_DIR, { recursive: true });
});
afterAll(async () => close?.());

const PHONE = { width: 390, height: 844 };
/** Nothing on the page reaches past the phone's width (no sideways scrolling). */
async function noWiderThanThePhone(page: Page) {
  const widest = await page.evaluate(() => Math.max(...[...document.querySelectorAll("html, html *")].map((el) => el.getBoundingClientRect().right)));
  expect(widest).toBeLessThanOrEqual(PHONE.width);
}
/** Serious and critical axe findings, as in accessibility.test.ts. */
async function seriousViolations(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "best-practice"]).analyze();
  expect(results.passes.length).toBeGreaterThan(10);
  return results.violations.filter((v) => v.impact === "serious" || v.impact === "critical").flatMap((v) => v.nodes.map((n) => `${v.id}: ${n.target.join(" ")}`));
}
const shot = (page: Page, name: string) => page.screenshot({ path: path.join(SHOTS_DIR, `${name}.png`), fullPage: true });

async function api<T>(request: APIRequestContext, method: "get" | "post" | "put", url: string, data?: unknown): Promise<T> {
  const res = await request[method](url, { headers: { origin: BASE_URL }, ...(data === undefined ? {} : { data }) });
  if (!res.ok()) throw new Error(`${method} ${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

/** Accepted work of its own: an attic with a roof fan, an option that removes it and adds soffit strip, signed through the homeowner's link. */
async function acceptedWork(request: APIRequestContext) {
  const stamp = Date.now();
  const homeowner = `tamsin-${stamp}@homeowner.example`;
  const customer = await api<{ customer: { id: string } }>(request, "post", "/api/customers", { name: "Tamsin Orrell", email: homeowner, phone: "555-0178" });
  const title = `Orrell attic ${stamp}`;
  const project = await api<{ project: { id: string } }>(request, "post", "/api/projects", { customerId: customer.customer.id, title, siteAddress: "14 Sedgewick Lane, Marrow Creek", climateZone: 5 });
  const space = await api<{ space: { id: string } }>(request, "post", `/api/projects/${project.project.id}/spaces`, {
    name: "Main attic", roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 40, eaveLengthFt: 80 }, sections: [{ kind: "rect", lengthFt: 40, widthFt: 28 }],
    vents: [
      { id: "ridge-1", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18 },
      { id: "fan-1", kind: "powered-roof", location: "upper", dropBelowRidgeFt: 2, cfm: 1200 },
      { id: "soffit-1", kind: "soffit-individual", location: "lower", quantity: 6, nfaSqInPerUnit: 50 },
    ],
    site: {}, notes: null,
  });
  const catalog = await api<{ items: { id: string; kind: string; soldInLengthFt: number | null }[] }>(request, "get", "/api/catalog");
  const strip = catalog.items.find((i) => i.kind === "soffit-continuous" && i.soldInLengthFt)!;
  const option = await api<{ option: { id: string } }>(request, "post", `/api/projects/${project.project.id}/options`, {
    name: "Fan out, soffit strip in", spaces: [{ spaceId: space.space.id, ventActions: { "fan-1": "remove" }, added: [{ id: "a1", catalogItemId: strip.id, quantity: 48 }] }],
  });
  const proposal = await api<{ proposal: { id: string } }>(request, "post", `/api/projects/${project.project.id}/proposals`, { optionIds: [option.option.id] });
  await api(request, "put", "/api/auth/me/signature", { typed: "Wren Halloway" });
  const sent = await api<{ link: string }>(request, "post", `/api/proposals/${proposal.proposal.id}/send`);
  const token = new URL(sent.link).pathname.split("/p/")[1]!;
  return { title, homeowner, token, optionId: option.option.id };
}

describe("the crew's day, end to end", () => {
  it("when sales assigns the job and the crew ticks every step with photos on a phone and completes, then the homeowner's report e-mail is in the outbox and its page opens", async () => {
    const errors: string[] = [];
    const photoPath = path.join(SHOTS_DIR, "crew-after-photo.jpg");
    await sharp({ create: { width: 640, height: 480, channels: 3, background: "#8a9a7a" } }).jpeg().toFile(photoPath);

    // The owner sets the work up and the homeowner accepts it (signed through the homeowner's link).
    const owner = await newPage(browser);
    owner.page.setDefaultNavigationTimeout(60_000);
    await signInAs(owner.page, "owner@tallgrass.example");
    await owner.page.waitForURL(/\/projects/);
    const work = await acceptedWork(owner.context.request);
    // The homeowner's acceptance is not this screen (homeowner-page.test.ts): it goes through the public API.
    await api(owner.context.request, "post", `/api/public/proposals/${work.token}/accept`, {
      optionId: work.optionId, signerName: "Tamsin Orrell", signature: { typed: "Tamsin Orrell" }, consent: { esign: true, consentTextVersion: ESIGN_CONSENT_VERSION },
    });
    const home = await newPage(browser, PHONE);
    home.page.setDefaultTimeout(30_000);

    // 1. Sales assigns it to the crew on the Jobs page (desk width).
    const sales = await newPage(browser, { width: 1280, height: 900 });
    sales.page.setDefaultTimeout(30_000);
    sales.page.setDefaultNavigationTimeout(60_000);
    await signInAs(sales.page, "sales@tallgrass.example");
    await sales.page.waitForURL(/\/projects/);
    await sales.page.goto("/jobs");
    const form = sales.page.getByRole("form", { name: `Assign ${work.title}` });
    await form.getByLabel("Crew").selectOption({ label: "Ansel Brightwater" });
    await form.getByLabel("Install date").fill("2026-12-08");
    await shot(sales.page, "crew-jobs-assign-1280");
    await form.getByRole("button", { name: "Assign" }).click();
    await sales.page.getByRole("link", { name: new RegExp(work.title) }).waitFor();

    // 2. The crew opens it on a phone: it lands on its jobs, never on the project list.
    const crew = await newPage(browser, PHONE);
    const cp = crew.page;
    cp.on("pageerror", (e) => errors.push(e.message));
    cp.setDefaultTimeout(30_000);
    cp.setDefaultNavigationTimeout(60_000);
    await signInAs(cp, "crew@tallgrass.example");
    await cp.waitForURL(/\/jobs$/);
    await shot(cp, "crew-jobs-390");
    await cp.getByRole("link", { name: new RegExp(work.title) }).click();
    await cp.getByRole("heading", { name: work.title }).waitFor();
    await cp.getByRole("heading", { name: /Before you start: safety/ }).waitFor();
    expect(await cp.locator("body").innerText()).not.toMatch(/\$\d/);
    await shot(cp, "crew-job-sheet-390");
    expect(await seriousViolations(cp)).toEqual([]);
    await noWiderThanThePhone(cp);

    // 3. Every step: a photo, then the tick.
    const steps = cp.locator("[data-item]");
    const count = await steps.count();
    expect(count).toBeGreaterThanOrEqual(2);
    for (let i = 0; i < count; i++) {
      const step = steps.nth(i);
      await step.getByLabel(`Add a photo for step ${i + 1}`).setInputFiles(photoPath);
      await step.getByRole("img").first().waitFor();
      const box = step.getByRole("checkbox");
      await expect.poll(() => box.isEnabled()).toBe(true);
      await box.check();
      await step.getByText("Done", { exact: true }).waitFor();
    }
    await cp.getByText(`${count} of ${count} done`).waitFor();
    await noWiderThanThePhone(cp);
    await shot(cp, "crew-job-ticked-390");
    await cp.getByRole("button", { name: "Mark the job done" }).click();
    await cp.getByText("Completed", { exact: true }).waitFor();
    await shot(cp, "crew-job-completed-390");

    // The office sees it done, with prices (sales may see them), at desk width.
    await sales.page.goto("/jobs");
    await sales.page.getByRole("link", { name: new RegExp(`${work.title}.*Done`) }).click();
    await sales.page.getByText("Completed", { exact: true }).waitFor();
    await sales.page.getByText("Balance due").waitFor();
    await shot(sales.page, "crew-job-office-1280");

    // The crew has no project pages.
    await cp.goto("/projects");
    await cp.getByRole("heading", { name: "Not part of your role" }).waitFor();

    // 4. The homeowner's e-mail is in the outbox with the report's link; the link opens on a phone.
    let link = "";
    await expect.poll(async () => {
      const outbox = await api<{ messages: { to: string; subject: string; text: string | null }[] }>(owner.context.request, "get", "/api/outbox");
      const mail = outbox.messages.find((m) => m.to === work.homeowner && m.subject.includes("finished"));
      link = /(https?:\/\/\S+\/done\/[A-Za-z0-9_-]+)/.exec(mail?.text ?? "")?.[1] ?? "";
      return link;
    }, { timeout: 30_000 }).toMatch(/\/done\//);
    await home.page.goto(new URL(link).pathname);
    await home.page.getByRole("heading", { name: "Your attic work is finished" }).waitFor();
    await expect.poll(() => home.page.locator("[data-balance]").innerText()).toMatch(/\$/);
    await noWiderThanThePhone(home.page);
    await shot(home.page, "crew-completion-homeowner-390");
    expect(await seriousViolations(home.page)).toEqual([]);

    // 5. The balance is paid through the deposit's flow: the payment service's page, then back to the report.
    const balance = await home.page.locator("[data-balance]").innerText();
    await home.page.getByRole("button", { name: "Pay the balance online" }).click();
    await home.page.waitForURL(new RegExp(`^${process.env.PAYMENTS_API_BASE}/pay/`));
    await home.page.getByRole("button", { name: `Pay ${balance} (test)` }).click();
    await home.page.waitForURL(/\/done\/.*balance=success/);
    await expect.poll(async () => {
      await home.page.reload();
      return home.page.locator("[data-balance]").innerText();
    }, { timeout: 30_000 }).toBe("$0.00");
    await shot(home.page, "crew-completion-paid-390");
    expect(errors).toEqual([]);
    await Promise.all([owner.context.close(), home.context.close(), sales.context.close(), crew.context.close()]);
  }, 300_000);
});
