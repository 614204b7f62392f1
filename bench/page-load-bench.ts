/**
 * First visit to the sign-in page and to the survey workspace, in Debian's Chromium with the CPU 4×
 * slower: Largest Contentful Paint, the JavaScript the page fetched (on the wire and unpacked), and
 * when the workspace asked for its project. Each page is loaded in a fresh browser context (empty
 * cache), alternating between this checkout and a baseline built from a temporary `git worktree` of
 * `BENCH_BASELINE_REF` (default `main`) served by that checkout's own server, so both sets of figures
 * come from the same run on the same machine load. Two networks: the loopback as it is (the CPU is
 * the only brake), and a slow mobile link (Chromium's network emulation: 150 ms round trip, 1.6 Mbit/s
 * down — the "slow 4G" profile of Chromium's tools), where compression shows.
 * Prints figures; asserts nothing.
 *
 *   npm run bench -- page-load
 *   BENCH_PAGE_LOAD_RUNS=9 BENCH_PAGE_LOAD_ONLY=workspace,loopback npm run bench -- page-load   (a subset, more runs)
 */
import { execFileSync, spawn, spawnSync, type ChildProcess } from "node:child_process";
import { existsSync, mkdtempSync, rmSync, symlinkSync } from "node:fs";
import { cpus, loadavg, tmpdir } from "node:os";
import path from "node:path";
import { chromium, type Browser, type BrowserContext } from "playwright-core";
import { freePort, prepareDatabase, stopChild } from "../scripts/lib/environment.ts";
import { startFakeSmtp } from "../scripts/lib/fake-smtp.ts";
import { CHROMIUM_PATH, ensureChromium } from "../scripts/lib/chromium.ts";
import { DEMO_PASSWORD, seedDemo } from "../scripts/lib/seed.ts";
import { projectRoot } from "../scripts/lib/paths.ts";

const CPU_THROTTLING_RATE = 4;
const RUNS = Number(process.env.BENCH_PAGE_LOAD_RUNS ?? 7);
const BASELINE_REF = process.env.BENCH_BASELINE_REF ?? "main";
/** Words that each measured page and network name must contain one of (empty: all). */
const ONLY = (process.env.BENCH_PAGE_LOAD_ONLY ?? "").split(",").filter(Boolean);
const isChosen = (name: string, all: readonly string[]) => !all.some((word) => ONLY.includes(word)) || all.some((word) => ONLY.includes(word) && name.includes(word));
const ESTIMATOR = "estimator@tallgrass.example";
const PROJECT_TITLE = "Varnum attic — gable fan and ridge vent";
const NETWORKS = [
  { name: "loopback", conditions: null },
  { name: "slow 4G (150 ms RTT, 1.6 Mbit/s)", conditions: { offline: false, latency: 150, downloadThroughput: (1.6 * 1024 * 1024) / 8, uploadThroughput: (750 * 1024) / 8 } },
] as const;

interface Build {
  label: string;
  root: string;
  baseUrl: string;
  server?: ChildProcess;
}

interface Visit {
  lcpMs: number;
  lcpElement: string;
  /** When the page's own content (not the loading screen) was first in the DOM. */
  contentAtMs: number;
  jsFiles: number;
  jsWireKb: number;
  jsUnpackedKb: number;
  /** When the workspace's project request went out, from the start of navigation. */
  projectRequestAtMs: number | null;
}

/** Sets up a checkout of the baseline beside this one, sharing this checkout's node_modules. */
function baselineCheckout(): { root: string; sha: string; remove: () => void } {
  const root = mkdtempSync(path.join(tmpdir(), "eavesight-baseline-"));
  rmSync(root, { recursive: true, force: true });
  execFileSync("git", ["worktree", "add", "--detach", "--quiet", root, BASELINE_REF], { cwd: projectRoot, stdio: "inherit" });
  symlinkSync(path.join(projectRoot, "node_modules"), path.join(root, "node_modules"));
  const sha = execFileSync("git", ["rev-parse", "--short", "HEAD"], { cwd: root, encoding: "utf8" }).trim();
  return {
    root,
    sha,
    remove: () => {
      spawnSync("git", ["worktree", "remove", "--force", root], { cwd: projectRoot, stdio: "ignore" });
      rmSync(root, { recursive: true, force: true });
    },
  };
}

function build(root: string, outDir: string) {
  const result = spawnSync(process.execPath, ["node_modules/vite/bin/vite.js", "build", "--logLevel", "error", "--outDir", outDir, "--emptyOutDir"], { cwd: root, stdio: "inherit" });
  if (result.status !== 0) throw new Error(`vite build failed in ${root}`);
}

