import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { execFileSync } from "node:child_process";
import { mkdirSync, readFileSync, readdirSync } from "node:fs";
import path from "node:path";
import postgres from "postgres";
import type { Browser, Locator, Page } from "playwright-core";
import { launchBrowser, newPage, signInAs, SHOTS_DIR } from "../setup/browser.ts";

let browser: Browser;
let close: () => Promise<void>;
let sql: ReturnType<typeof postgres>;
beforeAll(async () => {
  ({ browser, close } = await launchBrowser());
  mkdirSync(SHOTS_DIR, { recursive: true });
  const url = process.env.EAVESIGHT_TEST_DATABASE_URL;
  if (!url) throw new Error("EAVESIGHT_TEST_DATABASE_URL is not set: run with `npm test -- --only e2e proposals`.");
  sql = postgres(url, { max: 1 });
});
afterAll(async () => {
  await sql?.end({ timeout: 2 });
  await close?.();
});

const SALES = "sales@tallgrass.example";
/** The seeded fan-and-ridge project and its two saved options (scripts/lib/seed.ts). */
const FAN_AND_RIDGE = "Varnum attic — gable fan and ridge vent";
const DEMO_OPTIONS = ["Ridge and soffit (remove fan)", "Keep a gable fan, close the ridge, add intake"];
const HOMEOWNER_EMAIL = "odette.varnum@example.com";

const shot = (page: Page, name: string, fullPage = false) => page.screenshot({ path: path.join(SHOTS_DIR, `${name}.png`), fullPage });

/** A signature-like scribble drawn with the mouse. */
async function drawSignature(canvas: Locator, page: Page) {
  // Centred, so no sticky header lies over it.
  await canvas.evaluate((el) => el.scrollIntoView({ block: "center" }));
  const box = (await canvas.boundingBox())!;
  const y = box.y + box.height * 0.55;
  await page.mouse.move(box.x + 30, y);
  await page.mouse.down();
  for (let i = 1; i <= 24; i++) await page.mouse.move(box.x + 30 + i * 12, y - Math.sin(i / 2) * 28, { steps: 2 });
  await page.mouse.up();
  await page.mouse.move(box.x + 60, y + 18);
  await page.mouse.down();
  await page.mouse.move(box.x + 260, y + 12, { steps: 8 });
  await page.mouse.up();
}

