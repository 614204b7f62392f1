import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdirSync } from "node:fs";
import path from "node:path";
import type { APIRequestContext, Browser, BrowserContext, Page } from "playwright-core";
import { BASE_URL, launchBrowser, newPage, SHOTS_DIR } from "../setup/browser.ts";

/**
 * Issue 9, "the app works with the keyboard alone": the estimator's survey and the homeowner's
 * acceptance walked with Tab, Shift+Tab, Enter, Space, arrow keys and typing only. Locators are
 * used to wait for what the page shows and to read where focus is, never to click or fill.
 */

const ESTIMATOR = "estimator@tallgrass.example";
const SALES = "sales@tallgrass.example";
const PASSWORD = "eavesight-demo";
const STAMP = Date.now().toString(36);
const TITLE = `Keyboard walk ${STAMP}`;
const OPTIONS = [`Soffit intake first ${STAMP}`, `Ridge and soffit together ${STAMP}`];

let browser: Browser;
let close: () => Promise<void>;
const contexts: BrowserContext[] = [];
let projectId: string;
let homeownerPath: string;

beforeAll(async () => {
  ({ browser, close } = await launchBrowser());
  mkdirSync(SHOTS_DIR, { recursive: true });
  // The job to walk through, set up over the API: the estimator surveys two spaces, sales prices two options and sends them.
  const estimator = await apiSession(ESTIMATOR);
  const customer = await api<{ customer: { id: string } }>(estimator, "post", "/api/customers", { name: `Ines Marlowe ${STAMP}`, email: `keyboard-${STAMP}@homeowner.example` });
  const project = await api<{ project: { id: string } }>(estimator, "post", "/api/projects", {
    customerId: customer.customer.id, title: TITLE, siteAddress: "9 Tamarack Bend, Marrow Creek", climateZone: 4,
  });
  projectId = project.project.id;
  const main = await api<{ space: { id: string } }>(estimator, "post", `/api/projects/${projectId}/spaces`, {
    name: "Main attic", roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 40, eaveLengthFt: 80 }, sections: [{ kind: "rect", lengthFt: 40, widthFt: 30 }],
    vents: [{ id: "soffit-1", kind: "soffit-individual", location: "lower", quantity: 10, nfaSqInPerUnit: 56 }], site: {},
  });
  await api(estimator, "post", `/api/projects/${projectId}/spaces`, { name: "Garage attic", sections: [{ kind: "rect", lengthFt: 20, widthFt: 20 }], vents: [] });

  const sales = await apiSession(SALES);
  const catalog = await api<{ items: { id: string; kind: string; isActive: boolean }[] }>(sales, "get", "/api/catalog");
  const of = (kind: string) => catalog.items.find((i) => i.kind === kind && i.isActive)!;
  const optionIds: string[] = [];
  for (const [i, name] of OPTIONS.entries()) {
    const added = [{ id: "a1", catalogItemId: of("soffit-individual").id, quantity: 6 }, ...(i === 1 ? [{ id: "a2", catalogItemId: of("ridge").id, quantity: 36 }] : [])];
    const option = await api<{ option: { id: string } }>(sales, "post", `/api/projects/${projectId}/options`, { name, spaces: [{ spaceId: main.space.id, ventActions: {}, added }] });
    optionIds.push(option.option.id);
  }
  const proposal = await api<{ proposal: { id: string } }>(sales, "post", `/api/projects/${projectId}/proposals`, { optionIds });
  const sendUrl = `/api/proposals/${proposal.proposal.id}/send`;
  let sent = await sales.post(sendUrl, { headers: { origin: BASE_URL } });
  // Sending needs the seller's signature; only when the demo salesperson has none yet is one typed in.
  if (sent.status() === 409 && ((await sent.json()) as { error: { code: string } }).error.code === "signature-required") {
    await api(sales, "put", "/api/auth/me/signature", { typed: "Priya Lindqvist" });
    sent = await sales.post(sendUrl, { headers: { origin: BASE_URL } });
  }
  expect(sent.status(), await sent.text()).toBe(200);
  homeownerPath = new URL(((await sent.json()) as { link: string }).link).pathname;
});
afterAll(async () => {
  for (const c of contexts) await c.close();
  await close?.();
});