/** The checkout's own server (`node --import tsx server/index.ts`), resolved once it listens. */
function startServerIn(root: string, env: NodeJS.ProcessEnv): Promise<ChildProcess> {
  const child = spawn(process.execPath, ["--import", "tsx", "server/index.ts"], { cwd: root, env, stdio: ["ignore", "inherit", "inherit", "ipc"] });
  return new Promise((resolve, reject) => {
    const onExit = (code: number | null) => reject(new Error(`the server in ${root} exited with code ${code} before it was ready`));
    child.once("exit", onExit);
    child.on("message", (message: { ready?: boolean }) => {
      if (message?.ready) {
        child.off("exit", onExit);
        resolve(child);
      }
    });
  });
}

/**
 * Installed before the app loads: keeps the last LCP candidate (the browser's final answer once input
 * or hiding stops it), and the time the page's own content (`readyText`) first stood in the DOM.
 */
function installLcpProbe(readyText: string) {
  const w = window as unknown as { __lcp: { startTime: number; element: string } | null; __contentAtMs: number | null };
  w.__lcp = null;
  w.__contentAtMs = null;
  const observer = new MutationObserver(() => {
    if (document.body?.textContent?.includes(readyText)) {
      w.__contentAtMs = performance.now();
      observer.disconnect();
    }
  });
  observer.observe(document, { subtree: true, childList: true, characterData: true });
  new PerformanceObserver((list) => {
    for (const entry of list.getEntries() as (PerformanceEntry & { element?: Element | null })[]) {
      const element = entry.element;
      const text = element?.textContent?.trim().slice(0, 40) ?? "";
      w.__lcp = { startTime: entry.startTime, element: element ? `${element.tagName.toLowerCase()} "${text}"` : "(removed)" };
    }
  }).observe({ type: "largest-contentful-paint", buffered: true });
}

async function visit(browser: Browser, build: Build, { url, readyText }: { url: string; readyText: string }, network: (typeof NETWORKS)[number], storageState?: Awaited<ReturnType<BrowserContext["storageState"]>>): Promise<Visit> {
  const context = await browser.newContext({ baseURL: build.baseUrl, viewport: { width: 390, height: 844 }, storageState });
  try {
    const page = await context.newPage();
    await page.addInitScript({ content: `var __name = (f) => f; (${installLcpProbe.toString()})(${JSON.stringify(readyText)});` });
    const cdp = await context.newCDPSession(page);
    await cdp.send("Emulation.setCPUThrottlingRate", { rate: CPU_THROTTLING_RATE });
    if (network.conditions) {
      await cdp.send("Network.enable");
      await cdp.send("Network.emulateNetworkConditions", network.conditions);
    }
    await page.goto(url, { waitUntil: "networkidle", timeout: 120_000 });
    await page.getByText(readyText).first().waitFor({ timeout: 120_000 });
    // The content's paint lands after its DOM: give the browser a moment to report it.
    await page.waitForTimeout(1_000);
    return await page.evaluate(() => {
      const w = window as unknown as { __lcp: { startTime: number; element: string } | null; __contentAtMs: number | null };
      const lcp = w.__lcp;
      const resources = performance.getEntriesByType("resource") as PerformanceResourceTiming[];
      const scripts = resources.filter((r) => r.name.endsWith(".js"));
      const project = resources.find((r) => /\/api\/projects\/[0-9a-f-]{36}$/.test(new URL(r.name).pathname));
      return {
        lcpMs: lcp?.startTime ?? NaN,
        lcpElement: lcp?.element ?? "(none)",
        contentAtMs: w.__contentAtMs ?? NaN,
        jsFiles: scripts.length,
        jsWireKb: scripts.reduce((sum, r) => sum + r.transferSize, 0) / 1000,
        jsUnpackedKb: scripts.reduce((sum, r) => sum + r.decodedBodySize, 0) / 1000,
        projectRequestAtMs: project ? project.requestStart || project.startTime : null,
      };
    });
  } finally {
    await context.close();
  }
}

const quantile = (sorted: number[], q: number) => sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1))] ?? NaN;
const median = (values: number[]) => quantile([...values].sort((a, b) => a - b), 0.5);
const p95 = (values: number[]) => quantile([...values].sort((a, b) => a - b), 0.95);
const ms = (n: number) => (Number.isFinite(n) ? `${Math.round(n).toLocaleString("en-US")} ms` : "-");

