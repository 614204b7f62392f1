/**
 * The demo's sales story, one project per stage, each backed by what its stage implies, made
 * through the same services the API calls (so the demo can never hold what the app would refuse):
 *
 *   Quillan reroof         lead        no survey yet
 *   Varnum attic           surveyed    two saved options, no proposal (seed.ts)
 *   Brennock attic         proposed    options and a proposal sent, not yet opened
 *   Farrowby ranch         proposed    a proposal the homeowner has opened
 *   Castellane attic       sold        accepted with a typed signature; the crew's list released, the
 *                                      job given to the crew member (Ansel Brightwater) for tomorrow
 *   Whitcombe rental       lost        the homeowner declined, with a reason
 *   Varnum garage          completed   accepted earlier, the work done
 *
 * Each project gets its proposal only while it has none, so what someone changes in the demo stays.
 * No job runs here: the server's recovery sweep renders the PDFs and mails the links when it starts.
 */
import path from "node:path";
import { and, eq } from "drizzle-orm";
import type { Database } from "../../server/db/client.ts";
import { jobs, projects, proposals, users } from "../../server/db/schema/index.ts";
import type { Actor } from "../../server/lib/request-context.ts";
import { createLocalStorage } from "../../server/lib/storage/index.ts";
import { createCatalogRepository } from "../../server/modules/catalog/catalog.repository.ts";
import { createOptionsRepository } from "../../server/modules/options/options.repository.ts";
import { createOptionsService } from "../../server/modules/options/options.service.ts";
import { createProjectsRepository } from "../../server/modules/projects/projects.repository.ts";
import type { ProposalJobs } from "../../server/modules/proposals/proposal-jobs.ts";
import { createProposalsRepository } from "../../server/modules/proposals/proposals.repository.ts";
import { createProposalsService } from "../../server/modules/proposals/proposals.service.ts";
import { createSpacesRepository } from "../../server/modules/spaces/spaces.repository.ts";
import { createJobsRepository } from "../../server/modules/jobs/jobs.repository.ts";
import { createJobsService } from "../../server/modules/jobs/jobs.service.ts";
import { renderCompletionPdf } from "../../server/modules/proposals/pdf/completion-document.tsx";
import { ESIGN_CONSENT_VERSION } from "../../shared/proposals/disclosures.ts";
import type { DesignOptionInput } from "../../shared/schemas/options.ts";
import type { ProjectStatus } from "../../shared/schemas/projects.ts";
import { projectRoot } from "./paths.ts";

type Outcome = "sent" | "viewed" | "accepted" | "declined";

interface StoryStep {
  title: string;
  outcome: Outcome;
  /** The project's status afterwards (accepting sets "sold"; the later stages are set here). */
  finalStatus: ProjectStatus;
  coverNote: string;
  /** For a customer with no e-mail on file: the address the salesperson types when sending. */
  recipientEmail?: string;
  signerName?: string;
  declineReason?: string;
}

export const PROPOSAL_STORY: StoryStep[] = [
  {
    title: "Brennock attic — balanced ridge and soffit", outcome: "sent", finalStatus: "proposed",
    coverNote: "Your attic already breathes well. These are two ways to add a little margin before the reroof.",
  },
  {
    title: "Farrowby ranch — L-shaped attic and garage", outcome: "viewed", finalStatus: "proposed",
    coverNote: "Thank you for showing us both attics. Clearing the eaves in the house matters most; the garage needs a way for air to leave.",
  },
  {
    title: "Castellane attic — bath fan into attic", outcome: "accepted", finalStatus: "sold", signerName: "June Castellane",
    coverNote: "The frost on the roof deck comes from the bathroom fan. Ducting it outside is part of each option.",
  },
  {
    title: "Whitcombe rental — turbine replacement", outcome: "declined", finalStatus: "lost", recipientEmail: "amos.whitcombe@example.com",
    declineReason: "We will replace the turbines ourselves for now.",
    coverNote: "As discussed on the phone, here are the options for the rental.",
  },
  {
    title: "Varnum garage — soffit repair", outcome: "accepted", finalStatus: "completed", signerName: "Odette Varnum",
    coverNote: "New soffit intake for the garage, as we discussed during the house survey.",
  },
];

const META = { ip: "127.0.0.1", userAgent: "eavesight-demo-seed" };
// Every job call resolves and does nothing; the server's sweep picks the queued work up.
const noJobs = new Proxy({}, { get: () => async () => true }) as ProposalJobs;

