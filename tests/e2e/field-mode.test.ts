import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdirSync } from "node:fs";
import { readFile, rm, writeFile } from "node:fs/promises";
import path from "node:path";
import sharp from "sharp";
import type { BrowserContext, Page } from "playwright-core";
import type { Browser } from "playwright-core";
import { launchBrowser, newPage, signInAs, SHOTS_DIR } from "../setup/browser.ts";

/*
 * Field mode (issue 18): with the browser context set offline, the app still opens, a new attic
 * space with vents and a photo is made, survives closing the page, and arrives exactly once when
 * the signal returns, with the server's analysis equal to the one shown offline.
 */
let browser: Browser;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ browser, close } = await launchBrowser());
  mkdirSync(SHOTS_DIR, { recursive: true });
});
afterAll(async () => close?.());

const ESTIMATOR = "estimator@tallgrass.example";
const shot = (page: Page, name: string, fullPage = false) => page.screenshot({ path: path.join(SHOTS_DIR, `${name}.png`), fullPage });

/** A JSON call from the page (its session cookie and Origin), for setting up and for checking the server. */
async function api<T>(page: Page, method: string, url: string, body?: unknown): Promise<{ status: number; body: T }> {
  return page.evaluate(
    async ({ method, url, body }) => {
      const res = await fetch(url, { method, headers: body === undefined ? {} : { "content-type": "application/json" }, body: body === undefined ? undefined : JSON.stringify(body) });
      const text = await res.text();
      return { status: res.status, body: text ? JSON.parse(text) : null };
    },
    { method, url, body },
  );
}

async function makeProject(page: Page, tag: string): Promise<string> {
  const customer = await api<{ customer: { id: string } }>(page, "POST", "/api/customers", { name: `Odile Farrant ${tag}` });
  expect(customer.status).toBe(201);
  const project = await api<{ project: { id: string } }>(page, "POST", "/api/projects", {
    customerId: customer.body.customer.id, title: `Field survey ${tag}`, siteAddress: "7 Sorrel Lane, Marrow Creek", climateZone: 5,
  });
  expect(project.status).toBe(201);
  return project.body.project.id;
}

/** The service worker is active (it serves the app from then on) and the device copy has been written. */
async function waitUntilKeptOnDevice(page: Page, projectId: string) {
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  await expect
    .poll(
      () =>
        page.evaluate(
          (projectId) =>
            new Promise<boolean>((resolve) => {
              const open = indexedDB.open("eavesight-device-copy");
              open.onsuccess = () => {
                const db = open.result;
                if (!db.objectStoreNames.contains("copies")) return resolve(false);
                const all = db.transaction("copies").objectStore("copies").getAll();
                all.onsuccess = () => resolve(all.result.some((copy: unknown) => typeof copy === "string" && copy.includes(projectId)));
                all.onerror = () => resolve(false);
              };
              open.onerror = () => resolve(false);
            }),
          projectId,
        ),
      { timeout: 15_000 },
    )
    .toBe(true);
}

async function waitingText(page: Page) {
  return page.locator("header [role=status]").first().textContent();
}

async function smallPng(): Promise<Buffer> {
  return sharp({ create: { width: 120, height: 90, channels: 3, background: { r: 40, g: 96, b: 160 } } }).png().toBuffer();
}

async function openPhone(): Promise<{ context: BrowserContext; page: Page; errors: string[] }> {
  const { context, page } = await newPage(browser, { width: 390, height: 844, serviceWorkers: "allow" });
  const errors: string[] = [];
  page.on("pageerror", (error) => errors.push(error.message));
  return { context, page, errors };
}

