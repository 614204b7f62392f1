/**
 * Proposal PDF: the demo proposal (Varnum attic, both saved options) as the send path freezes it,
 * rendered in this one process by the function the render job calls, WARMUP_RENDERS + 500 times.
 * Prints the median and p95 render time, and RSS / heap before and after the 500 (each also after
 * a forced GC), with a checkpoint every 100 renders so steady growth (a leak) shows as a trend.
 *
 * Between renders the loop gives the event loop one turn, as the render worker does (it reads and
 * writes the database between jobs): react-pdf's reconciler lets go of a finished document only in
 * a `scheduler` task, which runs on setImmediate. A last phase renders BACK_TO_BACK_RENDERS with no
 * turn between them, to show what a loop that never yields would keep.
 *
 *   npm run bench -- pdf                  (a throwaway database, via scripts/tasks/bench.ts)
 *   node --import tsx bench/pdf-bench.ts  (a database of its own in the test cluster, dropped after)
 */
import { spawnSync } from "node:child_process";
import { mkdtemp, rm } from "node:fs/promises";
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
import { renderProposalPdf, type RenderInput } from "../server/modules/proposals/pdf/render-pdf.tsx";
import { FAN_AND_RIDGE_TITLE } from "../scripts/lib/seed.ts";
import { demoDatabase } from "./demo-database.ts";

const WARMUP_RENDERS = 5;
const RENDERS = 500;
const CHECKPOINT_EVERY = 100;
const BACK_TO_BACK_RENDERS = 25;

// The server renders under NODE_ENV=production (npm start), which picks React's production
// build when React is first loaded; a forced GC separates live memory from garbage not yet
// collected. Both need a fresh process, so this one starts itself again with them.
if (process.env.NODE_ENV !== "production" || !globalThis.gc) {
  const child = spawnSync(process.execPath, [...process.execArgv, "--expose-gc", fileURLToPath(import.meta.url)], { stdio: "inherit", env: { ...process.env, NODE_ENV: "production" } });
  process.exit(child.status ?? 1);
}
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

const storageDir = await mkdtemp(path.join(os.tmpdir(), "eavesight-pdf-bench-"));
const demo = await demoDatabase("pdf");
try {
  const snapshot = await sentDemoSnapshot(demo.databaseUrl, storageDir);
  // The demo has no logo or photos, so the job's assets step would hand over exactly these.
  const input: RenderInput = { snapshot, logoDataUrl: null, photoDataUrls: {} };

  const start = memory("at start (after GC)", { isAfterGc: true });
  const firstT0 = performance.now();
  const pdfBytes = (await renderProposalPdf(input)).length;
  const firstRenderMs = performance.now() - firstT0;
  console.log(`proposal PDF, demo proposal "${FAN_AND_RIDGE_TITLE}" as sent (${snapshot.options.length} options, ${(pdfBytes / 1024).toFixed(0)} KiB), ${RENDERS} renders in one process (Node ${process.version}, NODE_ENV=production, ${os.cpus().length} cores, load average ${os.loadavg()[0]!.toFixed(2)} at the start):`);
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
  const after = memory(`after ${RENDERS} renders`);
  const afterGc = memory(`after ${RENDERS} renders (after GC)`, { isAfterGc: true });

  for (let i = 0; i < BACK_TO_BACK_RENDERS; i++) await renderProposalPdf(input);
  const backToBack = memory(`+ ${BACK_TO_BACK_RENDERS} back-to-back, no turn (after GC)`, { isAfterGc: true });
  await eventLoopTurn();
  const backToBackReleased = memory(`  then one event-loop turn (after GC)`, { isAfterGc: true });

  renderMs.sort((a, b) => a - b);
  const at = (q: number) => renderMs[Math.min(renderMs.length - 1, Math.floor(renderMs.length * q))]!;
  console.log(`  first render (fonts, modules cold) ${firstRenderMs.toFixed(0)} ms; load average ${os.loadavg()[0]!.toFixed(2)} at the end`);
  console.log(`  render  median ${at(0.5).toFixed(1)} ms   p95 ${at(0.95).toFixed(1)} ms   min ${renderMs[0]!.toFixed(1)} ms   max ${renderMs.at(-1)!.toFixed(1)} ms   (${RENDERS} renders in ${loopSeconds.toFixed(1)} s)`);
  console.log("  memory                                         rss MiB   heapUsed MiB   external MiB   arrayBuffers MiB");
  for (const m of [start, afterWarmup, afterWarmupGc, ...checkpoints, after, afterGc, backToBack, backToBackReleased]) {
    console.log(`  ${m.label.padEnd(45)} ${m.rssMiB.toFixed(1).padStart(8)} ${m.heapUsedMiB.toFixed(1).padStart(14)} ${m.externalMiB.toFixed(1).padStart(14)} ${m.arrayBuffersMiB.toFixed(1).padStart(18)}`);
  }
  const growthPerHundredHeapMiB = (afterGc.heapUsedMiB - checkpoints[0]!.heapUsedMiB) / checkpoints.length;
  console.log(`  growth over the ${RENDERS}: rss ${(afterGc.rssMiB - afterWarmupGc.rssMiB).toFixed(1)} MiB, heapUsed ${(afterGc.heapUsedMiB - afterWarmupGc.heapUsedMiB).toFixed(1)} MiB (both after GC); heapUsed ${growthPerHundredHeapMiB.toFixed(2)} MiB per 100 renders between checkpoints`);
  console.log(`  back-to-back renders kept ${((backToBack.heapUsedMiB - afterGc.heapUsedMiB) / BACK_TO_BACK_RENDERS).toFixed(2)} MiB of heap each until the event loop turned; after the turn ${(backToBackReleased.heapUsedMiB - afterGc.heapUsedMiB).toFixed(1)} MiB stayed`);
} finally {
  demo.drop();
  await rm(storageDir, { recursive: true, force: true });
}
