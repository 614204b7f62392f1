import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdirSync } from "node:fs";
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { launchBrowser, newPage, signInAs, SHOTS_DIR } from "../setup/browser.ts";

let browser: Browser;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ browser, close } = await launchBrowser());
  mkdirSync(SHOTS_DIR, { recursive: true });
});
afterAll(async () => close?.());

const ESTIMATOR = "estimator@tallgrass.example";
/** The seeded project with a powered gable fan beside a ridge vent (scripts/lib/seed.ts FAN_AND_RIDGE_TITLE). */
const FAN_AND_RIDGE = "Varnum attic — gable fan and ridge vent";

async function shot(page: Page, name: string, fullPage = false) {
  await page.screenshot({ path: path.join(SHOTS_DIR, `${name}.png`), fullPage });
}

/** The page itself never scrolls sideways (wide tables and the comparison scroll inside their own boxes). */
async function expectNoSidewaysScroll(page: Page) {
  const offenders = await page.evaluate(() => {
    const width = document.documentElement.clientWidth;
    if (document.documentElement.scrollWidth <= width) return [];
    return [...document.querySelectorAll("body *")]
      .filter((el) => el.getBoundingClientRect().right > width + 1)
      .slice(0, 8)
      .map((el) => `${el.tagName.toLowerCase()}.${(el.getAttribute("class") ?? "").slice(0, 80)}`);
  });
  expect(offenders).toEqual([]);
}

async function waitForSaved(page: Page) {
  await expect.poll(() => page.locator("[data-save-state]").first().getAttribute("data-save-state"), { timeout: 15_000 }).toBe("saved");
}

/** Signs in, finds the fan-and-ridge project through the projects search and opens its options. */
async function openOptions(page: Page): Promise<string> {
  await signInAs(page, ESTIMATOR);
  await page.waitForURL(/\/projects/);
  await page.getByLabel("Search projects").fill("gable fan and ridge");
  await page.getByRole("link", { name: FAN_AND_RIDGE }).first().click();
  await page.waitForURL(/\/projects\/[0-9a-f-]{36}$/);
  const projectId = new URL(page.url()).pathname.split("/")[2]!;
  await page.goto(`/projects/${projectId}/options`);
  await page.getByRole("heading", { name: "Design options", level: 1 }).waitFor();
  return projectId;
}