describe("field mode: a survey with no signal", () => {
  it("when the phone goes offline after opening a project, then a reload still opens it; a new space with two vents and a photo survives closing the page and arrives exactly once, analysed as it was shown", async () => {
    const { context, page, errors } = await openPhone();
    await signInAs(page, ESTIMATOR);
    await page.waitForURL(/\/projects/);
    const tag = Date.now().toString(36);
    const projectId = await makeProject(page, tag);

    // One online visit.
    await page.goto(`/projects/${projectId}`);
    await page.getByRole("heading", { name: `Field survey ${tag}` }).waitFor();
    await waitUntilKeptOnDevice(page, projectId);

    // No signal; reload.
    await context.setOffline(true);
    expect(await page.evaluate(() => fetch("/api/health").then(() => "reached", () => "unreachable"))).toBe("unreachable");
    await page.reload();
    await page.getByRole("heading", { name: `Field survey ${tag}` }).waitFor();
    await page.locator("header").getByText("No signal").waitFor();
    await page.setViewportSize({ width: 1280, height: 900 });
    await shot(page, "field-offline-desk");
    await page.setViewportSize({ width: 390, height: 844 });

    // A new space, made on the device.
    await page.getByRole("button", { name: 'Add "Main attic"' }).click();
    await page.getByRole("tab", { name: /Main attic/ }).waitFor();
    await page.getByRole("button", { name: "Add rectangle" }).click();
    await page.getByLabel("Length (along the ridge)").fill(`42'`);
    await page.getByLabel("Width (eave to eave)").fill(`26'`);
    await page.getByRole("button", { name: "Ridge vent", exact: true }).click();
    await page.getByRole("button", { name: "Soffit vents, 8 × 16", exact: true }).click();
    await page.getByRole("heading", { name: "Vent 2 (individual soffit vent)" }).waitFor();

    // A photo of the ridge vent, kept on the device.
    await page.locator('input[type="file"][aria-label="Photo file"]').setInputFiles({ name: "ridge.png", mimeType: "image/png", buffer: await smallPng() });
    await page.getByLabel("Attach to").selectOption({ label: "Vent: Vent 1 (ridge vent)" });
    await page.getByLabel("Caption").fill("Ridge vent, east half");
    await page.getByRole("button", { name: "Add photo" }).click();
    await page.getByText("On this device, waiting to upload").waitFor();
    // The new space and its survey, and the photo.
    await expect.poll(() => waitingText(page)).toBe("2 changes and 1 photo waiting");
    await shot(page, "field-offline-phone");
    await page.locator("header").getByRole("button", { name: /No signal/ }).click();
    await shot(page, "field-offline-waiting-list-phone");
    await page.keyboard.press("Escape");

    // The analysis, worked out on the phone.
    await page.getByRole("tab", { name: /Analysis/ }).click();
    const offlineFigures = await page.locator("[data-analysis-figures]").getAttribute("data-analysis-figures");
    expect(offlineFigures).toBeTruthy();
    await shot(page, "field-offline-analysis-phone");

    // Close the page and open it again, still with no signal.
    await page.close();
    const again = await context.newPage();
    again.on("pageerror", (error) => errors.push(error.message));
    await again.goto(`/projects/${projectId}`);
    await again.getByRole("tab", { name: /Main attic/ }).waitFor();
    await again.getByRole("heading", { name: "Vent 2 (individual soffit vent)" }).waitFor();
    expect(await again.getByLabel("Length (along the ridge)").inputValue()).toBe(`42'`);
    await again.getByText("On this device, waiting to upload").waitFor();
    await expect.poll(() => waitingText(again)).toBe("2 changes and 1 photo waiting");

    // The signal returns: everything goes, in order, once.
    await context.setOffline(false);
    await again.getByRole("img", { name: "Ridge vent, east half" }).waitFor();
    await expect.poll(() => again.locator("header [role=status]").count(), { timeout: 20_000 }).toBe(0);
    await expect.poll(() => again.getByText("On this device, waiting to upload").count()).toBe(0);

    const detail = await api<{ spaces: { id: string; name: string; vents: { kind: string }[] }[]; photos: { spaceId: string; ventId: string; caption: string }[] }>(again, "GET", `/api/projects/${projectId}`);
    expect(detail.body.spaces).toHaveLength(1);
    const [space] = detail.body.spaces;
    expect(space!.name).toBe("Main attic");
    expect(space!.vents.map((v) => v.kind).sort()).toEqual(["ridge", "soffit-individual"]);
    expect(detail.body.photos).toHaveLength(1);
    expect(detail.body.photos[0]).toMatchObject({ spaceId: space!.id, caption: "Ridge vent, east half" });

    const analysis = await api<{ spaces: { spaceId: string; analysis: Parameters<typeof figures>[0] }[] }>(again, "GET", `/api/projects/${projectId}/analysis`);
    expect(analysis.body.spaces).toHaveLength(1);
    expect(figures(analysis.body.spaces[0]!.analysis)).toEqual(JSON.parse(offlineFigures!));
    await shot(again, "field-back-online-phone");

    // The service worker keeps the app's files only: no API answer in any of its caches.
    const cachedApi = await again.evaluate(async () => {
      const urls: string[] = [];
      for (const name of await caches.keys()) for (const request of await (await caches.open(name)).keys()) urls.push(request.url);
      return { count: urls.length, api: urls.filter((u) => new URL(u).pathname.startsWith("/api/")) };
    });
    expect(cachedApi.count).toBeGreaterThan(10);
    expect(cachedApi.api).toEqual([]);

    // Signing out on a shared phone deletes the device copy, the queue and any unsent draft.
    await again.getByRole("button", { name: /^Account:/ }).click();
    await again.getByRole("button", { name: "Sign out", exact: true }).click();
    await again.waitForURL(/\/sign-in/);
    const left = await again.evaluate(async () => {
      const count = (db: string, store: string) =>
        new Promise<number>((resolve) => {
          const open = indexedDB.open(db);
          open.onsuccess = () => {
            if (!open.result.objectStoreNames.contains(store)) return resolve(0);
            const req = open.result.transaction(store).objectStore(store).count();
            req.onsuccess = () => resolve(req.result);
          };
        });
      return {
        copies: await count("eavesight-device-copy", "copies"),
        queued: await count("eavesight-field-outbox", "items"),
        local: Object.keys(localStorage).filter((k) => k.startsWith("eavesight:")),
      };
    });
    expect(left).toEqual({ copies: 0, queued: 0, local: [] });
    expect(errors).toEqual([]);
    await context.close();
  });
});