export async function seedProposalStory(db: Database, companyIds: Record<string, string>): Promise<void> {
  const companyId = companyIds.tallgrass!;
  const [sales] = await db.select().from(users).where(and(eq(users.companyId, companyId), eq(users.email, "sales@tallgrass.example")));
  if (!sales) return;
  const actor: Actor = { userId: sales.id, companyId, role: "sales", email: sales.email, name: sales.name };
  const projectsRepo = createProjectsRepository(db);
  const spaces = createSpacesRepository(db);
  const storage = createLocalStorage(path.join(projectRoot, process.env.STORAGE_DIR ?? ".var/files"));
  const catalog = createCatalogRepository(db);
  const optionsRepo = createOptionsRepository(db);
  const optionsService = createOptionsService({ repo: optionsRepo, projects: projectsRepo, spaces, catalog });
  const proposalsService = createProposalsService({
    repo: createProposalsRepository(db), projects: projectsRepo, spaces, options: optionsRepo, catalog,
    storage, jobs: noJobs,
    now: () => new Date(), appOrigin: () => process.env.APP_ORIGIN ?? `http://127.0.0.1:${process.env.PORT ?? 3000}`,
  });
  if (!(await proposalsService.sellerSignature(actor)).signature) await proposalsService.setSellerSignature(actor, { typed: sales.name });

  for (const step of PROPOSAL_STORY) {
    const [project] = await db.select({ id: projects.id }).from(projects).where(and(eq(projects.companyId, companyId), eq(projects.title, step.title)));
    if (!project) continue;
    const [hasProposal] = await db.select({ id: proposals.id }).from(proposals).where(eq(proposals.projectId, project.id)).limit(1);
    if (hasProposal) continue;

    let options = await optionsRepo.listForProject(actor, project.id);
    if (options.length === 0) {
      for (const input of await generatedOptions(optionsService, actor, project.id)) await optionsService.create(actor, project.id, input);
      options = await optionsRepo.listForProject(actor, project.id);
    }
    if (options.length === 0) throw new Error(`the demo project "${step.title}" got no design options from the generator`);

    const draft = await proposalsService.create(actor, project.id, { optionIds: options.map((o) => o.id) }, META);
    await proposalsService.update(actor, draft.id, { version: draft.version, coverNote: step.coverNote }, META);
    const { link } = await proposalsService.send(actor, draft.id, META, step.recipientEmail ? { recipientEmail: step.recipientEmail } : {});
    const token = link.split("/p/")[1]!;
    if (step.outcome !== "sent") await proposalsService.view(token, META);
    if (step.outcome === "accepted") {
      await proposalsService.accept(token, {
        optionId: options[0]!.id, signerName: step.signerName!, signature: { typed: step.signerName! },
        consent: { esign: true, consentTextVersion: ESIGN_CONSENT_VERSION },
      }, META);
    }
    if (step.outcome === "declined") await proposalsService.decline(token, step.declineReason ?? null, META);
    const current = await projectsRepo.find(actor, project.id);
    if (current && current.status !== step.finalStatus) await db.update(projects).set({ status: step.finalStatus }).where(eq(projects.id, project.id));
  }
  await seedCrewJob(db, actor, storage);
}

/** The sold project goes to the demo's crew member for tomorrow, so signing in as the crew shows a job. */
async function seedCrewJob(db: Database, actor: Actor, storage: ReturnType<typeof createLocalStorage>): Promise<void> {
  const [crew] = await db.select().from(users).where(and(eq(users.companyId, actor.companyId), eq(users.email, "crew@tallgrass.example")));
  const [project] = await db.select({ id: projects.id }).from(projects).where(and(eq(projects.companyId, actor.companyId), eq(projects.title, "Castellane attic — bath fan into attic")));
  if (!crew || !project) return;
  const [hasJob] = await db.select({ id: jobs.id }).from(jobs).where(eq(jobs.projectId, project.id)).limit(1);
  if (hasJob) return;
  const service = createJobsService({
    repo: createJobsRepository(db), proposals: createProposalsRepository(db), storage, jobs: noJobs, renderReport: renderCompletionPdf,
    now: () => new Date(), appOrigin: () => process.env.APP_ORIGIN ?? `http://127.0.0.1:${process.env.PORT ?? 3000}`,
  });
  const tomorrow = new Date(Date.now() + 24 * 3_600_000).toISOString().slice(0, 10);
  await service.assign(actor, project.id, { crewUserId: crew.id, scheduledFor: tomorrow });
}

/** Up to two of the generator's options for the project: the first of each kind, every space in one option. */
async function generatedOptions(service: ReturnType<typeof createOptionsService>, actor: Actor, projectId: string): Promise<DesignOptionInput[]> {
  const { proposals: generated } = await service.generate(actor, projectId, {});
  const byType = new Map<string, typeof generated>();
  for (const g of generated) byType.set(g.type, [...(byType.get(g.type) ?? []), g]);
  const picked = [...byType.values()].slice(0, 2);
  return picked.map((group) => {
    const first = group[0]!;
    const seen = new Set<string>();
    const perSpace = group.filter((g) => (seen.has(g.spaceId) ? false : (seen.add(g.spaceId), true)));
    return { ...first.option, isKept: true, spaces: perSpace.flatMap((g) => g.option.spaces) } as DesignOptionInput;
  });
}
