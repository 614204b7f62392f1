import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { BASE_URL, launchBrowser, newPage, signInAs } from "../setup/browser.ts";

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

beforeAll(async () => {
  ({ browser, close } = await launchBrowser());
  estimator = await newPage(browser);
  estimator.page.on("dialog", (d) => {
    dialogs.push(d.message());
    void d.dismiss();
  });
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