function line(label: string, visits: Visit[]) {
  const project = visits.map((v) => v.projectRequestAtMs).filter((v): v is number => v !== null);
  const last = visits[visits.length - 1]!;
  return (
    `    ${label.padEnd(30)} LCP median ${ms(median(visits.map((v) => v.lcpMs))).padStart(8)} · p95 ${ms(p95(visits.map((v) => v.lcpMs))).padStart(8)}` +
    ` · content in the DOM ${ms(median(visits.map((v) => v.contentAtMs)))}` +
    ` · JS ${last.jsFiles} files, ${median(visits.map((v) => v.jsWireKb)).toFixed(0)} kB on the wire (${median(visits.map((v) => v.jsUnpackedKb)).toFixed(0)} kB unpacked)` +
    (project.length ? ` · project asked for at ${ms(median(project))}` : "") +
    ` · LCP element ${last.lcpElement}`
  );
}

const databaseUrl = process.env.EAVESIGHT_BENCH_DATABASE_URL ?? (await prepareDatabase("test")).databaseUrl;
ensureChromium();
await seedDemo(databaseUrl);
const baseline = baselineCheckout();
const outDirs = { current: path.join(projectRoot, "dist", `client-bench-${process.pid}`), baseline: path.join(baseline.root, "dist", "client-bench") };
const smtp = await startFakeSmtp({ port: await freePort(), databaseUrl, quiet: true });
const builds: Build[] = [];
let browser: Browser | undefined;
try {
  build(projectRoot, outDirs.current);
  build(baseline.root, outDirs.baseline);
  for (const [label, root, clientDir] of [[`baseline (${BASELINE_REF} at ${baseline.sha})`, baseline.root, outDirs.baseline], ["this checkout", projectRoot, outDirs.current]] as const) {
    if (!existsSync(clientDir)) throw new Error(`no client build in ${clientDir}`);
    const port = await freePort();
    const server = await startServerIn(root, {
      ...process.env, DATABASE_URL: databaseUrl, NODE_ENV: "test", PORT: String(port), APP_ORIGIN: `http://127.0.0.1:${port}`, SMTP_PORT: String(smtp.port), LOG_LEVEL: "error", CLIENT_DIR: clientDir,
    });
    builds.push({ label, root, baseUrl: `http://127.0.0.1:${port}`, server });
  }
  browser = await chromium.launch({
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
  });

  // One signed-in estimator (same database behind both servers) and the demo project to open.
  const signedIn = await browser.newContext({ baseURL: builds[1]!.baseUrl });
  const signInResponse = await signedIn.request.post("/api/auth/sign-in", { headers: { origin: builds[1]!.baseUrl }, data: { email: ESTIMATOR, password: DEMO_PASSWORD } });
  if (!signInResponse.ok()) throw new Error(`sign-in failed: ${signInResponse.status()}`);
  const list = (await (await signedIn.request.get(`/api/projects?q=${encodeURIComponent("Varnum")}`)).json()) as { items: { id: string; title: string }[] };
  const project = list.items.find((p) => p.title === PROJECT_TITLE);
  if (!project) throw new Error(`demo project "${PROJECT_TITLE}" not found`);
  const storageState = await signedIn.storageState();
  await signedIn.close();

  const pages = [
    { name: "sign-in page", url: "/sign-in", readyText: "Use the e-mail address your company added you with.", storageState: undefined },
    { name: "survey workspace", url: `/projects/${project.id}`, readyText: "Length (along the ridge)", storageState },
  ];
  console.log(`First visits (empty cache), 390 × 844, CPU ${CPU_THROTTLING_RATE}× slower, ${RUNS} runs each, baseline and this checkout alternating:`);
  const networkWords = ["loopback", "slow"];
  const pageWords = ["sign-in", "workspace"];
  for (const network of NETWORKS.filter((n) => isChosen(n.name, networkWords))) {
    console.log(`  network: ${network.name}`);
    for (const page of pages.filter((p) => isChosen(p.name, pageWords))) {
      const loadBefore = loadavg()[0]!.toFixed(1);
      const visits = new Map<Build, Visit[]>(builds.map((b) => [b, []]));
      // One untimed visit each first: the servers' first requests compile and connect.
      for (const b of builds) await visit(browser, b, page, network, page.storageState);
      for (let run = 0; run < RUNS; run += 1) {
        for (const b of run % 2 === 0 ? builds : [...builds].reverse()) visits.get(b)!.push(await visit(browser, b, page, network, page.storageState));
      }
      console.log(`  ${page.name} (load average ${loadBefore} → ${loadavg()[0]!.toFixed(1)} on ${cpus().length} cores):`);
      for (const b of builds) console.log(line(b.label, visits.get(b)!));
      const [before, after] = builds.map((b) => median(visits.get(b)!.map((v) => v.lcpMs)));
      console.log(`    LCP this checkout / baseline: ${(after! / before!).toFixed(2)}×`);
    }
  }
} finally {
  await browser?.close();
  for (const b of builds) await stopChild(b.server);
  await smtp.close();
  rmSync(outDirs.current, { recursive: true, force: true });
  baseline.remove();
}
