/**
 * The API under load on loopback: the project list, a project's detail and its analysis (the two
 * calls of the project page), and the homeowner's proposal page data, each for MEASURE_SECONDS at
 * 10 and 100 connections (autocannon). The real server runs as a child process on the demo data
 * with workers, mail and NODE_ENV=production as `npm start` runs it; beside it, in the same run,
 * bench/baseline-server.ts answers each route with one comparable query on a bare Express +
 * postgres.js. Printed: successful (2xx) responses per second, p50/p99 latency of those, non-2xx
 * and socket errors, and the ratios app / baseline.
 *
 * The public route is limited to 120 requests a minute per address (decision 12). Load from one
 * address would measure the limiter's 429s, so each request comes from its own address in
 * X-Forwarded-For (the app trusts it from loopback, as behind a local proxy): many homeowners,
 * each opening their link once. A last run from one address shows the limiter at work.
 *
 *   npm run bench -- api-load                 (a throwaway database, via scripts/tasks/bench.ts)
 *   node --import tsx bench/api-load-bench.ts (a database of its own in the test cluster, dropped after)
 */
import { spawn, type ChildProcess } from "node:child_process";
import { readFileSync } from "node:fs";
import { mkdtemp, rm } from "node:fs/promises";
import os from "node:os";
import { isDeepStrictEqual } from "node:util";
import path from "node:path";
import autocannon, { type RawRequest, type Result } from "autocannon";
import postgres from "postgres";
import { freePort, startServer, stopChild } from "../scripts/lib/environment.ts";
import { startFakeSmtp } from "../scripts/lib/fake-smtp.ts";
import { projectRoot } from "../scripts/lib/paths.ts";
import { DEMO_PASSWORD, FAN_AND_RIDGE_TITLE } from "../scripts/lib/seed.ts";
import { demoDatabase } from "./demo-database.ts";

const MEASURE_SECONDS = 8;
const WARMUP_SECONDS = 1;
const CONNECTION_COUNTS = [10, 100] as const;
const ONE_ADDRESS_SECONDS = 5;
const RENDER_WAIT_MS = 90_000;
/** Staff routes should answer at least this share of the bare one-query route's requests per second. */
const GOAL_RATIO = 0.6;

interface Scenario {
  label: string;
  path: string;
  /** The homeowner's side: no session cookie, and each request from its own client address (the per-address limit). */
  isPublic?: boolean;
}

/** One address per request, 10.0.0.1 upward: far fewer than 120 a minute from each. */
let addressCount = 0;
function fromNextAddress(request: RawRequest): RawRequest {
  addressCount += 1;
  request.headers = { ...request.headers, "x-forwarded-for": `10.${(addressCount >> 16) & 255}.${(addressCount >> 8) & 255}.${addressCount & 255}` };
  return request;
}

async function load(baseUrl: string, scenario: Scenario, connections: number, durationSec: number, staffHeaders: Record<string, string>): Promise<Result> {
  const headers = scenario.isPublic ? { accept: staffHeaders.accept! } : staffHeaders;
  return autocannon({
    url: `${baseUrl}${scenario.path}`, connections, duration: durationSec, headers,
    ...(scenario.isPublic ? { requests: [{ setupRequest: fromNextAddress }] } : {}),
  });
}

// Linux's USER_HZ, the unit of /proc/<pid>/stat times (`getconf CLK_TCK`), is 100 on mainstream kernels.
const CPU_MS_PER_TICK = 10;

/** CPU time (user + system, all threads) of each process that can be read, by pid; none off Linux. */
function cpuMsByPid(pids: readonly number[]): Map<number, number> {
  const byPid = new Map<number, number>();
  for (const pid of pids) {
    try {
      const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
      // Fields after the parenthesised command name start at field 3 (state); utime and stime are fields 14 and 15.
      const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
      byPid.set(pid, (Number(fields[11]) + Number(fields[12])) * CPU_MS_PER_TICK);
    } catch {
      // Gone, or no /proc: that process is left out.
    }
  }
  return byPid;
}
const cpuMsSince = (before: Map<number, number>) => {
  let totalMs = 0;
  for (const [pid, ms] of cpuMsByPid([...before.keys()])) totalMs += ms - before.get(pid)!;
  return totalMs;
};

