import { afterAll, beforeAll, describe, expect, it } from "vitest";
import AxeBuilder from "@axe-core/playwright";
import { mkdirSync } from "node:fs";
import path from "node:path";
import type { APIRequestContext, Browser, Page } from "playwright-core";
import { BASE_URL, launchBrowser, newPage, signInAs, SHOTS_DIR } from "../setup/browser.ts";

/**
 * Issue 16, the homeowner's page on a phone (390 × 844): the decision comes first (the first
 * option's accept control within two screen heights), the words are the homeowner's (no meter
 * readings, no technician's safety steps), and after signing the confirmation is where the eyes are.
 */

const SALES = "sales@tallgrass.example";
/** The seeded fan-and-ridge project: its findings include the dead fan's meter readings, the words a homeowner must not get. */
const FAN_AND_RIDGE = "Varnum attic — gable fan and ridge vent";
const PHONE = { width: 390, height: 844 };

let browser: Browser;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ browser, close } = await launchBrowser());
  mkdirSync(SHOTS_DIR, { recursive: true });
});
afterAll(async () => {
  await close?.();
});

const shot = (page: Page, name: string, fullPage = false) => page.screenshot({ path: path.join(SHOTS_DIR, `${name}.png`), fullPage });

async function api<T>(request: APIRequestContext, method: "get" | "post" | "put", url: string, data?: unknown): Promise<T> {
  const res = await request[method](url, { headers: { origin: BASE_URL }, ...(data === undefined ? {} : { data }) });
  if (!res.ok()) throw new Error(`${method} ${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

/** Sales sends a proposal with both saved options of the fan-and-ridge demo; answers the link's path. */
async function sentDemoProposal(request: APIRequestContext): Promise<string> {
  const projects = await api<{ items: { id: string; title: string }[] }>(request, "get", `/api/projects?q=${encodeURIComponent("gable fan and ridge")}`);
  const project = projects.items.find((p) => p.title === FAN_AND_RIDGE)!;
  const options = await api<{ options: { id: string }[] }>(request, "get", `/api/projects/${project.id}/options`);
  expect(options.options.length).toBeGreaterThanOrEqual(2);
  const draft = await api<{ proposal: { id: string } }>(request, "post", `/api/projects/${project.id}/proposals`, { optionIds: options.options.slice(0, 2).map((o) => o.id) });
  await api(request, "put", "/api/auth/me/signature", { typed: "Priya Lindqvist" });
  const sent = await api<{ link: string }>(request, "post", `/api/proposals/${draft.proposal.id}/send`, {});
  return new URL(sent.link).pathname;
}

/** Moderate, serious and critical violations as "rule: selector" lines. */
async function violations(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "best-practice"]).analyze();
  expect(results.passes.length).toBeGreaterThan(10);
  return results.violations
    .filter((v) => v.impact === "moderate" || v.impact === "serious" || v.impact === "critical")
    .flatMap((v) => v.nodes.map((n) => `${v.id} [${v.impact}]: ${n.target.join(" ")}`));
}

const isInViewport = (page: Page, selector: string) =>
  page.locator(selector).first().evaluate((el) => {
    const r = el.getBoundingClientRect();
    return r.top >= 0 && r.bottom <= window.innerHeight && r.height > 0;
  });

describe("the homeowner's page on a phone", () => {
  it("when a homeowner opens a two-option proposal at 390 × 844, then the decision is within two screens, the words are theirs, and after signing the confirmation and the deposit are in view", async () => {
    const staff = await newPage(browser);
    const errors: string[] = [];
    try {
      await signInAs(staff.page, SALES);
      await staff.page.waitForURL(/\/projects/);
      const link = await sentDemoProposal(staff.context.request);

      const home = await newPage(browser, PHONE);
      home.page.on("pageerror", (e) => errors.push(e.message));
      try {
        const hp = home.page;
        await hp.goto(link, { waitUntil: "domcontentloaded", timeout: 60_000 });
        await hp.getByRole("heading", { name: "Your 2 options" }).waitFor({ timeout: 30_000 });
        await shot(hp, "homeowner-phone-first-screen");
        await shot(hp, "homeowner-phone-page", true);

        // The first option's accept control sits within two screen heights of the top.
        const choose = hp.locator('[data-choose-option="1"]');
        const bottomPx = await choose.evaluate((el) => el.getBoundingClientRect().bottom + window.scrollY);
        expect(bottomPx).toBeLessThanOrEqual(2 * PHONE.height);

        // Side by side: both options start on the same row, each with a price and what it fixes.
        const [first, second] = await Promise.all([1, 2].map((n) => hp.locator(`[data-option-choice="${n}"]`).boundingBox()));
        expect(Math.abs(first!.y - second!.y)).toBeLessThan(2);
        expect(first!.x + first!.width).toBeLessThanOrEqual(second!.x);
        for (const n of [1, 2]) {
          const card = hp.locator(`[data-option-choice="${n}"]`);
          expect(await card.innerText()).toMatch(/\$\d[\d,]*\.\d{2}/);
          expect(await card.getByText("Fixes", { exact: true }).count()).toBe(1);
        }
        expect(await hp.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);

        // Homeowner words only, even in what is folded away: no meter readings, no technician's safety steps.
        const allText = (await hp.locator("main").textContent()) ?? "";
        expect(allText).not.toMatch(/\(OL\b|winding reads|bring water|work early in the day|Stop: the fan may be live/i);
        expect(allText).toContain("The attic fan's motor has failed");
        await hp.locator('[data-finding="fan-winding-open"]').getByText(/motor has burned out/).waitFor();

        expect(await violations(hp)).toEqual([]);

        // Choosing an option brings the form to the eyes; signing brings the confirmation there.
        await choose.click();
        await expect.poll(() => hp.evaluate(() => document.activeElement?.id)).toBe("accept-title");
        await hp.getByLabel("2. Your full name").fill("Odette Varnum");
        await hp.getByRole("radio", { name: /Type it/ }).check();
        await hp.getByLabel("Type your name to sign").fill("Odette Varnum");
        await hp.getByRole("checkbox", { name: /I agree to sign electronically/ }).check();
        expect(await violations(hp)).toEqual([]);
        await hp.getByRole("button", { name: "Accept option 1 and sign" }).click();
        await hp.getByRole("heading", { name: "Thank you — accepted" }).waitFor();
        await hp.getByRole("button", { name: "Pay deposit" }).waitFor();
        await expect.poll(() => hp.evaluate(() => document.activeElement?.id)).toBe("thanks-title");
        await expect.poll(() => isInViewport(hp, "#thanks-title")).toBe(true);
        expect(await isInViewport(hp, '[data-testid="deposit"] button')).toBe(true);
        await shot(hp, "homeowner-phone-accepted");
        expect(await violations(hp)).toEqual([]);
      } finally {
        await home.context.close();
      }
      expect(errors).toEqual([]);
    } finally {
      await staff.context.close();
    }
  });
});
