import path from "node:path";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";

export const BASE_URL = process.env.E2E_BASE_URL ?? "";
export const SHOTS_DIR = path.resolve(".var", "screenshots");

/** Debian's Chromium driven by playwright-core (never a downloaded browser), each run on a fresh temporary profile. */
export async function launchBrowser(): Promise<{ browser: Browser; close: () => Promise<void> }> {
  if (!BASE_URL) throw new Error("E2E_BASE_URL is not set: run the browser tests with `npm test` (or `npm test -- --only e2e`).");
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: [
      "--no-sandbox", "--disable-gpu", "--disable-quic", "--disable-background-networking",
      "--disable-component-update", "--disable-sync", "--no-first-run",
    ],
  });
  return {
    browser,
    async close() {
      await browser.close();
    },
  };
}

/**
 * A fresh context. The service worker (field mode) is blocked unless a test asks for it: it would
 * precache the whole client in every context and slow every other test for nothing.
 */
export async function newPage(
  browser: Browser,
  opts: { width?: number; height?: number; serviceWorkers?: "allow" | "block" } = {},
): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({
    baseURL: BASE_URL,
    viewport: { width: opts.width ?? 1280, height: opts.height ?? 900 },
    serviceWorkers: opts.serviceWorkers ?? "block",
  });
  const page = await context.newPage();
  page.setDefaultTimeout(15_000);
  return { context, page };
}

export async function signInAs(page: Page, email: string, password = "eavesight-demo"): Promise<void> {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail", { exact: false }).fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: /sign in/i }).click();
}
