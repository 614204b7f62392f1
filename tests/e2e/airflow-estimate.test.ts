import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdirSync } from "node:fs";
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { launchBrowser, newPage, signInAs, SHOTS_DIR } from "../setup/browser.ts";

/**
 * Issue 19, "Where the air goes" in the survey's analysis: the demo's Varnum attic (a gable fan
 * beside a ridge vent) shows the estimate with labelled figures; when the owner changes one of
 * the company's estimate conditions (the summer wind), the figures follow and say the new
 * condition. The company's conditions are put back afterwards, so later files see the demo's.
 */

let browser: Browser;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ browser, close } = await launchBrowser());
  mkdirSync(SHOTS_DIR, { recursive: true });
});
afterAll(async () => close?.());

const shot = (page: Page, name: string) => page.screenshot({ path: path.join(SHOTS_DIR, `${name}.png`), fullPage: true });

/** What the panel shows: its conditions sentence and each labelled figure, as text. */
async function readPanel(page: Page, isPhone: boolean) {
  if (isPhone) await page.getByRole("tab", { name: /Analysis/ }).click();
  const panel = page.getByTestId("where-the-air-goes");
  await panel.getByRole("heading", { name: "Where the air goes" }).waitFor();
  await panel.scrollIntoViewIfNeeded();
  const figure = async (label: string) => {
    const box = panel.locator("dl > div").filter({ has: page.locator("dt", { hasText: label }) });
    return (await box.locator("dd").allInnerTexts()).join(" | ");
  };
  return {
    conditions: await panel.locator("p").first().innerText(),
    houseAir: await figure("House air drawn up, summer"),
    airChanges: await figure("Attic air changes, summer"),
    sources: await panel.locator("[data-fan-source]").allInnerTexts(),
  };
}

async function flow(page: Page, tag: string, isPhone: boolean) {
  await signInAs(page, "owner@tallgrass.example");
  await page.waitForURL(/\/projects/);
  const origin = new URL(page.url()).origin;
  const list = await page.request.get("/api/projects?q=Varnum%20attic");
  expect(list.ok()).toBe(true);
  const { items } = (await list.json()) as { items: Array<{ id: string; title: string }> };
  const project = items.find((p) => p.title.startsWith("Varnum attic"))!;
  expect(project).toBeDefined();
  const before = (await (await page.request.get("/api/company/estimate-conditions")).json()) as { estimateConditions: { summer: { windMph: number } } };
  expect(before.estimateConditions.summer.windMph).not.toBe(18);

  try {
    await page.goto(`/projects/${project.id}`);
    await page.getByRole("tab", { name: /Main attic/ }).waitFor();
    const calm = await readPanel(page, isPhone);
    // Every figure is labelled with what it is, and the fan's sources with their share.
    expect(calm.houseAir).toMatch(/\d+ cfm \| winter \d+ cfm/);
    expect(calm.airChanges).toMatch(/[\d.]+ per hour \| winter [\d.]+ per hour/);
    expect(calm.sources.join(" ")).toMatch(/Low vents \(soffits, eaves\)[\s\S]*cfm · \d+ %/);
    expect(calm.conditions).toMatch(/^An estimate for a summer afternoon: /);
    await page.getByTestId("where-the-air-goes").screenshot({ path: path.join(SHOTS_DIR, `air-goes-before-${tag}.png`) });

    // The owner sets a windy summer afternoon for the company.
    await page.goto("/settings/company");
    const wind = page.getByLabel("Wind, summer");
    await wind.fill("18");
    await page.getByRole("button", { name: "Save company profile" }).click();
    await expect.poll(async () => ((await (await page.request.get("/api/company/estimate-conditions")).json()) as typeof before).estimateConditions.summer.windMph).toBe(18);

    await page.goto(`/projects/${project.id}`);
    await page.getByRole("tab", { name: /Main attic/ }).waitFor();
    const windy = await readPanel(page, isPhone);
    expect(windy.conditions).toContain("wind 18 mph");
    expect(windy.airChanges).not.toBe(calm.airChanges);
    expect(windy.airChanges).toMatch(/[\d.]+ per hour \| winter [\d.]+ per hour/);
    // Winter stays as it was: only the summer condition changed.
    expect(windy.airChanges.split(" | ")[1]).toBe(calm.airChanges.split(" | ")[1]);
    await page.getByTestId("where-the-air-goes").screenshot({ path: path.join(SHOTS_DIR, `air-goes-windy-${tag}.png`) });
    await shot(page, `air-goes-page-${tag}`);
  } finally {
    const res = await page.request.patch("/api/company", { headers: { origin }, data: { estimateConditions: before.estimateConditions } });
    expect(res.ok(), await res.text()).toBe(true);
  }
}

describe("where the air goes, in the survey's analysis", () => {
  it.each([
    ["wide", 1280, 900, false],
    ["phone", 390, 844, true],
  ] as const)("when the owner changes the summer wind, then the %s panel's labelled figures change with it", async (tag, width, height, isPhone) => {
    const { context, page } = await newPage(browser, { width, height });
    try {
      await flow(page, tag, isPhone).catch(async (error: unknown) => {
        await shot(page, `air-goes-failure-${tag}`);
        throw error;
      });
    } finally {
      await context.close();
    }
  });
});
