/**
 * Keystroke to analysis in the survey form: seeds the demo data, builds the client, starts the
 * server, opens the Varnum project in Debian's Chromium with 4× CPU throttling, types digits into
 * the first section's length and times each keydown until the analysis shows the new required
 * vent area (and until the frame after it). Also reads Event Timing entries (what INP is made of).
 * Measured at 1280 × 900, where the form and the analysis stand side by side, and at 390 × 844 on
 * the survey tab (the analysis tab is hidden there but is still rendered on every change).
 * Prints figures; asserts nothing.
 *
 *   npm run bench -- keystroke          (a throwaway database, via scripts/tasks/bench.ts)
 *   node --import tsx bench/keystroke-latency-bench.ts   (the test database: autosave keeps the typed length)
 */
import { readFileSync, rmSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import path from "node:path";
import { chromium, type Browser } from "playwright-core";
import { buildClient, freePort, prepareDatabase, startServer, stopChild } from "../scripts/lib/environment.ts";
import { startFakeSmtp } from "../scripts/lib/fake-smtp.ts";
import { CHROMIUM_PATH, ensureChromium } from "../scripts/lib/chromium.ts";
import { DEMO_PASSWORD, seedDemo } from "../scripts/lib/seed.ts";
import { projectRoot } from "../scripts/lib/paths.ts";
import type { SpaceSurvey } from "../shared/schemas/survey.ts";
import { toAtticInput, type ProjectBasis } from "../shared/survey/to-attic-input.ts";
import { formatNfaSqIn } from "../shared/units/format.ts";
import { tryAnalyzeAttic } from "../shared/ventilation/index.ts";

const PROJECT_TITLE = "Varnum attic — gable fan and ridge vent";
const ESTIMATOR = "estimator@tallgrass.example";
const CPU_THROTTLING_RATE = 4;
/** Each is typed as two keystrokes into an emptied field: "3" then "37", so every keystroke changes the area. */
const WARMUP_LENGTHS_FT = [26, 58];
const MEASURED_LENGTHS_FT = [37, 52, 48, 61, 29, 74, 43, 56, 38, 65, 47, 53, 32, 68, 41];
/** A brisk typing rhythm: the next key goes down this long after the previous figure was painted. */
const PAUSE_BETWEEN_KEYS_MS = 150;
const KEYSTROKE_TIMEOUT_MS = 10_000;

/** The deliberate delays in the code, read from the source so the printout can't go stale. */
function deliberateDelays() {
  const read = (file: string) => readFileSync(path.join(projectRoot, file), "utf8");
  const defaultDelayMs = (file: string) => Number(/delayMs = (\d+)/.exec(read(file))?.[1]);
  const debounce = /useDebouncedValue\([^)]*?(?:,\s*(\d+))?\)/.exec(read("src/features/survey/pages/project-workspace-page.tsx"));
  return {
    analysisDebounceMs: debounce ? Number(debounce[1] ?? defaultDelayMs("src/lib/use-debounced-value.ts")) : 0,
    autosaveDelayMs: defaultDelayMs("src/lib/use-autosave.ts"),
  };
}

/** The promise's value, or null once `timeoutMs` has passed. */
function within<T>(promise: Promise<T>, timeoutMs: number): Promise<T | null> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<null>((resolve) => (timer = setTimeout(() => resolve(null), timeoutMs)));
  return Promise.race([promise, timeout]).finally(() => clearTimeout(timer));
}

interface KeystrokeRecord {
  key: string;
  keydownAt: number;
  domMs: number;
  nextFrameMs: number;
}

interface EventEntry {
  name: string;
  startTime: number;
  durationMs: number;
  inputDelayMs: number;
  processingMs: number;
  interactionId: number;
}

/**
 * Installed before the app loads: times the armed keydown until the Required figure reads the
 * expected text (MutationObserver), then until the task after the next animation frame (≈ paint).
 */