/** The same figures the page shows in `data-analysis-figures` (src/features/survey/components/analysis-panel.tsx). */
function figures(a: {
  compliant: boolean; floorAreaSqFt: number; requirement: { ratio: number; totalSqIn: number };
  provided: { intakeSqIn: number; exhaustSqIn: number }; findings: { code: string }[];
}) {
  return {
    compliant: a.compliant, floorAreaSqFt: a.floorAreaSqFt, ratio: a.requirement.ratio, requiredSqIn: a.requirement.totalSqIn,
    intakeSqIn: a.provided.intakeSqIn, exhaustSqIn: a.provided.exhaustSqIn, findings: a.findings.map((f) => f.code).sort(),
  };
}

describe("field mode: the same survey changed elsewhere meanwhile", () => {
  it("when edits made offline meet a newer saved version, then each differing part is shown with both versions and the estimator's choice of each is what is saved", async () => {
    const { context, page, errors } = await openPhone();
    await signInAs(page, ESTIMATOR);
    await page.waitForURL(/\/projects/);
    const tag = Date.now().toString(36);
    const projectId = await makeProject(page, `c${tag}`);
    const created = await api<{ space: { id: string; version: number } }>(page, "POST", `/api/projects/${projectId}/spaces`, {
      name: "Main attic",
      sections: [{ id: "block", kind: "rect", lengthFt: 40, widthFt: 30 }],
      vents: [
        { id: "ridge", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18 },
        { id: "soffit", kind: "soffit-individual", location: "lower", quantity: 10, nfaSqInPerUnit: 50 },
      ],
    });
    expect(created.status).toBe(201);
    await page.goto(`/projects/${projectId}`);
    await page.getByRole("tab", { name: /Main attic/ }).waitFor();
    await waitUntilKeptOnDevice(page, projectId);

    // In the attic with no signal: the block is 44 ft, not 40.
    await context.setOffline(true);
    await page.getByLabel("Length (along the ridge)").fill(`44'`);
    await page.locator("header").getByText("1 change waiting").waitFor();

    // Meanwhile the office renames the space and counts 12 soffit vents.
    const office = await newPage(browser);
    await signInAs(office.page, "owner@tallgrass.example");
    await office.page.waitForURL(/\/projects/);
    const saved = await api<{ space: { version: number } }>(office.page, "PUT", `/api/projects/${projectId}/spaces/${created.body.space.id}`, {
      name: "House attic", roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: null, eaveLengthFt: null },
      sections: [{ id: "block", kind: "rect", lengthFt: 40, widthFt: 30 }],
      vents: [
        { id: "ridge", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18 },
        { id: "soffit", kind: "soffit-individual", location: "lower", quantity: 12, nfaSqInPerUnit: 50 },
      ],
      site: {}, notes: "Counted from the ladder", version: created.body.space.version,
    });
    expect(saved.status).toBe(200);
    await office.context.close();

    // The signal returns: the save meets the newer version and asks, part by part.
    await context.setOffline(false);
    const dialog = page.getByRole("dialog");
    await dialog.getByRole("heading", { name: /Someone else changed/ }).waitFor();
    await dialog.locator("fieldset[data-part]").first().waitFor();
    const parts = await dialog.locator("fieldset[data-part]").evaluateAll((list) => list.map((f) => f.getAttribute("data-part")));
    expect(parts).toEqual(["name", "section:block", "vent:soffit", "notes"]);
    await dialog.locator('fieldset[data-part="name"]').getByLabel(/Theirs/).check();
    await dialog.locator('fieldset[data-part="vent:soffit"]').getByLabel(/Theirs/).check();
    await dialog.locator('fieldset[data-part="notes"]').getByLabel(/Theirs/).check();
    // The block keeps this device's 44 ft (chosen by default).
    expect(await dialog.locator('fieldset[data-part="section:block"]').getByLabel(/Yours/).isChecked()).toBe(true);
    await shot(page, "field-conflict-phone");
    await dialog.getByRole("button", { name: "Save my choices" }).click();
    await dialog.waitFor({ state: "detached" });
    await expect.poll(() => page.locator("[data-save-state]").first().getAttribute("data-save-state"), { timeout: 15_000 }).toBe("saved");

    const detail = await api<{ spaces: { name: string; version: number; notes: string | null; sections: { lengthFt: number }[]; vents: { id: string; quantity?: number; lengthFt?: number }[] }[] }>(page, "GET", `/api/projects/${projectId}`);
    const [space] = detail.body.spaces;
    expect(space).toMatchObject({ name: "House attic", notes: "Counted from the ladder", version: saved.body.space.version + 1 });
    expect(space!.sections[0]!.lengthFt).toBe(44);
    expect(space!.vents.find((v) => v.id === "soffit")!.quantity).toBe(12);
    expect(space!.vents.find((v) => v.id === "ridge")!.lengthFt).toBe(36);
    expect(errors).toEqual([]);
    await context.close();
  });
});