async function apiSession(email: string): Promise<APIRequestContext> {
  const context = await browser.newContext({ baseURL: BASE_URL });
  contexts.push(context);
  await api(context.request, "post", "/api/auth/sign-in", { email, password: PASSWORD });
  return context.request;
}

async function api<T>(request: APIRequestContext, method: "get" | "post" | "put", url: string, data?: unknown): Promise<T> {
  const res = await request[method](url, { headers: { origin: BASE_URL }, ...(data === undefined ? {} : { data }) });
  if (!res.ok()) throw new Error(`${method} ${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

// ——— Where focus is ———

interface Focused {
  tag: string;
  role: string;
  name: string;
  isInDialog: boolean;
  isInMain: boolean;
  /** The visible focus indicator (outline on the element, or on the label that wraps a radio or checkbox); "" when there is none. */
  ring: string;
  widthPx: number;
  heightPx: number;
}

/** What has focus, with a name as a person would read it: aria-label, labelledby, label, or its text. */
function focused(page: Page): Promise<Focused> {
  return page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el || el === document.body) return { tag: "body", role: "", name: "", isInDialog: false, isInMain: false, ring: "", widthPx: 0, heightPx: 0 };
    const text = (s: string | null | undefined) => (s ?? "").replace(/\s+/g, " ").trim();
    const labelledBy = el.getAttribute("aria-labelledby");
    const labels = (el as HTMLInputElement).labels;
    const name = text(el.getAttribute("aria-label"))
      || (labelledBy ? text(labelledBy.split(/\s+/).map((id) => document.getElementById(id)?.textContent ?? "").join(" ")) : "")
      || (labels && labels.length > 0 ? text(labels[0]!.textContent) : "")
      || text(el.textContent);
    const type = (el as HTMLInputElement).type;
    const implicit: Record<string, string> = { A: "link", BUTTON: "button", SELECT: "combobox", TEXTAREA: "textbox", SUMMARY: "summary" };
    const role = el.getAttribute("role")
      ?? (el.tagName === "INPUT" ? (type === "checkbox" || type === "radio" ? type : "textbox") : implicit[el.tagName] ?? el.tagName.toLowerCase());
    const outline = (e: Element) => {
      const cs = getComputedStyle(e);
      return cs.outlineStyle !== "none" && parseFloat(cs.outlineWidth) > 0 ? `${cs.outlineWidth} ${cs.outlineStyle} ${cs.outlineColor}` : "";
    };
    const wrapper = el.closest("label");
    const box = el.getBoundingClientRect();
    return {
      tag: el.tagName.toLowerCase(), role, name,
      isInDialog: Boolean(el.closest('[role="dialog"]')), isInMain: Boolean(el.closest("main")),
      ring: outline(el) || (wrapper ? outline(wrapper) : ""),
      widthPx: box.width, heightPx: box.height,
    };
  });
}

const describeFocus = (f: Focused) => `${f.role || f.tag} "${f.name.slice(0, 80)}"`;

/**
 * Presses Tab (or Shift+Tab) until focus is on an element whose name matches, and the role if given.
 * Fails naming every element focus passed through, so a missing or unreachable control is plain.
 */
async function tabTo(page: Page, name: RegExp, opts: { role?: string; maxTabs?: number; isBackwards?: boolean } = {}): Promise<Focused> {
  const seen: string[] = [];
  for (let i = 0; i < (opts.maxTabs ?? 80); i++) {
    await page.keyboard.press(opts.isBackwards ? "Shift+Tab" : "Tab");
    const f = await focused(page);
    seen.push(describeFocus(f));
    if (name.test(f.name) && (!opts.role || f.role === opts.role)) return f;
  }
  throw new Error(`${opts.isBackwards ? "Shift+Tab" : "Tab"} never reached ${opts.role ?? "an element"} named ${name}; focus went through:\n  ${seen.join("\n  ")}`);
}

/** The focused element shows where focus is: an outline of at least 2 px. */
function expectFocusRing(f: Focused) {
  expect(f.ring, `${describeFocus(f)} has no visible focus indicator`).not.toBe("");
  expect(parseFloat(f.ring), `${describeFocus(f)}: focus outline width`).toBeGreaterThanOrEqual(2);
}

/** Waits (briefly) until focus is on the named element: dialogs hand focus back just after they close. */
async function expectFocusOn(page: Page, name: RegExp, role?: string) {
  let f = await focused(page);
  const isThere = () => name.test(f.name) && (!role || f.role === role);
  for (const deadline = Date.now() + 2_000; !isThere() && Date.now() < deadline; ) {
    await page.waitForFunction((was) => document.activeElement !== was, await page.evaluateHandle(() => document.activeElement), { timeout: 500 }).catch(() => undefined);
    f = await focused(page);
  }
  expect(isThere(), `focus should be on ${role ?? "an element"} named ${name}, but is on ${describeFocus(f)}`).toBe(true);
  return f;
}

/** A picture of the page once its animations (a dialog rising, a chevron turning) have finished. */
async function shot(page: Page, name: string) {
  // Spinners run forever and a replaced transition is cancelled: neither is waited for.
  await page.evaluate(() =>
    Promise.all(document.getAnimations().filter((a) => a.effect?.getComputedTiming().iterations !== Infinity).map((a) => a.finished.catch(() => undefined))),
  );
  await page.screenshot({ path: path.join(SHOTS_DIR, `${name}.png`) });
}

/** Selects what is in the focused field and types over it. */
async function retype(page: Page, text: string) {
  await page.keyboard.press("ControlOrMeta+A");
  await page.keyboard.type(text);
}

describe("the estimator's survey with the keyboard alone", () => {
  it("when the estimator signs in, opens a project, switches spaces, edits a length, adds a vent and opens dialogs with the keyboard, then every step works and focus is always visible", async () => {
    const { context, page } = await newPage(browser);
    contexts.push(context);
    const errors: string[] = [];
    page.on("pageerror", (e) => errors.push(e.message));

    // Sign in: type the e-mail, Tab to the password, Enter submits.
    await page.goto("/sign-in");
    await page.getByRole("heading", { name: "Sign in" }).waitFor();
    expectFocusRing(await tabTo(page, /^E-mail/, { role: "textbox" }));
    await page.keyboard.type(ESTIMATOR);
    await tabTo(page, /^Password/, { role: "textbox", maxTabs: 3 });
    await page.keyboard.type(PASSWORD);
    await page.keyboard.press("Enter");
    await page.waitForURL(/\/projects$/);
    await page.getByRole("heading", { name: /projects/i, level: 1 }).waitFor();

    // The first Tab on a page lands on "Skip to content", shown when focused; Enter jumps past the header.
    const skip = await tabTo(page, /^Skip to content$/, { role: "link", maxTabs: 1 });
    expect(skip.widthPx, "the skip link is visible when focused").toBeGreaterThan(40);
    expectFocusRing(skip);
    await shot(page, "keyboard-skip-link");
    await page.keyboard.press("Enter");
    await page.keyboard.press("Tab");
    const afterSkip = await focused(page);
    expect(afterSkip.isInMain, `after the skip link, Tab goes into the page content, not the header (${describeFocus(afterSkip)})`).toBe(true);

    // Find the project by typing a search, then Tab to its link and open it with Enter.
    expectFocusRing(await tabTo(page, /^Search projects/, { role: "textbox" }));
    await page.keyboard.type(STAMP);
    await page.waitForURL(new RegExp(`q=${STAMP}`));
    await expect.poll(() => page.getByRole("link", { name: "Varnum garage — soffit repair" }).count()).toBe(0);
    const link = await tabTo(page, new RegExp(`^${TITLE}$`), { role: "link" });
    expectFocusRing(link);
    await shot(page, "keyboard-project-link");
    await page.keyboard.press("Enter");
    await page.waitForURL(new RegExp(`/projects/${projectId}$`));
    await page.getByRole("heading", { name: TITLE, level: 1 }).waitFor();

    // The attic spaces are tabs: one Tab stop, arrow keys move between them and show that space.
    const tab = await tabTo(page, /^Main attic/, { role: "tab" });
    expectFocusRing(tab);
    await page.keyboard.press("ArrowRight");
    await expectFocusOn(page, /^Garage attic/, "tab");
    expect(await page.getByRole("tab", { name: /^Garage attic/ }).getAttribute("aria-selected")).toBe("true");
    expect(await page.getByRole("textbox", { name: /^Space name/ }).inputValue()).toBe("Garage attic");
    await page.keyboard.press("ArrowLeft");
    await expectFocusOn(page, /^Main attic/, "tab");
    expect(await page.getByRole("tab", { name: /^Main attic/ }).getAttribute("aria-selected")).toBe("true");
    expect(await page.getByRole("textbox", { name: /^Space name/ }).inputValue()).toBe("Main attic");

    // A section's length, retyped: the live analysis follows.
    const analysis = page.getByRole("tabpanel", { name: /Analysis/ });
    await analysis.getByText(/Floor 1,200 sq ft/).waitFor();
    expectFocusRing(await tabTo(page, /^Length \(along the ridge\)/, { role: "textbox" }));
    await retype(page, `50'`);
    await analysis.getByText(/Floor 1,500 sq ft/).waitFor();

    // Quick-add a ridge vent with Enter; it appears and the survey saves.
    const quickAdd = await tabTo(page, /^Ridge vent$/, { role: "button" });
    expectFocusRing(quickAdd);
    await page.keyboard.press("Enter");
    await page.getByRole("heading", { name: "Vent 2 (ridge vent)" }).waitFor();
    await expect.poll(() => page.locator("[data-save-state]").first().getAttribute("data-save-state"), { timeout: 15_000 }).toBe("saved");
    const saved = await api<{ spaces: { name: string; sections: { lengthFt?: number }[]; vents: { kind: string }[] }[] }>(context.request, "get", `/api/projects/${projectId}`);
    const mainSaved = saved.spaces.find((s) => s.name === "Main attic")!;
    expect(mainSaved.sections[0]!.lengthFt).toBe(50);
    expect(mainSaved.vents.map((v) => v.kind)).toEqual(["soffit-individual", "ridge"]);

    // A confirm dialog: focus moves in, stays in while tabbing, Escape closes it, focus returns to the button that opened it.
    const remove = await tabTo(page, /^Remove Vent 2 \(ridge vent\)$/, { role: "button" });
    expectFocusRing(remove);
    await page.keyboard.press("Enter");
    const confirm = page.getByRole("dialog", { name: "Remove Vent 2 (ridge vent)?" });
    await confirm.waitFor();
    const inside = await focused(page);
    expect(inside.isInDialog, `focus moved into the dialog (${describeFocus(inside)})`).toBe(true);
    for (let i = 0; i < 4; i++) {
      await page.keyboard.press("Tab");
      const f = await focused(page);
      expect(f.isInDialog, `Tab keeps focus in the open dialog (${describeFocus(f)})`).toBe(true);
      expectFocusRing(f);
    }
    await shot(page, "keyboard-confirm-dialog");
    await page.keyboard.press("Escape");
    await confirm.waitFor({ state: "detached" });
    await expectFocusOn(page, /^Remove Vent 2 \(ridge vent\)$/, "button");
    expect(await page.getByRole("heading", { name: "Vent 2 (ridge vent)" }).count(), "Escape removed nothing").toBe(1);

    // Confirmed, the removal takes its button away with the card: focus stays in the page content, near the vents, never on the page body.
    await page.keyboard.press("Enter");
    await confirm.waitFor();
    await tabTo(page, /^Remove vent$/, { role: "button", maxTabs: 4 });
    await page.keyboard.press("Enter");
    await confirm.waitFor({ state: "detached" });
    await page.getByRole("heading", { name: "Vent 2 (ridge vent)" }).waitFor({ state: "detached" });
    const afterRemoval = await focused(page);
    expect(afterRemoval.isInMain, `after the removal, focus stays in the page content (${describeFocus(afterRemoval)})`).toBe(true);
    expect(await page.evaluate(() => document.activeElement === document.body || document.activeElement?.id === "main"), "focus is on a control, not the page or its main area").toBe(false);

    // The "Add an attic space" dialog, reached backwards with Shift+Tab: its name field has focus; Escape returns to "Add space".
    await tabTo(page, /^Add space$/, { role: "button", isBackwards: true, maxTabs: 120 });
    await page.keyboard.press("Enter");
    const addDialog = page.getByRole("dialog", { name: "Add an attic space" });
    await addDialog.waitFor();
    const nameField = await expectFocusOn(page, /^Name/, "textbox");
    expect(nameField.isInDialog).toBe(true);
    expectFocusRing(nameField);
    await page.keyboard.press("Escape");
    await addDialog.waitFor({ state: "detached" });
    await expectFocusOn(page, /^Add space$/, "button");

    // The account menu is a disclosure: Enter opens it, Tab reaches its items, Escape closes it and returns focus.
    const account = await tabTo(page, /Account: Dale Okafor/, { role: "button", isBackwards: true, maxTabs: 30 });
    expectFocusRing(account);
    await page.keyboard.press("Enter");
    await tabTo(page, /^My profile$/, { role: "link", maxTabs: 2 });
    await shot(page, "keyboard-account-menu");
    await page.keyboard.press("Escape");
    await expectFocusOn(page, /Account: Dale Okafor/, "button");
    expect(await page.getByRole("link", { name: "My profile" }).isVisible()).toBe(false);
    expect(errors).toEqual([]);
  });
});