function installProbe() {
  type Probe = { expected: string | null; pending: { key: string; keydownAt: number } | null; events: unknown[] };
  const w = window as unknown as { __probe: Probe; __keystrokeMeasured: (r: unknown) => void };
  const probe: Probe = { expected: null, pending: null, events: [] };
  w.__probe = probe;
  const requiredText = () => {
    const panel = document.querySelector('aside[aria-label="Analysis"]');
    if (!panel) return null;
    for (const dt of panel.querySelectorAll("dt")) {
      if (dt.textContent?.startsWith("Required at")) return dt.nextElementSibling?.textContent ?? null;
    }
    return null;
  };
  document.addEventListener(
    "keydown",
    (event) => {
      if (probe.expected !== null && !probe.pending) probe.pending = { key: event.key, keydownAt: event.timeStamp };
    },
    { capture: true },
  );
  const check = () => {
    const pending = probe.pending;
    if (!pending || requiredText() !== probe.expected) return;
    const domMs = performance.now() - pending.keydownAt;
    probe.pending = null;
    probe.expected = null;
    requestAnimationFrame(() => {
      const channel = new MessageChannel();
      channel.port1.onmessage = () => w.__keystrokeMeasured({ ...pending, domMs, nextFrameMs: performance.now() - pending.keydownAt });
      channel.port2.postMessage(null);
    });
  };
  new MutationObserver(check).observe(document, { subtree: true, childList: true, characterData: true });
  new PerformanceObserver((list) => {
    // interactionId is newer than TypeScript's DOM types.
    for (const e of list.getEntries() as (PerformanceEventTiming & { interactionId?: number })[]) {
      probe.events.push({
        name: e.name, startTime: e.startTime, durationMs: e.duration, inputDelayMs: e.processingStart - e.startTime,
        processingMs: e.processingEnd - e.processingStart, interactionId: e.interactionId ?? 0,
      });
    }
  }).observe({ type: "event", durationThreshold: 16, buffered: true } as PerformanceObserverInit);
}

/** Other work on the machine slows the page as much as throttling does; the reader should see it. */
const loadAverage = () => loadavg()[0]!.toFixed(1);
const quantile = (sorted: number[], q: number) => sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1))] ?? NaN;
const ms = (n: number) => `${Math.round(n)} ms`;
function summary(values: number[]): string {
  const s = [...values].sort((a, b) => a - b);
  return `median ${ms(quantile(s, 0.5))} · p95 ${ms(quantile(s, 0.95))} · max ${ms(s[s.length - 1] ?? NaN)} (n=${s.length})`;
}

async function openVarnum(browser: Browser, baseUrl: string, viewport: { width: number; height: number }) {
  const context = await browser.newContext({ baseURL: baseUrl, viewport });
  const page = await context.newPage();
  page.setDefaultTimeout(20_000);
  let resolveMeasured: ((r: KeystrokeRecord) => void) | null = null;
  await page.exposeFunction("__keystrokeMeasured", (r: KeystrokeRecord) => resolveMeasured?.(r));
  // tsx keeps function names through a `__name` helper that the page doesn't have.
  await page.addInitScript({ content: `var __name = (f) => f; (${installProbe.toString()})();` });
  await page.goto("/sign-in");
  await page.getByLabel("E-mail", { exact: false }).fill(ESTIMATOR);
  await page.getByLabel("Password", { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: /sign in/i }).click();
  await page.waitForURL(/\/projects/);
  const list = (await (await page.request.get(`/api/projects?q=${encodeURIComponent("Varnum")}`)).json()) as { items: { id: string; title: string }[] };
  const project = list.items.find((p) => p.title === PROJECT_TITLE);
  if (!project) throw new Error(`demo project "${PROJECT_TITLE}" not found`);
  const detail = (await (await page.request.get(`/api/projects/${project.id}`)).json()) as {
    project: ProjectBasis;
    spaces: (SpaceSurvey & { id: string })[];
  };
  await page.goto(`/projects/${project.id}`);
  const nextMeasured = () => new Promise<KeystrokeRecord>((resolve) => (resolveMeasured = resolve));
  return { context, page, detail, nextMeasured };
}

