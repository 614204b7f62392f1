import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdirSync } from "node:fs";
import path from "node:path";
import type { Browser } from "playwright-core";
import { launchBrowser, newPage, signInAs, SHOTS_DIR } from "../setup/browser.ts";

let browser: Browser;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ browser, close } = await launchBrowser());
  mkdirSync(SHOTS_DIR, { recursive: true });
});
afterAll(async () => close?.());

// What each demo role should and should not see in the navigation (DESIGN.md §2).
const ROLES = [
  { email: "owner@tallgrass.example", sees: ["Projects", "Customers", "Catalog", "Pipeline", "Team", "Outbox"], hidden: [] as string[] },
  { email: "estimator@tallgrass.example", sees: ["Projects", "Customers", "Catalog"], hidden: ["Pipeline", "Team", "Outbox"] },
  { email: "sales@tallgrass.example", sees: ["Projects", "Customers", "Catalog", "Pipeline"], hidden: ["Team", "Outbox"] },
];

describe("signing in as each role", () => {
  it.each(ROLES)("when $email signs in, then the navigation shows what the role may use, and signing out returns to sign-in", async ({ email, sees, hidden }) => {
    const { context, page } = await newPage(browser);
    try {
      await page.goto("/settings/team");
      await page.waitForURL(/\/sign-in\?next=/); // guard sends a signed-out user to sign-in and back
      await signInAs(page, email);
      await page.waitForLoadState("networkidle");
      const header = page.getByRole("banner");
      await expect.poll(() => header.textContent()).toContain("Tallgrass Exteriors");
      const navLink = (label: string) => page.locator("nav").getByRole("link", { name: label, exact: true });
      const main = sees.filter((l) => !["Team", "Outbox"].includes(l));
      for (const label of main) await navLink(label).first().waitFor();
      for (const label of hidden.filter((l) => !["Team", "Outbox"].includes(l))) expect(await navLink(label).count()).toBe(0);

      await page.goto("/settings/profile");
      await page.getByRole("heading", { name: "My profile" }).first().waitFor();
      for (const label of sees.filter((l) => ["Team", "Outbox"].includes(l))) await navLink(label).first().waitFor();
      for (const label of hidden.filter((l) => ["Team", "Outbox"].includes(l))) expect(await navLink(label).count()).toBe(0);
      await page.screenshot({ path: path.join(SHOTS_DIR, `nav-${email.split("@")[0]}.png`) });

      await page.getByRole("button", { name: /account|menu/i }).first().click();
      await page.getByRole("menuitem", { name: /^sign out$/i }).or(page.getByRole("button", { name: /^sign out$/i })).first().click();
      await page.waitForURL(/\/sign-in/);
      const me = await page.request.get("/api/auth/me");
      expect(me.status()).toBe(401);
    } finally {
      await context.close();
    }
  });

  it("when the password is wrong, then the page says so and keeps the typed e-mail", async () => {
    const { context, page } = await newPage(browser, { width: 390, height: 844 });
    try {
      await signInAs(page, "sales@tallgrass.example", "wrong password here");
      await page.getByRole("alert").waitFor();
      expect(await page.getByRole("alert").textContent()).toMatch(/do not match/i);
      expect(await page.getByLabel("E-mail").inputValue()).toBe("sales@tallgrass.example");
      await page.screenshot({ path: path.join(SHOTS_DIR, "sign-in-error-390.png") });
    } finally {
      await context.close();
    }
  });
});