/** The newest e-mail to the homeowner after `since`, with the proposal link in it. */
async function linkFromOutbox(since: Date): Promise<string> {
  const deadline = Date.now() + 20_000;
  while (Date.now() < deadline) {
    const rows = await sql<{ text: string | null; subject: string }[]>`
      select text, subject from outbox_messages where to_address = ${HOMEOWNER_EMAIL} and created_at >= ${since} order by created_at desc limit 1`;
    const match = rows[0]?.text?.match(/https?:\/\/\S+\/p\/[A-Za-z0-9_-]+/);
    if (match) return new URL(match[0]).pathname;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error("no proposal e-mail reached the fake SMTP outbox");
}

async function openProjectProposals(page: Page): Promise<string> {
  await page.getByLabel("Search projects").fill("gable fan and ridge");
  await page.waitForURL(/q=gable/);
  // The list re-renders as the search lands: wait until only the matching project is left.
  await expect.poll(() => page.getByRole("link", { name: "Varnum garage — soffit repair" }).count()).toBe(0);
  await page.getByRole("link", { name: FAN_AND_RIDGE }).first().click();
  await page.waitForURL(/\/projects\/[0-9a-f-]{36}$/);
  const projectId = new URL(page.url()).pathname.split("/")[2]!;
  await page.goto(`/projects/${projectId}/proposals`);
  await page.getByRole("heading", { name: "Proposals", level: 1 }).waitFor();
  return projectId;
}

/** Starts a proposal with exactly the named options and waits for the builder. */
async function startProposal(page: Page, names: string[]) {
  const card = page.getByRole("region", { name: "New proposal" });
  const boxes = card.getByRole("checkbox");
  await boxes.first().waitFor();
  for (let i = 0; i < (await boxes.count()); i++) {
    const box = boxes.nth(i);
    const label = (await card.locator(`label[for="${await box.getAttribute("id")}"]`).innerText()).split("\n")[0]!.trim();
    await box.setChecked(names.includes(label));
  }
  await card.getByRole("button", { name: "Start the proposal" }).click();
  await page.waitForURL(/\/proposals\/[0-9a-f-]{36}$/);
  await page.getByRole("heading", { name: /Proposal for Odette Varnum/, level: 1 }).waitFor();
}

const waitSaved = (page: Page) => expect.poll(() => page.locator("[data-save-state]").first().getAttribute("data-save-state"), { timeout: 15_000 }).toBe("saved");

async function sendProposal(page: Page): Promise<string> {
  const since = new Date(Date.now() - 2_000);
  await page.getByRole("button", { name: "Send to the homeowner" }).click();
  const dialog = page.getByRole("dialog", { name: "Send this proposal?" });
  // The address is filled in from the customer and can be corrected here.
  await expect.poll(() => dialog.getByRole("textbox", { name: /Homeowner's e-mail/ }).inputValue()).toBe(HOMEOWNER_EMAIL);
  await page.waitForTimeout(300); // let the dialog finish rising before the picture
  await shot(page, "proposal-send-confirm");
  await dialog.getByRole("button", { name: "Sign and send" }).click();
  await dialog.waitFor({ state: "detached" });
  const shown = await page.locator("[data-proposal-link]").inputValue();
  const mailed = await linkFromOutbox(since);
  expect(new URL(shown).pathname).toBe(mailed);
  return mailed;
}

function pdfPages(file: string, prefix: string): string[] {
  execFileSync("pdftoppm", ["-png", "-r", "50", "-f", "1", "-l", "3", file, path.join(SHOTS_DIR, prefix)]);
  return readdirSync(SHOTS_DIR).filter((f) => f.startsWith(prefix));
}

describe("the company profile", () => {
  it("when the owner sets a tax rate in percent and a capped deposit, then they are kept exactly", async () => {
    const { context, page } = await newPage(browser, { width: 1280, height: 900 });
    try {
      await signInAs(page, "owner@tallgrass.example");
      await page.waitForURL(/\/projects/);
      await page.goto("/settings/company");
      await page.getByRole("heading", { name: "Company profile", level: 1 }).waitFor();
      await page.getByLabel("Sales tax rate").fill("8.25");
      await page.getByRole("radio", { name: "A percent of the total" }).check();
      await page.getByLabel("Deposit percent").fill("10");
      await page.getByLabel(/Never more than/).fill("1,000");
      // Sales at the home carry the FTC three-day cancellation notice; the homeowner test reads it.
      await page.getByRole("checkbox", { name: /three-day cancellation notice/ }).check();
      await page.getByRole("button", { name: "Save company profile" }).click();
      await page.getByText("Company profile saved").waitFor();
      const company = await page.evaluate(async () => (await (await fetch("/api/company")).json()) as { company: { taxRateBasisPoints: number; depositRule: unknown } });
      expect(company.company.taxRateBasisPoints).toBe(825);
      expect(company.company.depositRule).toEqual({ kind: "percent", value: 10, capCents: 100_000 });
      await page.reload();
      expect(await page.getByLabel("Sales tax rate").inputValue()).toBe("8.25");
      await page.getByText(/lesser of \$1,000 or 10 %/).waitFor();
      await shot(page, "company-profile", true);
      // Put the seeded rate back, so the prices the next test reads stay the demo's.
      await page.getByLabel("Sales tax rate").fill("7.25");
      await page.getByRole("button", { name: "Save company profile" }).click();
      await expect.poll(async () => (await page.evaluate(async () => (await (await fetch("/api/company")).json()) as { company: { taxRateBasisPoints: number } })).company.taxRateBasisPoints).toBe(725);
    } finally {
      await context.close();
    }
  });
});

describe("proposals from builder to signature", () => {
  it("when sales builds, signs and sends, then the homeowner downloads, accepts option 2 with a drawn signature, and sales sees it", async () => {
    const { context, page } = await newPage(browser, { width: 1280, height: 900 });
    const errors: string[] = [];
    page.on("pageerror", (e) => errors.push(e.message));
    try {
      await signInAs(page, SALES);
      await page.waitForURL(/\/projects/);
      const projectId = await openProjectProposals(page);
      await shot(page, "proposals-list");
      await startProposal(page, DEMO_OPTIONS);
      const proposalUrl = page.url();

      // Both options are in, each with a generated scope; a cover note and a scope edit save with the version.
      for (const name of DEMO_OPTIONS) expect(await page.getByRole("checkbox", { name }).isChecked()).toBe(true);
      await page.getByRole("textbox", { name: /^Cover note/ }).fill("Thank you for having us out. Here is what we found in the attic and two ways to fix it.");
      const scope = page.getByRole("textbox", { name: `Scope of work for ${DEMO_OPTIONS[0]}` });
      expect(await scope.inputValue()).not.toBe("");
      await scope.fill(`${await scope.inputValue()}\nLeave the attic broom-clean.`);
      await waitSaved(page);

      // Prepare the PDF and watch it go through to ready.
      await page.getByRole("button", { name: "Prepare PDF" }).click();
      await page.locator('[data-render-status="ready"]').waitFor({ timeout: 60_000 });
      await page.getByRole("link", { name: "Download the PDF" }).waitFor();

      // Sign (drawn with the mouse), saved on the profile.
      if (await page.getByRole("button", { name: "Change my signature" }).isVisible()) await page.getByRole("button", { name: "Change my signature" }).click();
      await drawSignature(page.getByRole("img", { name: /Your signature: draw/ }), page);
      await page.getByRole("button", { name: "Save my signature" }).click();
      await page.getByRole("img", { name: /Drawn signature of/ }).waitFor();
      await shot(page, "proposal-builder", true);

      const link = await sendProposal(page);
      await page.getByText("Sent — frozen").waitFor();
      await page.locator('[data-status="sent"]').first().waitFor();
      await shot(page, "proposal-sent", true);

      // The homeowner, in a fresh browser context (no session).
      const home = await newPage(browser, { width: 1280, height: 900 });
      const homeErrors: string[] = [];
      home.page.on("pageerror", (e) => homeErrors.push(e.message));
      try {
        const hp = home.page;
        await hp.goto(link);
        await hp.getByRole("heading", { name: "Hello Odette,", level: 1 }).waitFor();
        await hp.getByRole("heading", { name: "What we found" }).waitFor();
        await hp.getByRole("img", { name: /Airflow in .* today/ }).first().waitFor();
        await hp.getByText("How much venting the code asks for").first().click();
        await hp.getByText(/The building code asks for 1 square foot/).first().waitFor();
        await hp.getByRole("heading", { name: "Your 2 options" }).waitFor();
        await hp.getByText("About powered attic fans:").first().waitFor();
        await hp.locator("[data-cooling-off]").getByText("NOTICE OF CANCELLATION", { exact: true }).waitFor({ state: "attached" });

        const download = hp.getByRole("link", { name: "Download the proposal (PDF)" });
        await download.waitFor({ timeout: 60_000 });
        const [file] = await Promise.all([hp.waitForEvent("download"), download.click()]);
        const pdfPath = path.join(SHOTS_DIR, "homeowner-proposal.pdf");
        await file.saveAs(pdfPath);
        expect(readFileSync(pdfPath).subarray(0, 5).toString("latin1")).toBe("%PDF-");
        expect(pdfPages(pdfPath, "homeowner-pdf").length).toBeGreaterThan(0);
        await shot(hp, "homeowner-desktop", true);

        // Accept option 2 with a drawn signature and consent. Missing consent is refused in words first.
        await hp.getByRole("button", { name: "Choose option 2" }).click();
        expect(await hp.getByRole("radio", { name: new RegExp(`Option 2: ${DEMO_OPTIONS[1]}`) }).isChecked()).toBe(true);
        await hp.locator("[data-esign-text]").getByText(/paper copy/).waitFor();
        await hp.getByText(/Consent text version esign-/).waitFor();
        await hp.getByLabel("2. Your full name").fill("Odette Varnum");
        await drawSignature(hp.getByRole("img", { name: /Signature box/ }), hp);
        await hp.getByRole("button", { name: "Accept option 2 and sign" }).click();
        await hp.getByText("Please tick the box to agree to sign electronically.").first().waitFor();
        await hp.getByRole("checkbox", { name: /I agree to sign electronically/ }).check();
        await shot(hp, "homeowner-accept-form", true);
        await hp.getByRole("button", { name: "Accept option 2 and sign" }).click();
        await hp.getByRole("heading", { name: "Thank you — accepted" }).waitFor();
        await hp.getByRole("link", { name: "Download your signed copy (PDF)" }).waitFor({ timeout: 60_000 });
        await shot(hp, "homeowner-accepted", true);
        expect(homeErrors).toEqual([]);
      } finally {
        await home.context.close();
      }

      // Sales sees "accepted" with the audit trail, and the revision is locked.
      await page.goto(proposalUrl);
      await page.locator('[data-status="accepted"]').first().waitFor();
      const trail = page.getByRole("list", { name: "Audit trail" });
      for (const event of ["created", "sent", "viewed", "accepted"]) await trail.locator(`[data-event="${event}"]`).first().waitFor();
      await trail.getByText("Signed by Odette Varnum (drawn signature)").waitFor();
      expect(await page.getByRole("button", { name: "Make a new revision" }).count()).toBe(0);
      await page.getByRole("link", { name: "Download the signed PDF" }).waitFor({ timeout: 60_000 });
      await shot(page, "proposal-accepted", true);

      // A second proposal: sent, looked at on a 390 px phone, then revised; its old link says it was replaced.
      await page.goto(`/projects/${projectId}/proposals`);
      await startProposal(page, [DEMO_OPTIONS[1]!]);
      await waitSaved(page);
      const secondLink = await sendProposal(page);
      const phone = await newPage(browser, { width: 390, height: 844 });
      try {
        await phone.page.goto(secondLink);
        await phone.page.getByRole("heading", { name: "Hello Odette,", level: 1 }).waitFor();
        await phone.page.getByRole("heading", { name: "What we propose" }).waitFor();
        await phone.page.locator("[data-decision]").waitFor();
        const overflow = await phone.page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
        expect(overflow).toBeLessThanOrEqual(0);
        await shot(phone.page, "homeowner-phone");
        await shot(phone.page, "homeowner-phone-full", true);

        await page.getByRole("button", { name: "Make a new revision" }).click();
        await page.getByRole("dialog", { name: "Make a new revision?" }).getByRole("button", { name: "Make a new revision" }).click();
        await page.getByText("revision 2").first().waitFor();
        await page.locator('[data-status="draft"]').first().waitFor();

        await phone.page.goto(secondLink);
        await phone.page.getByRole("heading", { name: "This proposal has been replaced by a newer one" }).waitFor();
        await phone.page.getByText(/ask them for the new link/).waitFor();
        await shot(phone.page, "homeowner-superseded");
        await phone.page.goto("/p/not-a-real-link-aaaaaaaaaaaaaaaaaaaaaaa");
        await phone.page.getByRole("heading", { name: "We can't find this proposal" }).waitFor();
      } finally {
        await phone.context.close();
      }

      // The pipeline shows the accepted one and the win rate.
      await page.goto("/pipeline");
      await page.locator('[data-stage="accepted"] [data-pipeline-proposal]').first().waitFor();
      await page.locator("[data-win-rate]").getByText(/accepted of/).waitFor();
      await shot(page, "pipeline", true);
      expect(errors).toEqual([]);
    } catch (error) {
      await shot(page, "proposal-failure", true).catch(() => undefined);
      throw new Error(`${error instanceof Error ? error.message : String(error)}\nBrowser errors: ${errors.join(" | ")}`, { cause: error });
    } finally {
      await context.close();
    }
  });
});