describe("field mode: a new version", () => {
  it("when a new version is published while the estimator works, then the app says so and waits; it reloads only when asked", async () => {
    const clientDir = process.env["E2E_CLIENT_DIR"];
    expect(clientDir, "E2E_CLIENT_DIR is set by the test task").toBeTruthy();
    const swPath = path.join(clientDir!, "sw.js");
    const original = await readFile(swPath);
    const { context, page, errors } = await openPhone();
    try {
      await signInAs(page, ESTIMATOR);
      await page.waitForURL(/\/projects/);
      await page.evaluate(async () => {
        await navigator.serviceWorker.ready;
      });
      // The app opened again (from the home screen, say): now the service worker serves this page.
      await page.reload();
      await expect.poll(() => page.evaluate(() => navigator.serviceWorker.controller !== null)).toBe(true);
      // A mark that a reload would wipe, and something typed that must not be lost.
      await page.evaluate(() => Object.assign(window, { stillTheSamePage: true }));
      const search = page.getByLabel("Search projects");
      await search.fill("Varnum");

      // Publish a new version: any change to sw.js is one (its compressed copies are dropped so the new text is served).
      await Promise.all([".br", ".gz"].map((ext) => rm(`${swPath}${ext}`, { force: true })));
      await writeFile(swPath, `${original.toString("utf8")}\n// next release ${Date.now()}\n`);
      await page.evaluate(async () => {
        const registration = await navigator.serviceWorker.getRegistration();
        await registration?.update();
      });
      await page.getByText("A new version of Eavesight is ready.").waitFor();
      await shot(page, "field-update-ready-phone");
      // Nothing reloaded by itself.
      await page.waitForTimeout(1_000);
      expect(await page.evaluate(() => (window as unknown as { stillTheSamePage?: boolean }).stillTheSamePage)).toBe(true);
      expect(await search.inputValue()).toBe("Varnum");

      // The estimator chooses when.
      await Promise.all([page.waitForEvent("framenavigated"), page.getByRole("button", { name: "Update now" }).click()]);
      await page.waitForLoadState("domcontentloaded");
      await expect.poll(() => page.evaluate(() => (window as unknown as { stillTheSamePage?: boolean }).stillTheSamePage ?? false)).toBe(false);
      await page.getByRole("heading", { name: "Projects" }).first().waitFor();
      expect(await page.getByText("A new version of Eavesight is ready.").count()).toBe(0);
      expect(errors).toEqual([]);
    } finally {
      await writeFile(swPath, original);
      await context.close();
    }
  });
});
