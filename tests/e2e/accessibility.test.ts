import { afterAll, beforeAll, describe, expect, it } from "vitest";
import AxeBuilder from "@axe-core/playwright";
import type { APIRequestContext, Browser, BrowserContext, Page } from "playwright-core";
import { BASE_URL, launchBrowser, newPage, signInAs } from "../setup/browser.ts";

/**
 * Issue 9, "accessibility": axe-core on the app's main pages in Chromium, signed in as the demo owner.
 * Any violation of impact "serious" or "critical" fails, named by rule and selector.
 */

const OWNER = "owner@tallgrass.example";
let browser: Browser;
let close: () => Promise<void>;
let owner: { context: BrowserContext; page: Page };
let projectId: string;

beforeAll(async () => {
  ({ browser, close } = await launchBrowser());
  owner = await newPage(browser);
  await signInAs(owner.page, OWNER);
  await owner.page.waitForURL(/\/projects/);
  const res = await owner.page.request.get("/api/projects");
  expect(res.status()).toBe(200);
  projectId = ((await res.json()) as { items: { id: string }[] }).items[0]!.id;
});
afterAll(async () => {
  await owner?.context.close();
  await close?.();
});

/** Serious and critical violations as "rule-id: selector (summary)" lines, so a failure names what to fix. */
async function seriousViolations(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "best-practice"]).analyze();
  // axe looked at a rendered page (labels, contrast, landmarks passed), not at an empty shell.
  expect(results.passes.length).toBeGreaterThan(10);
  return results.violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .flatMap((v) => v.nodes.map((n) => `${v.id} [${v.impact}]: ${n.target.join(" ")} — ${n.failureSummary?.split("\n").slice(1, 2).join("").trim() ?? v.help}`));
}

async function settle(page: Page, heading?: RegExp) {
  await page.waitForLoadState("networkidle");
  if (heading) await page.getByRole("heading", { name: heading }).first().waitFor();
  // No skeletons or spinners left mid-render when axe looks.
  await page.locator("[aria-busy='true']").first().waitFor({ state: "detached", timeout: 10_000 }).catch(() => {});
}

const PAGES: { name: string; path: () => string; heading?: RegExp }[] = [
  { name: "projects list", path: () => "/projects", heading: /projects/i },
  { name: "project workspace", path: () => `/projects/${projectId}` },
  { name: "project options", path: () => `/projects/${projectId}/options`, heading: /options/i },
  { name: "customers", path: () => "/customers", heading: /customers/i },
  { name: "catalog", path: () => "/catalog", heading: /catalog/i },
  { name: "pipeline", path: () => "/pipeline", heading: /pipeline/i },
  { name: "settings / profile", path: () => "/settings/profile", heading: /my profile/i },
  { name: "settings / team", path: () => "/settings/team", heading: /team/i },
  { name: "settings / company", path: () => "/settings/company", heading: /company/i },
  { name: "settings / outbox", path: () => "/settings/outbox", heading: /outbox/i },
];

describe("axe-core on the app's pages (Chromium)", () => {
  it("when a signed-out visitor opens the sign-in page, then axe finds no serious or critical violations", async () => {
    const { context, page } = await newPage(browser);
    try {
      await page.goto("/sign-in");
      await page.getByLabel("E-mail", { exact: false }).waitFor();
      expect(await seriousViolations(page)).toEqual([]);
    } finally {
      await context.close();
    }
  });

  it.each(PAGES)("when the owner opens the $name page, then axe finds no serious or critical violations", async ({ path, heading }) => {
    const { page } = owner;
    await page.goto(path());
    await settle(page, heading);
    expect(page.url()).not.toMatch(/\/sign-in/);
    expect(await seriousViolations(page)).toEqual([]);
  });
});

async function api<T>(request: APIRequestContext, method: "get" | "post" | "put", url: string, data?: unknown): Promise<T> {
  const res = await request[method](url, { headers: { origin: BASE_URL }, ...(data === undefined ? {} : { data }) });
  if (!res.ok()) throw new Error(`${method} ${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

/** A sent proposal on a project of its own (so the demo projects other files use stay as they are); answers the homeowner's link path. */
async function homeownerLink(request: APIRequestContext): Promise<string> {
  const stamp = Date.now();
  const customer = await api<{ customer: { id: string } }>(request, "post", "/api/customers", { name: `Axe Homeowner ${stamp}`, email: `axe-${stamp}@homeowner.example` });
  const project = await api<{ project: { id: string } }>(request, "post", "/api/projects", {
    customerId: customer.customer.id, title: `Accessibility check ${stamp}`, siteAddress: "7 Lantern Row, Marrow Creek", climateZone: 4,
  });
  const space = await api<{ space: { id: string } }>(request, "post", `/api/projects/${project.project.id}/spaces`, {
    name: "Main attic", roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 40, eaveLengthFt: 80 }, sections: [{ kind: "rect", lengthFt: 40, widthFt: 30 }],
    vents: [{ id: "ridge-1", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18 }], site: {}, notes: null,
  });
  const catalog = await api<{ items: { id: string; kind: string }[] }>(request, "get", "/api/catalog");
  const soffit = catalog.items.find((i) => i.kind.startsWith("soffit"))!;
  const option = await api<{ option: { id: string } }>(request, "post", `/api/projects/${project.project.id}/options`, {
    name: "Balanced intake", spaces: [{ spaceId: space.space.id, ventActions: {}, added: [{ id: "a1", catalogItemId: soffit.id, quantity: 8 }] }],
    laborLines: [{ id: "l1", description: "Cut in soffit vents", hours: 4, rateCents: 9_000 }],
  });
  const proposal = await api<{ proposal: { id: string } }>(request, "post", `/api/projects/${project.project.id}/proposals`, { optionIds: [option.option.id] });
  const sendUrl = `/api/proposals/${proposal.proposal.id}/send`;
  const first = await request.post(sendUrl, { headers: { origin: BASE_URL } });
  // Only when the demo owner has no signature yet is one typed in (sending needs it).
  if (first.status() === 409 && ((await first.json()) as { error: { code: string } }).error.code === "signature-required") {
    await api(request, "put", "/api/auth/me/signature", { typed: "Marta Okafor" });
  } else if (first.ok()) {
    return new URL(((await first.json()) as { link: string }).link).pathname;
  } else {
    throw new Error(`send: ${first.status()} ${await first.text()}`);
  }
  const sent = await api<{ link: string }>(request, "post", sendUrl);
  return new URL(sent.link).pathname;
}

describe("axe-core on the homeowner's proposal page (Chromium)", () => {
  it("when the homeowner opens a sent proposal's link, then axe finds no serious or critical violations", async () => {
    const link = await homeownerLink(owner.context.request);
    const { context, page } = await newPage(browser, { width: 390, height: 844 });
    try {
      await page.goto(link);
      await page.getByRole("button", { name: "Choose option 1" }).click();
      await page.getByRole("radio", { name: /Option 1: Balanced intake/ }).waitFor();
      await settle(page);
      expect(await seriousViolations(page)).toEqual([]);
    } finally {
      await context.close();
    }
  });
});
