import { afterAll, beforeAll, describe, expect, it } from "vitest";
import path from "node:path";
import type { Browser } from "playwright-core";
import { launchBrowser, newPage, signInAs, SHOTS_DIR } from "../setup/browser.ts";

/** Issue 16: on a desk, the catalog's Edit and Retire are in view, not in a box that scrolls sideways. */

let browser: Browser;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ browser, close } = await launchBrowser());
});
afterAll(async () => {
  await close?.();
});

describe("the catalog on a desk", () => {
  it("when the owner opens the catalog at 1280 px, then each row's Edit and Retire are visible without scrolling sideways", async () => {
    const { context, page } = await newPage(browser, { width: 1280, height: 900 });
    try {
      await signInAs(page, "owner@tallgrass.example");
      await page.waitForURL(/\/projects/);
      await page.goto("/catalog");
      const table = page.getByRole("table", { name: "Catalog items" });
      await table.waitFor();
      const overflowPx = await table.evaluate((el) => el.parentElement!.scrollWidth - el.parentElement!.clientWidth);
      expect(overflowPx).toBeLessThanOrEqual(0);
      for (const name of [/^Edit /, /^Retire /]) {
        const box = await table.getByRole("button", { name }).first().boundingBox();
        expect(box!.x + box!.width).toBeLessThanOrEqual(1280);
      }
      await page.screenshot({ path: path.join(SHOTS_DIR, "catalog-desk.png") });
    } finally {
      await context.close();
    }
  });
});
