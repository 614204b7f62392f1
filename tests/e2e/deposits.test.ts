import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdirSync } from "node:fs";
import path from "node:path";
import postgres from "postgres";
import type { APIRequestContext, Browser, Page } from "playwright-core";
import { BASE_URL, launchBrowser, newPage, signInAs, SHOTS_DIR } from "../setup/browser.ts";

let browser: Browser;
let close: () => Promise<void>;
let sql: ReturnType<typeof postgres>;
beforeAll(async () => {
  if (!process.env.PAYMENTS_API_BASE) throw new Error("PAYMENTS_API_BASE is not set: run with `npm test -- --only e2e deposits` (it starts the fake payment service).");
  ({ browser, close } = await launchBrowser());
  mkdirSync(SHOTS_DIR, { recursive: true });
  sql = postgres(process.env.EAVESIGHT_TEST_DATABASE_URL!, { max: 1 });
});
afterAll(async () => {
  await sql?.end({ timeout: 2 });
  await close?.();
});

const SALES = "sales@tallgrass.example";
/** A seeded project without saved options, so this file does not change what the proposals test works on. */
const PROJECT = "Brennock attic — balanced ridge and soffit";

const shot = (page: Page, name: string, fullPage = false) => page.screenshot({ path: path.join(SHOTS_DIR, `${name}.png`), fullPage });

async function api<T>(request: APIRequestContext, method: "get" | "post" | "put", url: string, data?: unknown): Promise<T> {
  const res = await request[method](url, { headers: { origin: BASE_URL }, ...(data === undefined ? {} : { data }) });
  if (!res.ok()) throw new Error(`${method} ${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

/** Sales prices an option on the demo project and sends a proposal for it; answers the homeowner's link path and the proposal id. */
async function sentProposal(request: APIRequestContext): Promise<{ link: string; projectId: string; proposalId: string; optionName: string }> {
  const projects = await api<{ items: { id: string; title: string }[] }>(request, "get", `/api/projects?q=${encodeURIComponent("Brennock")}`);
  const project = projects.items.find((p) => p.title === PROJECT)!;
  const detail = await api<{ spaces: { id: string }[] }>(request, "get", `/api/projects/${project.id}`);
  const catalog = await api<{ items: { id: string; kind: string }[] }>(request, "get", "/api/catalog");
  const soffit = catalog.items.find((i) => i.kind === "soffit-individual") ?? catalog.items.find((i) => i.kind.startsWith("soffit"))!;
  const optionName = `Added intake and deck repair ${Date.now()}`;
  const option = await api<{ option: { id: string } }>(request, "post", `/api/projects/${project.id}/options`, {
    name: optionName,
    spaces: [{ spaceId: detail.spaces[0]!.id, ventActions: {}, added: [{ id: "a1", catalogItemId: soffit.id, quantity: 6 }] }],
    laborLines: [{ id: "l1", description: "Replace soft roof deck at the eaves", hours: 30, rateCents: 11_000 }],
  });
  const proposal = await api<{ proposal: { id: string } }>(request, "post", `/api/projects/${project.id}/proposals`, { optionIds: [option.option.id] });
  await api(request, "put", "/api/auth/me/signature", { typed: "Priya Lindqvist" });
  const sent = await api<{ link: string }>(request, "post", `/api/proposals/${proposal.proposal.id}/send`);
  return { link: new URL(sent.link).pathname, projectId: project.id, proposalId: proposal.proposal.id, optionName };
}

describe("the deposit after signing", () => {
  it("when the homeowner accepts and pays on the payment page, then they see the deposit received, sales sees it and is e-mailed", async () => {
    const staff = await newPage(browser);
    const errors: string[] = [];
    staff.page.on("pageerror", (e) => errors.push(e.message));
    try {
      await signInAs(staff.page, SALES);
      await staff.page.waitForURL(/\/projects/);
      const { link, projectId, proposalId, optionName } = await sentProposal(staff.context.request);

      const home = await newPage(browser, { width: 390, height: 844 });
      home.page.on("pageerror", (e) => errors.push(e.message));
      try {
        const hp = home.page;
        await hp.goto(link);
        await hp.getByRole("button", { name: "Choose option 1" }).click();
        expect(await hp.getByRole("radio", { name: new RegExp(`Option 1: ${optionName}`) }).isChecked()).toBe(true);
        await hp.getByLabel("2. Your full name").fill("Silas Brennock");
        await hp.getByRole("radio", { name: /Type it/ }).check();
        await hp.getByLabel("Type your name to sign").fill("Silas Brennock");
        await hp.getByRole("checkbox", { name: /I agree to sign electronically/ }).check();
        await hp.getByRole("button", { name: "Accept option 1 and sign" }).click();
        await hp.getByRole("heading", { name: "Thank you — accepted" }).waitFor();

        // The amount is the server's: 10 % of the total, capped by the company's rule.
        const deposit = hp.getByTestId("deposit");
        await deposit.getByRole("heading", { name: "Deposit due at signing" }).waitFor();
        const amount = (await hp.getByTestId("deposit-amount").innerText()).trim();
        expect(amount).toMatch(/^\$\d{1,3}(,\d{3})*\.\d{2}$/);
        await shot(hp, "deposit-due", true);

        await hp.getByRole("button", { name: "Pay deposit" }).click();
        await hp.waitForURL(new RegExp(`^${process.env.PAYMENTS_API_BASE}/pay/cs_test_`));
        await hp.getByText("Local test payment page").waitFor();
        expect(await hp.getByTestId("fake-amount").innerText()).toBe(amount);
        await shot(hp, "deposit-fake-payment-page", true);
        await hp.getByRole("button", { name: `Pay ${amount} (test)` }).click();

        await hp.waitForURL(new RegExp(`${link}\\?deposit=success$`));
        await hp.locator('[data-deposit-state="paid"]').waitFor({ timeout: 30_000 });
        await hp.getByRole("heading", { name: "Deposit received" }).waitFor();
        await hp.getByText(new RegExp(`has your deposit of \\${amount}`)).waitFor();
        await shot(hp, "deposit-received", true);
      } finally {
        await home.context.close();
      }

      // Sales sees it on the proposal (its audit trail) and through the payments API the proposal page reads.
      const payments = await api<{ deposit: { state: string } }>(staff.context.request, "get", `/api/proposals/${proposalId}/payments`);
      expect(payments.deposit.state).toBe("paid");
      await staff.page.goto(`/projects/${projectId}/proposals/${proposalId}`);
      await staff.page.getByRole("list", { name: "Audit trail" }).locator('[data-event="deposit-paid"]').waitFor();
      await shot(staff.page, "deposit-sales-proposal", true);

      // The e-mail to the salesperson arrived in the fake SMTP outbox.
      await expect.poll(async () => (await sql<{ subject: string }[]>`
        select subject from outbox_messages where to_address = ${SALES} and subject like ${`Deposit received%Silas Brennock%`}`).length, { timeout: 20_000 }).toBeGreaterThan(0);
      expect(errors).toEqual([]);
    } finally {
      await staff.context.close();
    }
  });
});
