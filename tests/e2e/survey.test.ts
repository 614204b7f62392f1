import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdirSync } from "node:fs";
import path from "node:path";
import sharp from "sharp";
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
/** Uncaught errors in the page, printed when a step fails. */
const browserErrors = new WeakMap<Page, string[]>();

async function shot(page: Page, name: string, fullPage = false) {
  await page.screenshot({ path: path.join(SHOTS_DIR, `${name}.png`), fullPage });
}

/** Waits until every part of the page says it is saved. */
async function waitForSaved(page: Page) {
  await expect.poll(() => page.locator("[data-save-state]").first().getAttribute("data-save-state"), { timeout: 15_000 }).toBe("saved");
}

async function smallPng(): Promise<Buffer> {
  return sharp({ create: { width: 96, height: 72, channels: 3, background: { r: 184, g: 71, b: 15 } } }).png().toBuffer();
}

/** The whole estimator flow at one viewport width; `tag` keeps names apart between runs. */
async function surveyFlow(page: Page, tag: string, isPhone: boolean) {
  const customerName = `Wren Halvorsen ${tag}`;
  const errors: string[] = [];
  browserErrors.set(page, errors);
  page.on("pageerror", (error) => errors.push(error.message));
  await signInAs(page, ESTIMATOR);
  await page.waitForURL(/\/projects/);

  // A customer, from the customers page.
  await page.goto("/customers");
  await page.getByRole("button", { name: "Add customer" }).first().click();
  const dialog = page.getByRole("dialog");
  await dialog.getByLabel("Name").fill(customerName);
  await dialog.getByLabel("Phone").fill("555-0142");
  await dialog.getByLabel("E-mail").fill(`wren.${tag}@example.com`);
  await dialog.getByRole("button", { name: "Add customer" }).click();
  await dialog.waitFor({ state: "detached" });
  await page.getByRole("button", { name: customerName }).waitFor();
  await shot(page, `customers-${tag}`);

  // A project for them.
  await page.goto("/projects/new");
  await page.getByLabel("Customer", { exact: true }).fill(`Halvorsen ${tag}`);
  await page.getByRole("button", { name: new RegExp(customerName) }).click();
  await page.getByLabel("Site address").fill(`48 Bramble Hollow, Marrow Creek (${tag})`);
  await page.getByLabel("Climate zone").selectOption("5");
  await page.getByLabel("Roof colour").selectOption("dark");
  await shot(page, `new-project-${tag}`, true);
  await page.getByRole("button", { name: "Start project" }).click();
  await page.waitForURL(/\/projects\/[0-9a-f-]{36}$/);
  const projectUrl = page.url();

  // The first attic space, L-shaped: a 40' × 28' 6" block and a 12 x 20 wing.
  await page.getByRole("button", { name: 'Add "Main attic"' }).click();
  await page.getByRole("tab", { name: /Main attic/ }).waitFor();
  await page.getByLabel("Ridge length").fill(`38'`);
  await page.getByRole("button", { name: "Add rectangle" }).click();
  await page.getByLabel("Length (along the ridge)").fill(`40'`);
  // Drawing notation: the dash joins feet and inches (28 ft 6 in, not 28 ft minus 6 in).
  await page.getByLabel("Width (eave to eave)").fill(`28'-6"`);
  await page.getByText("28 ft 6 in = 28.5 ft").first().waitFor();
  // A bad entry says why and keeps the text.
  await page.getByRole("button", { name: "Add area" }).click();
  const area = page.getByLabel("Floor area");
  await area.fill("12 x twenty");
  await page.getByText(/I don't understand "twenty"/).first().waitFor();
  expect(await area.inputValue()).toBe("12 x twenty");
  // An expression: its reader (mathjs) loads on demand and the entry is read when it arrives.
  await area.fill("12 x 8 + 12 x 12");
  await page.getByText("12 ft × 8 ft + 12 ft × 12 ft = 240 sq ft").first().waitFor();

  // A ridge vent and a powered gable fan from the quick-add buttons.
  await page.getByRole("button", { name: "Ridge vent", exact: true }).click();
  await page.getByRole("button", { name: "Powered gable fan", exact: true }).click();
  await page.getByText("Typical values").first().waitFor();
  await page.getByLabel(/breaker is off and a voltage tester/).check();
  await page.getByLabel("Spins freely and coasts").check();

  // The live analysis shows the short-circuit finding and the airflow picture.
  if (isPhone) await page.getByRole("tab", { name: /Analysis/ }).click();
  const panel = page.getByRole("tabpanel", { name: /Analysis/ });
  await panel.locator('[data-finding="powered-with-passive-exhaust"]').getByRole("heading", { name: "Powered fan short-circuits through other high vents" }).waitFor();
  await panel.getByRole("heading", { name: "Airflow picture" }).waitFor();
  await panel.getByRole("img", { name: /Airflow in Main attic/ }).waitFor();
  await waitForSaved(page);
  await shot(page, `analysis-${tag}`, !isPhone);
  if (isPhone) await shot(page, `analysis-${tag}-full`, true);
  if (isPhone) await page.getByRole("tab", { name: "Survey" }).click();

  // A photo of the fan.
  await page.locator('input[type="file"][aria-label="Photo file"]').setInputFiles({ name: "gable-fan.png", mimeType: "image/png", buffer: await smallPng() });
  await page.getByLabel("Attach to").selectOption({ label: "Vent: Vent 2 (powered gable fan)" });
  await page.getByLabel("Caption").fill("Gable fan, north end");
  await page.getByRole("button", { name: "Add photo" }).click();
  await page.getByRole("img", { name: "Gable fan, north end" }).waitFor();
  await waitForSaved(page);
  await shot(page, `survey-${tag}`, true);

  // Reload: everything came back from the server.
  await page.goto(projectUrl);
  await page.getByRole("tab", { name: /Main attic/ }).waitFor();
  expect(await page.getByLabel("Length (along the ridge)").inputValue()).toBe("40 ft");
  expect(await page.getByLabel("Width (eave to eave)").inputValue()).toBe("28 ft 6 in");
  expect(await page.getByLabel("Floor area").inputValue()).toBe("240 sq ft");
  await page.getByRole("heading", { name: "Vent 1 (ridge vent)" }).waitFor();
  await page.getByRole("heading", { name: "Vent 2 (powered gable fan)" }).waitFor();
  expect(await page.getByLabel(/breaker is off and a voltage tester/).isChecked()).toBe(true);
  await page.getByRole("img", { name: "Gable fan, north end" }).waitFor();
  if (isPhone) await page.getByRole("tab", { name: /Analysis/ }).click();
  await page.getByRole("tabpanel", { name: /Analysis/ }).locator('[data-finding="powered-with-passive-exhaust"]').waitFor();
  await shot(page, `after-reload-${tag}`);
  return projectUrl;
}

/** Offline edits wait on the device; a save that lost a race asks whose edit wins. */
async function offlineAndConflict(page: Page, projectUrl: string) {
  const projectId = projectUrl.split("/").pop()!;
  await page.getByRole("tab", { name: "Survey" }).click().catch(() => undefined);
  await page.context().setOffline(true);
  await page.getByLabel("Floor area").fill("12 x 22");
  await page.getByText("Offline", { exact: true }).waitFor();
  await page.getByText(/Offline: edits are kept on this device/).waitFor();
  const kept = await page.evaluate(() => Object.keys(localStorage).filter((k) => k.startsWith("eavesight:unsent:space:")));
  expect(kept.length).toBe(1);
  await shot(page, "offline-wide");
  await page.context().setOffline(false);
  await waitForSaved(page);

  // Someone else saves the space from another device…
  const detail = (await (await page.request.get(`/api/projects/${projectId}`)).json()) as {
    spaces: { id: string; version: number; name: string; roof: unknown; sections: unknown[]; vents: unknown[]; site: unknown; notes: unknown }[];
  };
  const space = detail.spaces[0]!;
  const origin = new URL(projectUrl).origin;
  const theirs = await page.request.put(`/api/projects/${projectId}/spaces/${space.id}`, {
    headers: { origin },
    data: { name: "Main attic (office copy)", roof: space.roof, sections: space.sections, vents: space.vents, site: space.site, notes: space.notes, version: space.version },
  });
  expect(theirs.status()).toBe(200);
  // …then this page saves an edit based on the older version: it must ask, not overwrite silently.
  await page.getByLabel("Ridge length").fill(`37'`);
  const conflict = page.getByRole("dialog", { name: /Someone else changed/ });
  await conflict.waitFor();
  await conflict.getByText(/Main attic \(office copy\)/).waitFor();
  await shot(page, "conflict-wide");
  await conflict.getByRole("button", { name: "All of mine" }).click();
  await waitForSaved(page);
  const after = (await (await page.request.get(`/api/projects/${projectId}`)).json()) as { spaces: { name: string; roof: { ridgeLengthFt: number } }[] };
  expect(after.spaces[0]!.name).toBe("Main attic");
  expect(after.spaces[0]!.roof.ridgeLengthFt).toBe(37);
}

describe("the estimator's attic survey", () => {
  it("when an estimator surveys an L-shaped attic on a wide screen, then the analysis shows the short circuit, everything is saved, offline edits wait and a conflicting save asks whose wins", async () => {
    const { context, page } = await newPage(browser, { width: 1280, height: 900 });
    try {
      await surveyFlow(page, "wide", false).then((url) => offlineAndConflict(page, url)).catch(async (error: unknown) => {
        await shot(page, "failure-wide", true);
        console.error(browserErrors.get(page));
        throw error;
      });
    } finally {
      await context.close();
    }
  });

  it("when the same survey is done on a 390 px phone, then it works the same and nothing is lost on reload", async () => {
    const { context, page } = await newPage(browser, { width: 390, height: 844 });
    try {
      await surveyFlow(page, "phone", true).catch(async (error: unknown) => {
        await shot(page, "failure-phone", true);
        console.error(browserErrors.get(page));
        throw error;
      });
    } finally {
      await context.close();
    }
  });
});