describe("the homeowner's acceptance with the keyboard alone", () => {
  it("when the homeowner picks option 2 with arrow keys, types a name and signature and ticks the consent with Space, then Enter accepts it", async () => {
    const { context, page } = await newPage(browser, { width: 390, height: 844 });
    contexts.push(context);
    const errors: string[] = [];
    page.on("pageerror", (e) => errors.push(e.message));
    await page.goto(homeownerPath);
    await page.getByRole("heading", { name: "Your 2 options" }).waitFor();

    // The options side by side come first: Enter on "Choose option 1" opens the form and moves focus to it.
    const choose = await tabTo(page, /^Choose option 1$/, { role: "button", maxTabs: 30 });
    expectFocusRing(choose);
    await page.keyboard.press("Enter");
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe("accept-title");

    // The option radios are one Tab stop; the down arrow moves to, and chooses, option 2.
    const first = await tabTo(page, /^Option 1: /, { role: "radio", maxTabs: 5 });
    expectFocusRing(first);
    await page.keyboard.press("ArrowDown");
    await expectFocusOn(page, new RegExp(`^Option 2: ${OPTIONS[1]}`), "radio");
    expect(await page.getByRole("radio", { name: new RegExp(`^Option 2: ${OPTIONS[1]}`) }).isChecked()).toBe(true);
    await page.getByRole("button", { name: "Accept option 2 and sign" }).waitFor();

    expectFocusRing(await tabTo(page, /^2\. Your full name/, { role: "textbox", maxTabs: 2 }));
    await page.keyboard.type("Ines Marlowe");

    // Drawing needs a pointer, so the keyboard chooses "Type it" and types the signature.
    const drawIt = await tabTo(page, /^Draw it/, { role: "radio", maxTabs: 2 });
    expectFocusRing(drawIt);
    await page.keyboard.press("ArrowRight");
    await expectFocusOn(page, /^Type it/, "radio");
    const signature = await tabTo(page, /^Type your name to sign/, { role: "textbox", maxTabs: 2 });
    expectFocusRing(signature);
    await page.keyboard.type("Ines Marlowe");

    const consent = await tabTo(page, /^I agree to sign electronically/, { role: "checkbox", maxTabs: 4 });
    expectFocusRing(consent);
    await page.keyboard.press("Space");
    expect(await page.getByRole("checkbox", { name: /I agree to sign electronically/ }).isChecked()).toBe(true);
    await shot(page, "keyboard-homeowner-consent");

    const submit = await tabTo(page, /^Accept option 2 and sign$/, { role: "button", maxTabs: 3 });
    expectFocusRing(submit);
    await page.keyboard.press("Enter");
    await page.getByRole("heading", { name: "Thank you — accepted" }).waitFor();
    await page.getByText(new RegExp(`You accepted option 2, “${OPTIONS[1]}”`)).waitFor();
    await shot(page, "keyboard-homeowner-accepted");
    expect(errors).toEqual([]);
  });
});