/** bench/baseline-server.ts as a child process, resolved once it listens (as startServer does for the app). */
function startBaseline(env: NodeJS.ProcessEnv): Promise<ChildProcess> {
  const child = spawn(process.execPath, ["--import", "tsx", path.join("bench", "baseline-server.ts")], { cwd: projectRoot, env, stdio: ["ignore", "inherit", "inherit", "ipc"] });
  return new Promise((resolve, reject) => {
    const onExit = (code: number | null) => reject(new Error(`the baseline server exited with code ${code} before it was ready`));
    child.once("exit", onExit);
    child.on("message", (m: { ready?: boolean }) => {
      if (m?.ready) {
        child.off("exit", onExit);
        resolve(child);
      }
    });
  });
}

const demo = await demoDatabase("api-load");
const storageDir = await mkdtemp(path.join(os.tmpdir(), "eavesight-api-load-"));
const smtpPort = await freePort();
const smtp = await startFakeSmtp({ port: smtpPort, databaseUrl: demo.databaseUrl, quiet: true });
// Also reads which PostgreSQL backends serve this database, to count their CPU time per run.
const monitor = postgres(demo.databaseUrl, { max: 1, onnotice: () => {} });
const backendPids = async () => (await monitor<{ pid: number }[]>`select pid from pg_stat_activity where datname = current_database() and pid <> pg_backend_pid()`).map((r) => r.pid);
let app: ChildProcess | undefined;
let baseline: ChildProcess | undefined;
try {
  const [company] = await monitor<{ id: string }[]>`select id from companies where slug = 'tallgrass'`;
  if (!company) throw new Error("the demo company Tallgrass Exteriors is missing: was the demo seeded?");

  const appPort = await freePort();
  const baselinePort = await freePort();
  const appUrl = `http://127.0.0.1:${appPort}`;
  const baselineUrl = `http://127.0.0.1:${baselinePort}`;
  const loadAverageAtStart = os.loadavg()[0]!;
  app = await startServer({
    ...process.env, DATABASE_URL: demo.databaseUrl, HOST: "127.0.0.1", PORT: String(appPort), APP_ORIGIN: appUrl,
    SMTP_PORT: String(smtpPort), STORAGE_DIR: storageDir, SERVE_CLIENT: "false", LOG_LEVEL: "warn", NODE_ENV: "production",
  });
  baseline = await startBaseline({ ...process.env, DATABASE_URL: demo.databaseUrl, PORT: String(baselinePort), BASELINE_COMPANY_ID: company.id });

  let cookie = "";
  async function call<T>(method: string, pathname: string, body?: unknown): Promise<T> {
    const res = await fetch(`${appUrl}${pathname}`, {
      method, headers: { origin: appUrl, cookie, ...(body === undefined ? {} : { "content-type": "application/json" }) },
      ...(body === undefined ? {} : { body: JSON.stringify(body) }),
    });
    if (!res.ok) throw new Error(`${method} ${pathname} answered ${res.status}: ${await res.text()}`);
    const setCookie = res.headers.getSetCookie().find((c) => c.startsWith("eavesight_session="));
    if (setCookie) cookie = setCookie.split(";")[0]!;
    return (await res.json()) as T;
  }

  // The owner signs in, signs the profile and sends the demo proposal: the link's token is in the answer.
  const owner = await call<{ user: { name: string } }>("POST", "/api/auth/sign-in", { email: "owner@tallgrass.example", password: DEMO_PASSWORD });
  const list = await call<{ items: { id: string; title: string }[] }>("GET", `/api/projects?q=${encodeURIComponent("Varnum attic")}`);
  const project = list.items.find((p) => p.title === FAN_AND_RIDGE_TITLE);
  if (!project) throw new Error(`the demo project "${FAN_AND_RIDGE_TITLE}" is missing`);
  const { options } = await call<{ options: { id: string }[] }>("GET", `/api/projects/${project.id}/options`);
  await call("PUT", "/api/auth/me/signature", { typed: owner.user.name });
  const { proposal } = await call<{ proposal: { id: string } }>("POST", `/api/projects/${project.id}/proposals`, { optionIds: options.map((o) => o.id) });
  const sent = await call<{ link: string }>("POST", `/api/proposals/${proposal.id}/send`);
  const token = sent.link.split("/p/")[1]!;

  // The send queues a PDF render (a second or so of CPU in the server): let it finish before measuring.
  const renderT0 = Date.now();
  let renderStatus = "queued";
  while (renderStatus !== "ready" && renderStatus !== "failed" && Date.now() - renderT0 < RENDER_WAIT_MS) {
    await new Promise((resolve) => setTimeout(resolve, 250));
    renderStatus = (await call<{ render: { status: string } }>("GET", `/api/proposals/${proposal.id}/render-status`)).render.status;
  }
  const renderWaitMs = Date.now() - renderT0;

  const scenarios: Scenario[] = [
    { label: "project list (page 1)", path: "/api/projects" },
    { label: "project detail", path: `/api/projects/${project.id}` },
    { label: "project analysis", path: `/api/projects/${project.id}/analysis` },
    { label: "public proposal page data", path: `/api/public/proposals/${token}`, isPublic: true },
  ];
  const headers = { cookie, accept: "application/json" };

  // Each route answers 200 on both before it is loaded (the first public view also records "viewed"),
  // and the baseline answers the staff routes with the very JSON the app answers.
  const bodySizes: string[] = [];
  const sameJson: string[] = [];
  for (const scenario of scenarios) {
    const bodies: string[] = [];
    for (const baseUrl of [appUrl, baselineUrl]) {
      const res = await fetch(`${baseUrl}${scenario.path}`, { headers: scenario.isPublic ? { "x-forwarded-for": "10.255.255.254" } : headers });
      if (res.status !== 200) throw new Error(`${baseUrl}${scenario.path} answered ${res.status}: ${await res.text()}`);
      bodies.push(await res.text());
    }
    const [ours, bare] = bodies as [string, string];
    bodySizes.push(`${scenario.label} ${(Buffer.byteLength(ours) / 1024).toFixed(1)} / ${(Buffer.byteLength(bare) / 1024).toFixed(1)} KiB`);
    const isSame = isDeepStrictEqual(JSON.parse(ours), JSON.parse(bare));
    if (!isSame && !scenario.isPublic) throw new Error(`the baseline's ${scenario.label} JSON differs from the app's:\napp:      ${ours.slice(0, 2000)}\nbaseline: ${bare.slice(0, 2000)}`);
    sameJson.push(`${scenario.label} ${isSame ? (ours === bare ? "byte for byte" : "equal") : "DIFFERENT"}`);
  }

  /** One timed run, with the CPU the server process and the database's backends spent on it. */
  async function measured(server: ChildProcess, baseUrl: string, scenario: Scenario, connections: number) {
    const serverBefore = cpuMsByPid([server.pid!]);
    const databaseBefore = cpuMsByPid(await backendPids());
    const result = await load(baseUrl, scenario, connections, MEASURE_SECONDS, headers);
    const answers = Math.max(1, result["2xx"] + result.non2xx);
    return { result, serverCpuMsPerAnswer: cpuMsSince(serverBefore) / answers, databaseCpuMsPerAnswer: cpuMsSince(databaseBefore) / answers };
  }

  const rows: string[] = [];
  const cell = ({ result: r, serverCpuMsPerAnswer, databaseCpuMsPerAnswer }: Awaited<ReturnType<typeof measured>>) => {
    const okPerSec = r["2xx"] / r.duration;
    return {
      okPerSec, p99Ms: r.latency.p99,
      text: `${okPerSec.toFixed(0).padStart(7)} ${String(r.latency.p50).padStart(6)} ${String(r.latency.p99).padStart(6)} ${String(r.non2xx).padStart(7)} ${String(r.errors + r.timeouts).padStart(4)} ${serverCpuMsPerAnswer.toFixed(2).padStart(6)} ${databaseCpuMsPerAnswer.toFixed(2).padStart(5)}`,
    };
  };
  const ratio = (a: number, b: number) => (b > 0 ? `${(a / b).toFixed(2)}×` : "n/a");
  const nonOkDetail: string[] = [];
  for (const scenario of scenarios) {
    // A short untimed run on each warms the JIT and fills both pools.
    await load(appUrl, scenario, 10, WARMUP_SECONDS, headers);
    await load(baselineUrl, scenario, 10, WARMUP_SECONDS, headers);
    for (const connections of CONNECTION_COUNTS) {
      const ours = await measured(app, appUrl, scenario, connections);
      const bare = await measured(baseline, baselineUrl, scenario, connections);
      const [o, b] = [cell(ours), cell(bare)];
      const goal = scenario.isPublic ? "" : o.okPerSec / b.okPerSec >= GOAL_RATIO ? ` goal ≥ ${GOAL_RATIO}× met` : ` goal ≥ ${GOAL_RATIO}× NOT met`;
      rows.push(`  ${scenario.label.padEnd(26)} ${String(connections).padStart(5)} │ ${o.text} │ ${b.text} │ ${ratio(o.okPerSec, b.okPerSec).padStart(7)} ${ratio(o.p99Ms, b.p99Ms).padStart(7)}${goal}`);
      for (const [server, { result: r }] of [["eavesight", ours], ["baseline", bare]] as const) {
        if (r.non2xx || r.errors || r.timeouts) nonOkDetail.push(`  ${scenario.label} @${connections} ${server}: ${JSON.stringify(r.statusCodeStats)}, errors ${r.errors}, timeouts ${r.timeouts}`);
      }
    }
  }

  // The same public route from one address, as a single busy client would be: the limiter answers.
  const oneAddress = await autocannon({ url: `${appUrl}/api/public/proposals/${token}`, connections: 10, duration: ONE_ADDRESS_SECONDS, headers: { accept: "application/json" } });

  console.log(`API under load on loopback (autocannon in the bench process; server and baseline are child processes; ${os.cpus().length} cores shared with PostgreSQL and other work, load average ${loadAverageAtStart.toFixed(2)} at the start, ${os.loadavg()[0]!.toFixed(2)} at the end).`);
  console.log(`${MEASURE_SECONDS} s per run. req/s counts 2xx answers only; p50/p99 are of the 2xx answers (autocannon's 1 ms resolution); "non-2xx" and "err" (socket errors + timeouts) are counted apart;`);
  console.log(`"srv" and "db" are CPU ms per answer spent by the server process and by the database's PostgreSQL backends (from /proc, 10 ms ticks).`);
  console.log(`Demo proposal PDF ${renderStatus} ${(renderWaitMs / 1000).toFixed(1)} s after sending. Body sizes eavesight / baseline: ${bodySizes.join("; ")}.`);
  console.log(`Same JSON from both: ${sameJson.join("; ")}. Goal (issue 17): staff routes ≥ ${GOAL_RATIO}× the baseline's req/s at 10 and 100 connections.`);
  console.log("");
  const head = `${"req/s".padStart(7)} ${"p50 ms".padStart(6)} ${"p99 ms".padStart(6)} ${"non-2xx".padStart(7)} ${"err".padStart(4)} ${"srv".padStart(6)} ${"db".padStart(5)}`;
  console.log(`  ${"scenario".padEnd(26)} ${"conns".padStart(5)} │ ${"eavesight".padEnd(head.length)} │ ${"baseline (Express + postgres.js, 1 query)".padEnd(head.length)} │ eavesight/baseline`);
  console.log(`  ${"".padEnd(26)} ${"".padStart(5)} │ ${head} │ ${head} │ ${"req/s".padStart(7)} ${"p99".padStart(7)}`);
  for (const row of rows) console.log(row);
  if (nonOkDetail.length) console.log(`\nnon-2xx answers and errors by status:\n${nonOkDetail.join("\n")}`);
  console.log(`\npublic proposal page data from ONE address, 10 connections, ${ONE_ADDRESS_SECONDS} s (per-address limit 120/min): ` +
    `${oneAddress["2xx"]} answered 2xx, ${oneAddress.non2xx} non-2xx ${JSON.stringify(oneAddress.statusCodeStats)}, ${(oneAddress.requests.total ?? 0)} answers in all; ` +
    `${(100 * oneAddress.non2xx / Math.max(1, oneAddress["2xx"] + oneAddress.non2xx)).toFixed(1)} % refused`);
} finally {
  await monitor.end();
  await stopChild(app);
  await stopChild(baseline);
  await smtp.close();
  demo.drop();
  await rm(storageDir, { recursive: true, force: true });
}
