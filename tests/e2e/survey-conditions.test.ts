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

const shot = (page: Page, name: string, fullPage = false) => page.screenshot({ path: path.join(SHOTS_DIR, `${name}.png`), fullPage });

/** A project with one space whose soffits are partly blocked and which has a whole-house fan. */
async function seedProject(page: Page, tag: string): Promise<string> {
  const origin = new URL(page.url()).origin;
  const post = async (url: string, data: unknown, method: "post" | "put" = "post") => {
    const res = await page.request[method](url, { headers: { origin }, data });
    expect(res.ok(), await res.text()).toBe(true);
    return res.json();
  };
  const { customer } = await post("/api/customers", { name: `Odile Fenwick ${tag}` });
  const { project } = await post("/api/projects", { customerId: customer.id, title: "Blocked soffits", siteAddress: `7 Sorrel Lane, Marrow Creek (${tag})`, climateZone: 5, moistureRegime: "A" });
  const { space } = await post(`/api/projects/${project.id}/spaces`, { name: "Main attic" });
  await post(
    `/api/projects/${project.id}/spaces/${space.id}`,
    {
      name: "Main attic",
      roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 40, eaveLengthFt: 80 },
      sections: [{ kind: "rect", lengthFt: 40, widthFt: 30 }],
      vents: [
        { id: "s1", kind: "soffit-individual", location: "lower", quantity: 10, nfaSqInPerUnit: 50, condition: "partly-blocked", blockedQuantity: 4, blockedBy: "insulation" },
        { id: "r1", kind: "ridge", location: "upper", lengthFt: 38, nfaSqInPerFt: 18 },
        { id: "w1", kind: "whole-house-fan", location: "lower", cfm: 3000 },
      ],
      site: {},
      notes: null,
      version: space.version,
    },
    "put",
  );
  return `/projects/${project.id}`;
}

async function flow(page: Page, tag: string, isPhone: boolean) {
  await signInAs(page, "estimator@tallgrass.example");
  await page.waitForURL(/\/projects/);
  const url = await seedProject(page, tag);
  await page.goto(url);
  await page.getByRole("tab", { name: /Main attic/ }).waitFor();
  // The stored condition comes back into the fields: 4 of 10 blocked by insulation.
  const condition = page.getByLabel("Condition").first();
  expect(await condition.inputValue()).toBe("partly-blocked");
  expect(await page.getByLabel("How many are blocked").inputValue()).toBe("4");
  await page.getByRole("heading", { name: /whole-house fan/ }).first().waitFor();
  await shot(page, `conditions-survey-${tag}`, true);
  if (isPhone) await page.getByRole("tab", { name: /Analysis/ }).click();
  const panel = page.getByRole("tabpanel", { name: /Analysis/ });
  await panel.locator('[data-finding="vents-blocked"]').waitFor();
  await panel.locator('[data-finding="whole-house-fan-operation"]').waitFor();
  expect(await panel.locator('[data-finding="powered-with-passive-exhaust"]').count()).toBe(0);
  await shot(page, `conditions-analysis-${tag}`, true);
  if (isPhone) await page.getByRole("tab", { name: "Survey" }).click();

  // Sealed attic: no "add vents" finding, the R806.5 checks instead.
  await page.getByLabel("Attic type").selectOption("unvented");
  await page.getByLabel("Insulation at the roof line").selectOption("air-impermeable-only");
  await page.getByLabel("Whole attic inside the insulation").selectOption("yes");
  if (isPhone) await page.getByRole("tab", { name: /Analysis/ }).click();
  await panel.locator('[data-finding="unvented-assembly"]').waitFor();
  await panel.locator('[data-finding="vents-in-unvented-attic"]').waitFor();
  expect(await panel.locator('[data-finding="below-minimum"]').count()).toBe(0);
  await shot(page, `conditions-sealed-${tag}`, true);
  await expect.poll(() => page.locator("[data-save-state]").first().getAttribute("data-save-state"), { timeout: 15_000 }).toBe("saved");
  await page.reload();
  await page.getByRole("tab", { name: /Main attic/ }).waitFor();
  if (isPhone) await page.getByRole("tab", { name: "Survey" }).click().catch(() => undefined);
  expect(await page.getByLabel("Attic type").inputValue()).toBe("unvented");
  expect(await page.getByLabel("How many are blocked").inputValue()).toBe("4");
}

describe("vent condition, whole-house fan and sealed attic in the survey", () => {
  it.each([
    ["wide", 1280, 900, false],
    ["phone", 390, 844, true],
  ] as const)("when the %s survey shows a partly blocked soffit, a whole-house fan and then a sealed attic, then the fields hold them and the analysis follows", async (tag, width, height, isPhone) => {
    const { context, page } = await newPage(browser, { width, height });
    try {
      await flow(page, tag, isPhone).catch(async (error: unknown) => {
        await shot(page, `conditions-failure-${tag}`, true);
        throw error;
      });
    } finally {
      await context.close();
    }
  });
});
