/**
 * The largest legal survey against the health check (issue 13, item 6): a project with every
 * attic space at its limits (LIMITS: spaces, sections, vent rows), analysed by GET
 * /api/projects/:id/analysis on the real server (NODE_ENV=production, as `npm start` runs it).
 *
 * Printed, from one run, twice: with the analysis on the request thread (COMPUTE_THREADS=0, the
 * baseline) and on the compute pool's worker threads (the default): the time of one such analysis
 * request alone; then the health check's p50 / p95 / max latency with nothing else running, and
 * again while ten clients request that analysis back to back.
 *
 *   npm run bench -- largest-analysis                 (a throwaway database, via scripts/tasks/bench.ts)
 *   node --import tsx bench/largest-analysis-bench.ts (a database of its own in the test cluster, dropped after)
 */
import { mkdtemp, rm } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { performance } from "node:perf_hooks";
import { freePort, startServer, stopChild } from "../scripts/lib/environment.ts";
import { startFakeSmtp } from "../scripts/lib/fake-smtp.ts";
import { DEMO_PASSWORD } from "../scripts/lib/seed.ts";
import { LIMITS } from "../shared/ventilation/index.ts";
import { demoDatabase } from "./demo-database.ts";

const HEALTH_SAMPLES = 200;
const ANALYSIS_CLIENTS = 10;

const demo = await demoDatabase("largest-analysis");
const storageDir = await mkdtemp(path.join(os.tmpdir(), "eavesight-bench-files-"));
const smtp = await startFakeSmtp({ databaseUrl: demo.databaseUrl, port: await freePort() });
let origin = "";
let cookie = "";

async function call<T>(method: string, url: string, body?: unknown): Promise<{ status: number; body: T }> {
  const res = await fetch(`${origin}${url}`, {
    method, headers: { origin, cookie, ...(body === undefined ? {} : { "content-type": "application/json" }) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const setCookie = res.headers.get("set-cookie");
  if (setCookie) cookie = setCookie.split(";")[0]!;
  return { status: res.status, body: (await res.json()) as T };
}
const must = <T>(r: { status: number; body: T }, what: string) => {
  if (r.status >= 300) throw new Error(`${what}: ${r.status} ${JSON.stringify(r.body).slice(0, 300)}`);
  return r.body;
};

const KINDS = [
  (i: number) => ({ kind: "soffit-continuous", location: "lower", lengthFt: 20 + (i % 7), nfaSqInPerFt: 9 }),
  (i: number) => ({ kind: "soffit-individual", location: "lower", quantity: 1 + (i % 12), nfaSqInPerUnit: 25 }),
  (i: number) => ({ kind: "ridge", location: "upper", lengthFt: 8 + (i % 9), nfaSqInPerFt: 18 }),
  (i: number) => ({ kind: "box", location: "upper", quantity: 1 + (i % 3), nfaSqInPerUnit: 50, dropBelowRidgeFt: 1 + (i % 4) }),
  (_i: number) => ({ kind: "gable-louver", location: "upper", grossWidthIn: 14, grossHeightIn: 24, covering: { mesh: "1/8", louvers: true } }),
  (i: number) => ({ kind: "powered-roof", location: "upper", cfm: 900 + i, dropBelowRidgeFt: 3 }),
];

const quantile = (sorted: number[], q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))]!;
async function healthLatencies(): Promise<{ p50: number; p95: number; max: number }> {
  const ms: number[] = [];
  for (let i = 0; i < HEALTH_SAMPLES; i++) {
    const start = performance.now();
    const res = await fetch(`${origin}/api/health`);
    await res.arrayBuffer();
    ms.push(performance.now() - start);
    await new Promise((r) => setTimeout(r, 10));
  }
  ms.sort((a, b) => a - b);
  return { p50: quantile(ms, 0.5), p95: quantile(ms, 0.95), max: ms[ms.length - 1]! };
}

let projectId: string | null = null;
/** The largest legal project, made once through the API of the first server. */
async function largestProject(): Promise<string> {
  if (projectId) return projectId;
  const customer = must(await call<{ customer: { id: string } }>("POST", "/api/customers", { name: "Largest Survey" }), "customer").customer;
  const project = must(await call<{ project: { id: string } }>("POST", "/api/projects", { customerId: customer.id, title: "Largest legal survey", siteAddress: "1 Bench Road, Marrow Creek", climateZone: 5 }), "project").project;
  for (let s = 0; s < LIMITS.maxSpacesPerProject; s++) {
    must(await call("POST", `/api/projects/${project.id}/spaces`, {
      name: `Space ${s + 1}`,
      roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 60, eaveLengthFt: 120 },
      sections: Array.from({ length: LIMITS.maxSections }, (_, i) => ({ kind: "rect", lengthFt: 10 + (i % 20), widthFt: 8 + (i % 5) })),
      vents: Array.from({ length: LIMITS.maxVents }, (_, i) => ({ id: `v${i}`, ...KINDS[i % KINDS.length]!(i) })),
      site: { atmosphericCombustionAppliance: true },
    }), `space ${s + 1}`);
  }
  projectId = project.id;
  return projectId;
}

