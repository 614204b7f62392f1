/**
 * Proposal PDF: the demo proposal (Varnum attic, both saved options) as the send path freezes it,
 * rendered in one process by the function the render job calls, WARMUP_RENDERS + 500 times.
 * Prints the median and p95 render time, and RSS / heap before and after the 500 (each also after
 * a forced GC), with a checkpoint every 100 renders so steady growth (a leak) shows as a trend.
 * Then, in the same run, the baseline: BASELINE_RENDERS renders in a second process whose fonts
 * are embedded from the shipped WOFF files as they were before issue 17 (fonts.ts, FontSource),
 * and the figures beside their goals (median ≤ 400 ms, p95 ≤ 600 ms).
 *
 * Between renders the loop gives the event loop one turn, as the render worker does (it reads and
 * writes the database between jobs): react-pdf's reconciler lets go of a finished document only in
 * a `scheduler` task, which runs on setImmediate. A last phase renders BACK_TO_BACK_RENDERS with no
 * turn between them, to show what a loop that never yields would keep.
 *
 *   npm run bench -- pdf                  (a throwaway database, via scripts/tasks/bench.ts)
 *   node --import tsx bench/pdf-bench.ts  (a database of its own in the test cluster, dropped after)
 */
import { spawn } from "node:child_process";
import { mkdtemp, readFile, rm, writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { performance } from "node:perf_hooks";
import { fileURLToPath } from "node:url";
import { and, eq } from "drizzle-orm";
import { createDb } from "../server/db/client.ts";
import { companies, projects, users } from "../server/db/schema/index.ts";
import type { Actor } from "../server/lib/request-context.ts";
import { createLocalStorage } from "../server/lib/storage/index.ts";
import { createCatalogRepository } from "../server/modules/catalog/catalog.repository.ts";
import { createOptionsRepository } from "../server/modules/options/options.repository.ts";
import { createProjectsRepository } from "../server/modules/projects/projects.repository.ts";
import { createSpacesRepository } from "../server/modules/spaces/spaces.repository.ts";
import type { ProposalJobs } from "../server/modules/proposals/proposal-jobs.ts";
import { createProposalsRepository } from "../server/modules/proposals/proposals.repository.ts";
import { createProposalsService } from "../server/modules/proposals/proposals.service.ts";
import { registerFonts, type FontSource } from "../server/modules/proposals/pdf/fonts.ts";
import { renderProposalPdf, type RenderInput } from "../server/modules/proposals/pdf/render-pdf.tsx";
import { FAN_AND_RIDGE_TITLE } from "../scripts/lib/seed.ts";
import { demoDatabase } from "./demo-database.ts";

const WARMUP_RENDERS = 5;
// EAVESIGHT_BENCH_PDF_RENDERS shortens a run (e.g. on a busy machine); EAVESIGHT_BENCH_PDF_OUT names a
// folder that keeps the first PDF of each font source, to compare as pictures (pdftoppm) and text (pdftotext).
const RENDERS = Number(process.env.EAVESIGHT_BENCH_PDF_RENDERS) || 500;
const CHECKPOINT_EVERY = 100;
const BACK_TO_BACK_RENDERS = 25;
const BASELINE_RENDERS = Math.min(100, RENDERS);
const GOAL_MEDIAN_MS = 400;
const GOAL_P95_MS = 600;

interface RenderTimes { medianMs: number; p95Ms: number; firstRenderMs: number; renders: number }

/** The demo proposal, created and sent through the proposals service; the background jobs are left out (nothing is mailed). */
async function sentDemoSnapshot(databaseUrl: string, storageDir: string): Promise<RenderInput["snapshot"]> {
  const { db, sql } = createDb(databaseUrl, { max: 2 });
  try {
    const [owner] = await db.select({ id: users.id, companyId: users.companyId, name: users.name, email: users.email })
      .from(users).innerJoin(companies, eq(companies.id, users.companyId))
      .where(and(eq(companies.slug, "tallgrass"), eq(users.email, "owner@tallgrass.example")));
    if (!owner) throw new Error("the demo owner of Tallgrass Exteriors is missing: was the demo seeded?");
    const actor: Actor = { userId: owner.id, companyId: owner.companyId, role: "owner", email: owner.email, name: owner.name };
    const [project] = await db.select({ id: projects.id }).from(projects)
      .where(and(eq(projects.companyId, actor.companyId), eq(projects.title, FAN_AND_RIDGE_TITLE)));
    if (!project) throw new Error(`the demo project "${FAN_AND_RIDGE_TITLE}" is missing`);

    // Every job call (render, mail, reminder) resolves at once and does nothing: this bench renders
    // the PDF itself and mails no one. A proxy, so the stub never falls behind the jobs' interface.
    const noJobs = new Proxy({}, { get: () => async () => true }) as ProposalJobs;
    const repo = createProposalsRepository(db);
    const optionsRepo = createOptionsRepository(db);
    const service = createProposalsService({
      repo, projects: createProjectsRepository(db), spaces: createSpacesRepository(db), options: optionsRepo, catalog: createCatalogRepository(db),
      storage: createLocalStorage(storageDir), jobs: noJobs, now: () => new Date(), appOrigin: () => "http://127.0.0.1:3000",
    });
    const meta = { ip: "127.0.0.1", userAgent: "pdf-bench" };
    const optionIds = (await optionsRepo.listForProject(actor, project.id)).map((o) => o.id);
    await service.setSellerSignature(actor, { typed: owner.name });
    const draft = await service.create(actor, project.id, { optionIds }, meta);
    await service.send(actor, draft.id, meta);
    const row = await repo.find(actor, draft.id);
    if (!row?.snapshot) throw new Error("the sent demo proposal has no snapshot");
    return row.snapshot;
  } finally {
    await sql.end();
  }
}

/**
 * The child: renders under NODE_ENV=production (npm start), which picks React's production
 * build when React is first loaded, with a forced GC to separate live memory from garbage not
 * yet collected; both need a fresh process. Sends its times to the parent.
 */
async function renderChild(fonts: FontSource, renders: number, snapshotFile: string): Promise<RenderTimes> {
  registerFonts(fonts);
  const forceGc = globalThis.gc!;
  const mib = (bytes: number) => bytes / 1024 / 1024;
  function memory(label: string, opts: { isAfterGc?: boolean } = {}) {
    if (opts.isAfterGc) forceGc();
    const m = process.memoryUsage();
    return { label, rssMiB: mib(m.rss), heapUsedMiB: mib(m.heapUsed), externalMiB: mib(m.external), arrayBuffersMiB: mib(m.arrayBuffers) };
  }
  type Memory = ReturnType<typeof memory>;
  const eventLoopTurn = () => new Promise<void>((resolve) => setImmediate(resolve));
  const medianOf = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
  const isBaseline = fonts === "woff";
  // The demo has no logo or photos, so the job's assets step would hand over exactly these.
  const input: RenderInput = { snapshot: JSON.parse(await readFile(snapshotFile, "utf8")), logoDataUrl: null, photoDataUrls: {}, verifyUrl: "http://127.0.0.1:3000/verify" };
  const snapshot = input.snapshot;

  const start = memory("at start (after GC)", { isAfterGc: true });
  const firstT0 = performance.now();
  const firstPdf = await renderProposalPdf(input);
  const pdfBytes = firstPdf.length;
  if (process.env.EAVESIGHT_BENCH_PDF_OUT) await writeFile(path.join(process.env.EAVESIGHT_BENCH_PDF_OUT, `proposal-${fonts}.pdf`), firstPdf);
  const firstRenderMs = performance.now() - firstT0;
  const RENDERS = renders;
  if (isBaseline) {
    console.log(`baseline: the same PDF with the fonts embedded from the shipped WOFF files, ${RENDERS} renders in a second process (${(pdfBytes / 1024).toFixed(0)} KiB):`);
  } else {
    console.log(`proposal PDF, demo proposal "${FAN_AND_RIDGE_TITLE}" as sent (${snapshot.options.length} options, ${(pdfBytes / 1024).toFixed(0)} KiB), fonts unpacked to TrueType, ${RENDERS} renders in one process (Node ${process.version}, NODE_ENV=production, ${os.cpus().length} cores, load average ${os.loadavg()[0]!.toFixed(2)} at the start):`);
  }

  for (let i = 1; i < WARMUP_RENDERS; i++) {
    await eventLoopTurn();
    await renderProposalPdf(input);
  }
  await eventLoopTurn();
  const afterWarmup = memory(`after ${WARMUP_RENDERS} warm-up renders`);
  const afterWarmupGc = memory(`after ${WARMUP_RENDERS} warm-up renders (after GC)`, { isAfterGc: true });

  const renderMs: number[] = [];
  const checkpoints: Memory[] = [];
  const loopT0 = performance.now();
  for (let i = 1; i <= RENDERS; i++) {
    const t0 = performance.now();
    await renderProposalPdf(input);
    renderMs.push(performance.now() - t0);
    await eventLoopTurn();
    if (i % CHECKPOINT_EVERY === 0) {
      const lastMedianMs = medianOf(renderMs.slice(-CHECKPOINT_EVERY));
      // The last checkpoint is the "after" pair below, read first without a GC.
      if (i < RENDERS) checkpoints.push(memory(`after ${i} renders (after GC)`, { isAfterGc: true }));
      console.log(`  … ${i} renders, median of the last ${CHECKPOINT_EVERY} ${lastMedianMs.toFixed(0)} ms`);
    }
  }
  const loopSeconds = (performance.now() - loopT0) / 1000;
  renderMs.sort((a, b) => a - b);
  const at = (q: number) => renderMs[Math.min(renderMs.length - 1, Math.floor(renderMs.length * q))]!;
  const times: RenderTimes = { medianMs: at(0.5), p95Ms: at(0.95), firstRenderMs, renders: RENDERS };
  if (isBaseline) {
    console.log(`  first render ${firstRenderMs.toFixed(0)} ms; render median ${at(0.5).toFixed(1)} ms   p95 ${at(0.95).toFixed(1)} ms   (${RENDERS} renders in ${loopSeconds.toFixed(1)} s)`);
    return times;
  }
  const after = memory(`after ${RENDERS} renders`);
  const afterGc = memory(`after ${RENDERS} renders (after GC)`, { isAfterGc: true });

  for (let i = 0; i < BACK_TO_BACK_RENDERS; i++) await renderProposalPdf(input);
  const backToBack = memory(`+ ${BACK_TO_BACK_RENDERS} back-to-back, no turn (after GC)`, { isAfterGc: true });
  await eventLoopTurn();
  const backToBackReleased = memory(`  then one event-loop turn (after GC)`, { isAfterGc: true });

  console.log(`  first render (fonts, modules cold) ${firstRenderMs.toFixed(0)} ms; load average ${os.loadavg()[0]!.toFixed(2)} at the end`);
  console.log(`  render  median ${at(0.5).toFixed(1)} ms   p95 ${at(0.95).toFixed(1)} ms   min ${renderMs[0]!.toFixed(1)} ms   max ${renderMs.at(-1)!.toFixed(1)} ms   (${RENDERS} renders in ${loopSeconds.toFixed(1)} s)`);
  console.log("  memory                                         rss MiB   heapUsed MiB   external MiB   arrayBuffers MiB");
  for (const m of [start, afterWarmup, afterWarmupGc, ...checkpoints, after, afterGc, backToBack, backToBackReleased]) {
    console.log(`  ${m.label.padEnd(45)} ${m.rssMiB.toFixed(1).padStart(8)} ${m.heapUsedMiB.toFixed(1).padStart(14)} ${m.externalMiB.toFixed(1).padStart(14)} ${m.arrayBuffersMiB.toFixed(1).padStart(18)}`);
  }
  const growthPerHundredHeapMiB = checkpoints.length ? (afterGc.heapUsedMiB - checkpoints[0]!.heapUsedMiB) / checkpoints.length : Number.NaN;
  console.log(`  growth over the ${RENDERS}: rss ${(afterGc.rssMiB - afterWarmupGc.rssMiB).toFixed(1)} MiB, heapUsed ${(afterGc.heapUsedMiB - afterWarmupGc.heapUsedMiB).toFixed(1)} MiB (both after GC); heapUsed ${growthPerHundredHeapMiB.toFixed(2)} MiB per 100 renders between checkpoints`);
  console.log(`  back-to-back renders kept ${((backToBack.heapUsedMiB - afterGc.heapUsedMiB) / BACK_TO_BACK_RENDERS).toFixed(2)} MiB of heap each until the event loop turned; after the turn ${(backToBackReleased.heapUsedMiB - afterGc.heapUsedMiB).toFixed(1)} MiB stayed`);
  return times;
}

/** The parent: makes the sent demo proposal once, then runs the measured renders and the baseline as children. */
async function runChild(fonts: FontSource, renders: number, snapshotFile: string): Promise<RenderTimes> {
  const child = spawn(process.execPath, [...process.execArgv, "--expose-gc", fileURLToPath(import.meta.url), "render", fonts, String(renders), snapshotFile], {
    stdio: ["ignore", "inherit", "inherit", "ipc"], env: { ...process.env, NODE_ENV: "production" },
  });
  let times: RenderTimes | undefined;
  child.on("message", (m: RenderTimes) => { times = m; });
  const code = await new Promise<number | null>((resolve) => child.on("exit", resolve));
  if (code !== 0 || !times) throw new Error(`the ${fonts} render process exited with code ${code}`);
  return times;
}

if (process.argv[2] === "render") {
  const [fonts, renders, snapshotFile] = process.argv.slice(3) as [FontSource, string, string];
  const times = await renderChild(fonts, Number(renders), snapshotFile);
  process.send!(times, () => process.exit(0));
} else {
  const storageDir = await mkdtemp(path.join(os.tmpdir(), "eavesight-pdf-bench-"));
  const demo = await demoDatabase("pdf");
  try {
    const snapshotFile = path.join(storageDir, "snapshot.json");
    await writeFile(snapshotFile, JSON.stringify(await sentDemoSnapshot(demo.databaseUrl, storageDir)));
    const ours = await runChild("ttf", RENDERS, snapshotFile);
    const baseline = await runChild("woff", BASELINE_RENDERS, snapshotFile);
    const verdict = (ms: number, goalMs: number) => `${ms.toFixed(0)} ms (goal ≤ ${goalMs} ms: ${ms <= goalMs ? "met" : "NOT met"})`;
    console.log(`  render median ${verdict(ours.medianMs, GOAL_MEDIAN_MS)}, p95 ${verdict(ours.p95Ms, GOAL_P95_MS)}; ` +
      `baseline (WOFF fonts, same run) median ${baseline.medianMs.toFixed(0)} ms, p95 ${baseline.p95Ms.toFixed(0)} ms: ` +
      `${(ours.medianMs / baseline.medianMs).toFixed(2)}× / ${(ours.p95Ms / baseline.p95Ms).toFixed(2)}× the baseline's time; first render ${ours.firstRenderMs.toFixed(0)} vs ${baseline.firstRenderMs.toFixed(0)} ms`);
  } finally {
    demo.drop();
    await rm(storageDir, { recursive: true, force: true });
  }
}