/** The Required figure the analysis should show once the first section is `lengthFt` long, from the same core. */
function expectedRequired(detail: { project: ProjectBasis; spaces: SpaceSurvey[] }, lengthFt: number): string {
  const space = detail.spaces[0]!;
  const [first, ...rest] = space.sections;
  if (first?.kind !== "rect") throw new Error("the demo space's first section is not a rectangle");
  const survey: SpaceSurvey = { ...space, sections: [{ ...first, lengthFt }, ...rest] };
  const result = tryAnalyzeAttic(toAtticInput(detail.project, survey));
  if (!result.ok) throw new Error(`no analysis for a ${lengthFt} ft section`);
  return formatNfaSqIn(result.analysis.requirement.totalSqIn, "imperial");
}

async function measureAt(browser: Browser, baseUrl: string, label: string, viewport: { width: number; height: number }) {
  const { context, page, detail, nextMeasured } = await openVarnum(browser, baseUrl, viewport);
  try {
    const lengthField = page.getByLabel("Length (along the ridge)", { exact: true });
    await lengthField.waitFor();
    await page.locator('aside[aria-label="Analysis"] dt', { hasText: "Required at" }).waitFor({ state: "attached" });
    const cdp = await context.newCDPSession(page);
    await cdp.send("Emulation.setCPUThrottlingRate", { rate: CPU_THROTTLING_RATE });
    await page.waitForTimeout(1_000);

    const loadBefore = loadAverage();
    const records: KeystrokeRecord[] = [];
    let missed = 0;
    let previousExpected = await page.evaluate(() => document.querySelector('aside[aria-label="Analysis"] dt + dd')?.textContent ?? "");
    const lengths = [...WARMUP_LENGTHS_FT, ...MEASURED_LENGTHS_FT];
    for (const [n, lengthFt] of lengths.entries()) {
      await lengthField.click();
      await page.keyboard.press("ControlOrMeta+A");
      const digits = String(lengthFt);
      for (let i = 1; i <= digits.length; i += 1) {
        const expected = expectedRequired(detail, Number(digits.slice(0, i)));
        if (expected === previousExpected) throw new Error(`typing ${digits.slice(0, i)} would not change the Required figure (${expected})`);
        previousExpected = expected;
        await page.evaluate((text) => {
          (window as unknown as { __probe: { expected: string | null; pending: null } }).__probe.expected = text;
        }, expected);
        const measured = nextMeasured();
        await page.keyboard.press(digits[i - 1]!);
        const record = await within(measured, KEYSTROKE_TIMEOUT_MS);
        if (!record) {
          missed += 1;
          const shown = await page.evaluate(() => document.querySelector('aside[aria-label="Analysis"] dt + dd')?.textContent ?? "(no figure)");
          console.log(`  ${label}: after typing ${digits.slice(0, i)} the field reads "${await lengthField.inputValue()}" and Required ${shown}, not ${expected}, after ${KEYSTROKE_TIMEOUT_MS} ms`);
          await page.evaluate(() => {
            const probe = (window as unknown as { __probe: { expected: string | null; pending: null } }).__probe;
            probe.expected = null;
            probe.pending = null;
          });
        } else if (n >= WARMUP_LENGTHS_FT.length) records.push(record);
        await page.waitForTimeout(PAUSE_BETWEEN_KEYS_MS);
      }
    }

    const events = (await page.evaluate(() => (window as unknown as { __probe: { events: unknown[] } }).__probe.events)) as EventEntry[];
    // Event Timing's startTime is the event's timeStamp, so each measured keydown finds its own entries;
    // keydown and keyup share an interactionId, the input event (where React renders) has none.
    const timings = records.map((r) => {
      const keydown = events.find((e) => e.name === "keydown" && Math.abs(e.startTime - r.keydownAt) < 1);
      const interaction = keydown && keydown.interactionId > 0 ? events.filter((e) => e.interactionId === keydown.interactionId) : keydown ? [keydown] : [];
      const input = events.find((e) => e.name === "input" && e.startTime >= r.keydownAt && e.startTime <= r.keydownAt + r.nextFrameMs);
      return { interactionMs: interaction.length ? Math.max(...interaction.map((e) => e.durationMs)) : null, inputHandlersMs: input?.processingMs ?? null, keydownDelayMs: keydown?.inputDelayMs ?? null };
    });
    const present = (values: (number | null)[]) => values.filter((v): v is number => v !== null);
    const interactionsMs = present(timings.map((t) => t.interactionMs));
    const under16 = records.length - interactionsMs.length;

    console.log(`\n${label} (${viewport.width} × ${viewport.height}, CPU ${CPU_THROTTLING_RATE}× slower), ${records.length} keystrokes${missed ? `, ${missed} never showed the figure` : ""}:`);
    console.log(`  keydown → Required figure in the DOM:        ${summary(records.map((r) => r.domMs))}`);
    console.log(`  keydown → next frame after it (≈ painted):   ${summary(records.map((r) => r.nextFrameMs))}`);
    console.log(`  Event Timing (what INP is made of; entries under 16 ms are not reported, durations in 8 ms steps):`);
    console.log(`    interaction, keydown to next paint:        ${interactionsMs.length ? summary(interactionsMs) : "-"}${under16 ? `, ${under16} under 16 ms` : ""}`);
    console.log(`    of it, input handlers (React render+commit): ${summary(present(timings.map((t) => t.inputHandlersMs)))}`);
    console.log(`    of it, wait before the keydown handlers:    ${summary(present(timings.map((t) => t.keydownDelayMs)))}`);
    const sortedInteractionsMs = [...interactionsMs].sort((a, b) => a - b);
    console.log(`    INP for this page (98th percentile of interactions) ≈ ${ms(quantile(sortedInteractionsMs, 0.98))}`);
    console.log(`  load average during the pass: ${loadBefore} → ${loadAverage()} (on ${cpus().length} cores)`);
  } finally {
    await context.close();
  }
}