describe("design options for the fan-and-ridge demo", () => {
  it("when an estimator suggests options, keeps two, edits one and compares, then prices and analyses follow every change", async () => {
    const { context, page } = await newPage(browser, { width: 1280, height: 900 });
    const errors: string[] = [];
    page.on("pageerror", (error) => errors.push(error.message));
    try {
      const projectId = await openOptions(page);
      const savedBefore = await page.locator("[data-option-card]").count();
      await shot(page, "options-list-1280");

      // Suggest: proposals with their reasons, analysis and price; nothing saved yet.
      await page.getByRole("button", { name: "Suggest options" }).click();
      await page.getByRole("heading", { name: "Suggested options" }).waitFor();
      const proposals = page.locator("[data-proposal]");
      await proposals.first().waitFor();
      expect(await proposals.count()).toBeGreaterThanOrEqual(2);
      expect(await proposals.first().textContent()).toMatch(/Why this design/);
      expect(await proposals.first().textContent()).toMatch(/Meets the code minimum/);
      expect(await proposals.first().textContent()).toMatch(/Total\$[\d,]+\.\d{2}/);
      // The generator never suggests a powered fan beside a ridge vent.
      await shot(page, "options-suggested-1280", true);

      const names: string[] = [];
      for (const i of [0, 1]) {
        const card = proposals.nth(i);
        names.push((await card.getAttribute("data-proposal"))!);
        await card.getByRole("button", { name: /^Keep / }).click();
        await card.getByRole("button", { name: /kept$/ }).waitFor();
      }
      await expect.poll(() => page.locator("[data-option-card]").count()).toBe(savedBefore + 2);

      // Edit the first kept option: change a quantity and watch price and analysis follow.
      await page.locator(`[data-option-card="${names[0]}"]`).first().getByRole("link", { name: /^Edit/ }).click();
      await page.waitForURL(/\/options\/[0-9a-f-]{36}$/);
      await page.getByRole("heading", { name: names[0], level: 1 }).waitFor();
      await waitForSaved(page);
      const total = page.getByTestId("price-total");
      const figures = page.locator("[data-live-space] dl").first();
      const totalBefore = await total.textContent();
      const figuresBefore = await figures.textContent();
      const ridgeQty = page.getByLabel(/^Quantity of .*ridge vent/i).first();
      const quantity = (await ridgeQty.count()) > 0 ? ridgeQty : page.getByLabel(/^Quantity of .*soffit/i).first();
      const was = Number(await quantity.inputValue());
      await quantity.fill(String(was + 8));
      await expect.poll(() => total.textContent()).not.toBe(totalBefore);
      await expect.poll(() => figures.textContent()).not.toBe(figuresBefore);
      await shot(page, "option-editor-1280");
      await waitForSaved(page);
      await expect.poll(() => page.getByTestId("price-deposit").textContent()).toMatch(/\$[\d,]+\.\d{2}/);

      // A bad entry is kept on the page with its message, and nothing half-typed is saved.
      await quantity.fill("8 ft?");
      await page.getByText("Quantity must be a number").first().waitFor();
      await expect.poll(() => page.locator("[data-save-state]").first().getAttribute("data-save-state")).toBe("blocked");
      await quantity.fill(String(was + 8));
      await waitForSaved(page);

      // The before/after switch of the airflow picture.
      await page.getByRole("tab", { name: "Today (surveyed)" }).first().click();
      await page.getByRole("img", { name: /today, as surveyed/ }).first().waitFor();
      await page.getByRole("tab", { name: "After the work" }).first().click();

      // Compare: both kept options side by side with compliance, areas, findings and price.
      await page.goto(`/projects/${projectId}/options/compare`);
      for (const name of names) await page.locator(`[data-compare-option="${name}"]`).first().waitFor();
      const firstCompare = page.locator(`[data-compare-option="${names[0]}"]`).first();
      expect(await firstCompare.textContent()).toMatch(/Intake \(low\)/);
      expect(await firstCompare.textContent()).toMatch(/Deposit at signing/);
      await expectNoSidewaysScroll(page);
      await shot(page, "options-compare-1280", true);

      // The crew's materials list, printable.
      await firstCompare.getByRole("link", { name: /^Materials list/ }).click();
      await page.getByRole("heading", { name: names[0], level: 1 }).waitFor();
      await page.getByRole("heading", { name: "To bring" }).waitFor();
      expect(await page.locator("[data-material]").count()).toBeGreaterThan(0);
      await page.getByRole("button", { name: "Print" }).waitFor();
      await shot(page, "options-materials-1280", true);
      await page.emulateMedia({ media: "print" });
      await shot(page, "options-materials-print-1280", true);
      await page.emulateMedia({ media: "screen" });
      expect(errors).toEqual([]);
    } finally {
      await context.close();
    }
  });

  it("when the same pages open on a phone, then they stack and the comparison scrolls sideways", async () => {
    const { context, page } = await newPage(browser, { width: 390, height: 844 });
    const errors: string[] = [];
    page.on("pageerror", (error) => errors.push(error.message));
    try {
      const projectId = await openOptions(page);
      await page.getByRole("button", { name: "Suggest options" }).click();
      await page.locator("[data-proposal]").first().waitFor();
      await shot(page, "options-suggested-390");
      // The first option that is still editable (another test may have had one accepted: it is locked).
      await page.locator("[data-option-card]").getByRole("link", { name: /^Edit/ }).first().click();
      await page.waitForURL(/\/options\/[0-9a-f-]{36}$/);
      await waitForSaved(page);
      await shot(page, "option-editor-390");
      await shot(page, "option-editor-390-full", true);
      await page.goto(`/projects/${projectId}/options/compare`);
      await page.locator("[data-compare-option]").nth(1).waitFor();
      const region = page.getByRole("region", { name: "Options side by side" });
      expect(await region.evaluate((el) => el.scrollWidth > el.clientWidth)).toBe(true);
      await shot(page, "options-compare-390");
      const href = await page.locator("[data-compare-option]").first().getByRole("link", { name: /^Materials list/ }).getAttribute("href");
      await page.goto(href!);
      await page.getByRole("heading", { name: "To bring" }).waitFor();
      await shot(page, "options-materials-390", true);

      await page.goto("/catalog");
      await page.getByRole("heading", { name: "Catalog", level: 1 }).waitFor();
      await page.getByRole("table", { name: "Catalog items" }).waitFor();
      expect(await page.getByRole("button", { name: "Add item" }).count()).toBe(0); // read-only for an estimator
      await shot(page, "catalog-estimator-390");
      expect(errors).toEqual([]);
    } finally {
      await context.close();
    }
  });

  it("when the owner imports a catalog file with a bad row, then the report names row and column and nothing is imported", async () => {
    const { context, page } = await newPage(browser, { width: 1280, height: 900 });
    try {
      await signInAs(page, "owner@tallgrass.example");
      await page.waitForURL(/\/projects/);
      await page.goto("/catalog");
      await page.getByRole("table", { name: "Catalog items" }).waitFor();
      await expectNoSidewaysScroll(page);
      const countBefore = await page.locator("tbody tr").count();
      const csv = [
        "sku,name,kind,unit,nfaSqInPerUnit,nfaSqInPerFt,cfm,soldInLengthFt,materialCostCents,sellPriceCents,laborMinutesPerUnit,isActive",
        "TG-TEST-OK,Test static vent,box,each,50,,,,1000,4000,30,true",
        "TG-TEST-BAD,Test bad ridge,ridge,linear-ft,,,,,abc,900,5,true",
      ].join("\n");
      await page.getByLabel("Catalog CSV file to import").setInputFiles({ name: "catalog.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
      const report = page.getByTestId("import-report");
      await report.waitFor();
      expect(await report.textContent()).toMatch(/Nothing was imported/);
      expect(await report.getByRole("table").textContent()).toMatch(/3/);
      await shot(page, "catalog-import-report-1280", true);
      expect(await page.locator("table[aria-label='Catalog items'] tbody tr").count()).toBe(countBefore - 0);

      // Add an item with a price in dollars; it shows as exact cents formatted.
      await page.getByRole("button", { name: "Add item" }).click();
      const dialog = page.getByRole("dialog");
      await dialog.getByLabel("Name").fill("Test cupola, 24 in");
      await dialog.getByLabel("Code (SKU)").fill("TG-TEST-CUPOLA");
      await dialog.getByLabel("Kind").selectOption("cupola");
      await dialog.getByLabel("Sold by").selectOption("each");
      await dialog.getByLabel("Net free area per vent").fill("144");
      await dialog.getByLabel("Material cost").fill("89.10");
      await dialog.getByLabel("Sell price").fill("1,249.99");
      await shot(page, "catalog-add-1280");
      await dialog.getByRole("button", { name: "Add item" }).click();
      await dialog.waitFor({ state: "detached" });
      await page.getByText("$1,249.99").first().waitFor();
      await shot(page, "catalog-owner-1280", true);
    } finally {
      await context.close();
    }
  });
});