const f = (x: number) => `${x.toFixed(1)} ms`;

/** One server with these settings: the figures of one line pair. */
async function measure(label: string, env: Record<string, string>) {
  const port = await freePort();
  origin = `http://127.0.0.1:${port}`;
  cookie = "";
  const app = await startServer({
    ...process.env, DATABASE_URL: demo.databaseUrl, HOST: "127.0.0.1", PORT: String(port), APP_ORIGIN: origin,
    SMTP_PORT: String(smtp.port), STORAGE_DIR: storageDir, SERVE_CLIENT: "false", LOG_LEVEL: "warn", NODE_ENV: "production", ...env,
  });
  try {
    must(await call("POST", "/api/auth/sign-in", { email: "owner@tallgrass.example", password: DEMO_PASSWORD }), "sign-in");
    const analysisUrl = `/api/projects/${await largestProject()}/analysis`;
    // Warm up the code paths (and the pool's threads), then time one request alone.
    for (let i = 0; i < 3; i++) must(await call("GET", analysisUrl), "analysis");
    const size = (await (await fetch(`${origin}${analysisUrl}`, { headers: { cookie } })).arrayBuffer()).byteLength;
    const alone: number[] = [];
    for (let i = 0; i < 10; i++) {
      const start = performance.now();
      must(await call("GET", analysisUrl), "analysis");
      alone.push(performance.now() - start);
    }
    alone.sort((a, b) => a - b);

    const baseline = await healthLatencies();
    let isLoading = true;
    let analyses = 0;
    const failures: string[] = [];
    const clients = Array.from({ length: ANALYSIS_CLIENTS }, async () => {
      while (isLoading) {
        try {
          must(await call("GET", analysisUrl), "analysis");
          analyses++;
        } catch (err) {
          failures.push(err instanceof Error ? `${err.message}${err.cause instanceof Error ? ` (${err.cause.message})` : ""}` : String(err));
        }
      }
    });
    const loadStart = performance.now();
    const loaded = await healthLatencies();
    isLoading = false;
    await Promise.all(clients);
    const loadSeconds = (performance.now() - loadStart) / 1000;

    console.log(`${label}`);
    console.log(`  analysis answer: ${(size / 1024).toFixed(0)} KiB of JSON`);
    console.log(`  one analysis request alone: median ${f(quantile(alone, 0.5))}, max ${f(alone[alone.length - 1]!)}`);
    console.log(`  health, nothing else running:            p50 ${f(baseline.p50)}  p95 ${f(baseline.p95)}  max ${f(baseline.max)}`);
    console.log(`  health, ${ANALYSIS_CLIENTS} clients analysing it nonstop:  p50 ${f(loaded.p50)}  p95 ${f(loaded.p95)}  max ${f(loaded.max)}  (${(analyses / loadSeconds).toFixed(1)} analyses/s)`);
    if (failures.length) console.log(`  failed analysis requests: ${failures.length} (first: ${failures[0]})`);
  } finally {
    await stopChild(app);
  }
}

try {
  console.log(`largest legal project: ${LIMITS.maxSpacesPerProject} spaces × ${LIMITS.maxSections} sections × ${LIMITS.maxVents} vent rows`);
  await measure("baseline, analysis on the request thread (COMPUTE_THREADS=0):", { COMPUTE_THREADS: "0" });
  await measure(`analysis on the compute pool (${process.env.COMPUTE_THREADS ?? "default"} threads):`, {});
  console.log(`  load average (1/5/15 min): ${os.loadavg().map((x) => x.toFixed(2)).join(" / ")}`);
} finally {
  await smtp.close();
  await rm(storageDir, { recursive: true, force: true });
  demo.drop();
}