const databaseUrl = process.env.EAVESIGHT_BENCH_DATABASE_URL ?? (await prepareDatabase("test")).databaseUrl;
ensureChromium();
await seedDemo(databaseUrl);
// A build of its own, so a running `npm start` or test run keeps its files.
const clientDir = path.join(projectRoot, "dist", `client-bench-${process.pid}`);
buildClient({ outDir: clientDir });
const delays = deliberateDelays();
const appPort = await freePort();
const smtp = await startFakeSmtp({ port: await freePort(), databaseUrl, quiet: true });
let server: Awaited<ReturnType<typeof startServer>> | undefined;
let browser: Browser | undefined;
try {
  server = await startServer({
    ...process.env, DATABASE_URL: databaseUrl, NODE_ENV: "test", PORT: String(appPort), APP_ORIGIN: `http://127.0.0.1:${appPort}`, SMTP_PORT: String(smtp.port), LOG_LEVEL: "error", CLIENT_DIR: clientDir,
  });
  browser = await chromium.launch({
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
  });
  console.log(
    `deliberate delays in the code: analysis debounce ${delays.analysisDebounceMs} ms${delays.analysisDebounceMs ? "" : " (the panel is recomputed in render on every change)"}; ` +
      `autosave ${delays.autosaveDelayMs} ms after the last change (not on the path to the figure)`,
  );
  await measureAt(browser, `http://127.0.0.1:${appPort}`, "wide screen, form and analysis side by side", { width: 1280, height: 900 });
  await measureAt(browser, `http://127.0.0.1:${appPort}`, "phone, survey tab (analysis tab hidden but rendered)", { width: 390, height: 844 });
  console.log(`\nof these latencies, deliberate debounce: ${delays.analysisDebounceMs} ms per keystroke; the rest is work`);
} finally {
  await browser?.close();
  await stopChild(server);
  await smtp.close();
  rmSync(clientDir, { recursive: true, force: true });
}
