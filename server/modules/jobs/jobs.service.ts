import { randomUUID } from "node:crypto";
import { AppError, conflict, notFound } from "../../lib/errors.ts";
import type { Actor, RequestMeta } from "../../lib/request-context.ts";
import { readAll, type Storage } from "../../lib/storage/storage.ts";
import { hashToken, newToken } from "../../lib/tokens.ts";
import { applyChangeOrders } from "../../../shared/change-orders/crew-list.ts";
import type { ChangeOrderLine } from "../../../shared/change-orders/types.ts";
import { checklistProblems, completionReport, installChecklist, JOB_DEFERRAL, jobCautions, type CompletionReport, type JobMoney, type JobPhoto, type JobSheetItem } from "../../../shared/jobs/index.ts";
import type { AssignJobInput } from "../../../shared/jobs/schemas.ts";
import { can } from "../../../shared/schemas/roles.ts";
import type { ProposalRow, ProposalsRepository, Tenant } from "../proposals/proposals.repository.ts";
import type { ProposalJobs } from "../proposals/proposal-jobs.ts";
import { sha256Hex } from "../proposals/proposal-snapshot.ts";
import { processPhoto } from "../photos/photo-processing.ts";
import type { JobPhotoRow, JobsRepository } from "./jobs.repository.ts";
import type { JobRow } from "../../db/schema/index.ts";

export interface JobsDeps {
  repo: JobsRepository;
  proposals: Pick<ProposalsRepository, "company">;
  storage: Storage;
  jobs: Pick<ProposalJobs, "nudgeMail">;
  renderReport: (report: CompletionReport, photos: { caption: string | null; bytes: Buffer }[]) => Promise<Buffer>;
  /** The deposit's payment flow, for the balance (payments.service.ts); absent where no payments run (the demo seed). */
  payments?: { startBalanceCheckout: (p: ProposalRow, input: { amountCents: number; back: string }, meta: RequestMeta) => Promise<{ url: string; amountCents: number; currency: string }> };
  now: () => Date;
  appOrigin: () => string;
}

const REPORT_LINK_PROBLEM = "This completion report link is not valid. Please check the link or contact the company that did the work.";
const invalid = (field: string, message: string) => new AppError("invalid-input", message, 400, { [field]: message });

/** A crew member reads and works only its own jobs; anyone else's id answers 404 as a foreign one would. */
const crewFilter = (actor: Actor) => (actor.role === "crew" ? actor.userId : null);

function jobPhoto(jobId: string, p: JobPhotoRow): JobPhoto {
  return { id: p.id, caption: p.caption, url: `/api/jobs/${jobId}/photos/${p.id}`, thumbUrl: `/api/jobs/${jobId}/photos/${p.id}?thumb=1` };
}

/** Map search for the address: an open map, no key, opens the phone's browser or map app. */
export const mapLinkFor = (address: string) => `https://www.openstreetmap.org/search?query=${encodeURIComponent(address)}`;

export function createJobsService(deps: JobsDeps) {
  const { repo } = deps;

  async function requireJob(actor: Actor, id: string): Promise<JobRow> {
    const job = await repo.find(actor, id, crewFilter(actor));
    if (!job) throw notFound("That job");
    return job;
  }

  /** The signed scope as it stands: the accepted option, the crew plan frozen at sending, and the signed change orders. */
  async function signedScope(tenant: Tenant, proposal: ProposalRow) {
    const optionId = proposal.acceptance?.optionId;
    const option = proposal.snapshot?.options.find((o) => o.id === optionId);
    const plan = optionId ? proposal.crewPlans?.[optionId] : null;
    if (!option || !plan) throw conflict("This proposal's signed option has no crew list, so no job sheet can be made from it.", "no-crew-plan");
    const changes = await repo.signedChanges(tenant, proposal.id);
    const listed = changes.map((c) => ({ number: c.number, lines: c.lines }));
    const materials = applyChangeOrders(plan.materials, listed);
    const checklist = installChecklist(plan.materials, listed, materials.items);
    const cautions = jobCautions(materials, { hasPoweredFanAfter: option.hasPoweredFan });
    return { option, plan, changes, materials, checklist, cautions };
  }

  async function money(tenant: Tenant, proposal: ProposalRow, changes: Awaited<ReturnType<JobsRepository["signedChanges"]>>, signedTotalCents: number): Promise<JobMoney> {
    const changeOrdersCents = changes.reduce((sum, c) => sum + (c.snapshot?.totals.changeCents ?? 0), 0);
    const paidCents = await repo.paidCents(tenant, proposal.id);
    const jobTotalCents = signedTotalCents + changeOrdersCents;
    return { signedTotalCents, changeOrdersCents, jobTotalCents, paidCents, balanceCents: Math.max(0, jobTotalCents - paidCents) };
  }

  async function checklistState(tenant: Tenant, job: JobRow, items: ReturnType<typeof installChecklist>): Promise<JobSheetItem[]> {
    const [ticks, photos] = await Promise.all([repo.ticks(tenant, job.id), repo.crewPhotos(tenant, job.projectId)]);
    return items.map((item) => {
      const tick = ticks.find((t) => t.itemId === item.id);
      return { ...item, isTicked: Boolean(tick), tickedAt: tick?.tickedAt.toISOString() ?? null, photos: photos.filter((p) => p.jobItemId === item.id).map((p) => jobPhoto(job.id, p)) };
    });
  }

  const withoutPrice = (line: ChangeOrderLine) => ({ id: line.id, action: line.action, description: line.description, quantity: line.quantity, unit: line.unit });

  async function requireOpenItem(actor: Actor, jobId: string, itemId: string) {
    const job = await requireJob(actor, jobId);
    if (job.status === "completed") throw conflict("This job was completed; its checklist is kept as it was.", "job-completed");
    const proposal = await repo.acceptedProposal(actor, job.projectId);
    if (!proposal) throw conflict("This job's proposal is no longer accepted.", "not-accepted");
    const scope = await signedScope(actor, proposal);
    const item = scope.checklist.find((i) => i.id === itemId);
    if (!item) throw notFound("That checklist item");
    return { job, item };
  }

  return {
    /** Throws 404 unless the caller may work on the job (its crew member, or the office). */
    async sheetAccess(actor: Actor, id: string) {
      await requireJob(actor, id);
    },

    /** People who can be given a job: active crew members of the company. */
    crewMembers: (actor: Actor) => repo.crewMembers(actor),

    /** The jobs the caller sees and, for those who assign work, the sold projects still without a crew. */
    async list(actor: Actor) {
      const rows = await repo.list(actor, crewFilter(actor));
      const jobs = rows.map((r) => ({ ...r, completedAt: r.completedAt?.toISOString() ?? null }));
      return { jobs, awaitingCrew: can(actor.role, "jobs:assign") ? await repo.awaitingCrew(actor) : [] };
    },

    /** The project's job, for the office's project page (null before one is assigned). */
    async forProject(actor: Actor, projectId: string) {
      if (!(await repo.project(actor, projectId))) throw notFound("That project");
      const job = await repo.forProject(actor, projectId);
      if (!job) return { job: null };
      return { job: { id: job.id, status: job.status, scheduledFor: job.scheduledFor, crewUserId: job.crewUserId, crewName: await repo.crewName(actor, job.crewUserId), completedAt: job.completedAt?.toISOString() ?? null } };
    },

    async assign(actor: Actor, projectId: string, input: AssignJobInput) {
      if (!(await repo.project(actor, projectId))) throw notFound("That project");
      const proposal = await repo.acceptedProposal(actor, projectId);
      if (!proposal) throw conflict("Only accepted work can be given to a crew: the homeowner has not accepted a proposal for this project yet.", "not-accepted");
      const crew = await repo.activeCrew(actor, input.crewUserId);
      if (!crew) throw invalid("crewUserId", "Choose an active crew member of your company.");
      const job = await repo.assign(actor, { projectId, proposalId: proposal.id, crewUserId: crew.id, scheduledFor: input.scheduledFor, assignedBy: actor.userId }, deps.now());
      if (!job) throw conflict("This job was already completed, so it can't be reassigned.", "job-completed");
      return { job: { id: job.id, status: job.status, scheduledFor: job.scheduledFor, crewUserId: job.crewUserId, crewName: crew.name, completedAt: null } };
    },

    /** The crew's sheet: where, who, what was signed, what to load, what to check, what can hurt. */
    async sheet(actor: Actor, id: string) {
      const job = await requireJob(actor, id);
      const [project, proposal, company] = await Promise.all([repo.project(actor, job.projectId), repo.acceptedProposal(actor, job.projectId), deps.proposals.company(actor)]);
      if (!project || !proposal?.snapshot) throw notFound("That job");
      const scope = await signedScope(actor, proposal);
      const isPriced = actor.role !== "crew" || company?.settings.isCrewShownPrices === true;
      const [customer, surveyPhotos, checklist] = await Promise.all([repo.customer(actor, project.customerId), repo.surveyPhotos(actor, job.projectId), checklistState(actor, job, scope.checklist)]);
      const snapshot = proposal.snapshot;
      return {
        job: { id: job.id, status: job.status, scheduledFor: job.scheduledFor, completedAt: job.completedAt?.toISOString() ?? null, crewName: await repo.crewName(actor, job.crewUserId), version: job.version },
        site: { title: project.title, address: project.siteAddress, mapUrl: mapLinkFor(project.siteAddress) },
        homeowner: { name: customer?.name ?? snapshot.customer.name, phone: customer?.phone ?? snapshot.customer.phone, email: customer?.email ?? snapshot.customer.email },
        scope: {
          optionName: scope.option.name, revision: proposal.revision, acceptedAt: proposal.decidedAt?.toISOString() ?? null, lines: scope.option.scope,
          changeOrders: scope.changes.map((c) => ({ number: c.number, reason: c.reason, signedAt: c.decidedAt?.toISOString() ?? null, lines: c.lines.map((l) => (isPriced ? { ...withoutPrice(l), unitPriceCents: l.unitPriceCents } : withoutPrice(l))) })),
        },
        materials: scope.materials.items.map((m) => ({ catalogItemId: m.catalogItemId, name: m.name, sku: m.sku, quantity: m.quantity, unit: m.unit, buyCount: m.buyCount, buyUnit: m.buyUnit })),
        before: snapshot.before.map((s) => ({ spaceId: s.spaceId, name: s.name, picture: s.picture, description: s.pictureDescription })),
        after: scope.option.after.map((s) => ({ spaceId: s.spaceId, name: s.name, picture: s.picture, description: s.pictureDescription, summary: s.analysis?.summary ?? null })),
        photos: surveyPhotos.map((p) => jobPhoto(job.id, p)),
        cautions: scope.cautions,
        deferral: JOB_DEFERRAL,
        checklist,
        money: isPriced ? await money(actor, proposal, scope.changes, scope.option.price?.totalCents ?? 0) : null,
        report: job.status === "completed" ? { pdfUrl: `/api/jobs/${job.id}/report.pdf` } : null,
      };
    },

    async setTick(actor: Actor, jobId: string, itemId: string, isDone: boolean) {
      const { job, item } = await requireOpenItem(actor, jobId, itemId);
      if (isDone) {
        const photos = (await repo.crewPhotos(actor, job.projectId)).filter((p) => p.jobItemId === item.id);
        if (item.isAirflowChange && photos.length === 0) {
          throw new AppError("photo-required", "This step changes the attic's airflow: add a photo of the finished work before ticking it.", 409);
        }
        await repo.tick(actor, job.id, item.id, actor.userId, deps.now());
      } else {
        await repo.untick(actor, job.id, item.id);
      }
      return this.sheet(actor, job.id);
    },

    async addPhoto(actor: Actor, jobId: string, itemId: string, file: { buffer: Buffer } | undefined, caption: string | null) {
      const { job, item } = await requireOpenItem(actor, jobId, itemId);
      if (!file) throw invalid("file", "Attach the photo in the form field named file.");
      const processed = await processPhoto(file.buffer);
      const id = randomUUID();
      const storageKey = `photos/${actor.companyId}/${id}.${processed.main.ext}`;
      const thumbKey = `photos/${actor.companyId}/${id}-thumb.${processed.thumb.ext}`;
      await deps.storage.put(storageKey, processed.main.bytes, processed.main.contentType);
      await deps.storage.put(thumbKey, processed.thumb.bytes, processed.thumb.contentType);
      const row = await repo.insertPhoto(actor, {
        id, projectId: job.projectId, jobItemId: item.id, caption: caption || `After: ${item.text.slice(0, 120)}`, storageKey, thumbKey,
        contentType: processed.main.contentType, sizeBytes: processed.main.bytes.byteLength, width: processed.main.width, height: processed.main.height, uploadedBy: actor.userId,
      });
      return jobPhoto(job.id, row);
    },

    async openPhoto(actor: Actor, jobId: string, photoId: string, isThumb: boolean) {
      const job = await requireJob(actor, jobId);
      const photo = await repo.photo(actor, job.projectId, photoId);
      if (!photo) throw notFound("That photo");
      const object = await deps.storage.get(isThumb ? photo.thumbKey : photo.storageKey);
      if (!object) throw new AppError("file-missing", "The file of this photo is missing from storage.", 404);
      return { ...object, contentType: isThumb ? "image/webp" : photo.contentType };
    },

    /**
     * The crew marks the job done: every item ticked and every airflow item photographed; the
     * report is drawn, the project is completed and the homeowner's e-mail is queued in one
     * transaction (the outbox row of decision 13).
     */
    async complete(actor: Actor, id: string, meta: RequestMeta) {
      const job = await requireJob(actor, id);
      if (job.status === "completed") throw conflict("This job is already completed.", "job-completed");
      const proposal = await repo.acceptedProposal(actor, job.projectId);
      if (!proposal?.snapshot) throw conflict("This job's proposal is no longer accepted.", "not-accepted");
      const scope = await signedScope(actor, proposal);
      const items = await checklistState(actor, job, scope.checklist);
      const problems = checklistProblems(scope.checklist, items.filter((i) => i.isTicked).map((i) => ({ itemId: i.id, photoCount: i.photos.length })));
      if (problems.length > 0) {
        const fields = Object.fromEntries(problems.map((p) => [`checklist.${p.itemId}`, p.problem === "needs-photo" ? "Add a photo of the finished work." : "Not ticked yet."]));
        throw new AppError("checklist-incomplete", `${problems.length} checklist item${problems.length === 1 ? " is" : "s are"} not done yet.`, 409, fields);
      }
      const [project, company, crewName] = await Promise.all([repo.project(actor, job.projectId), deps.proposals.company(actor), repo.crewName(actor, job.crewUserId)]);
      const customer = project ? await repo.customer(actor, project.customerId) : null;
      const now = deps.now();
      const jobMoney = await money(actor, proposal, scope.changes, scope.option.price?.totalCents ?? 0);
      const report = completionReport({ snapshot: proposal.snapshot, option: scope.option, items, changes: scope.changes, money: jobMoney, completedAt: now, crewName: crewName ?? actor.name,
        company: { name: company?.name ?? proposal.snapshot.company.name, phone: company?.phone ?? null, email: company?.email ?? null, addressLine: company?.addressLine ?? null, licenseNumber: company?.licenseNumber ?? null, warrantyTerms: company?.settings.warrantyTerms ?? null } });
      const reportPhotos = await Promise.all(items.flatMap((i) => i.photos.slice(0, 1)).slice(0, 6).map(async (p) => {
        const row = await repo.photo(actor, job.projectId, p.id);
        const object = row ? await deps.storage.get(row.storageKey) : null;
        return object ? { caption: p.caption, bytes: await readAll(object) } : null;
      }));
      const pdf = await deps.renderReport(report, reportPhotos.filter((p): p is NonNullable<typeof p> => p !== null));
      const pdfSha = sha256Hex(pdf);
      const pdfKey = `completion-reports/${actor.companyId}/${pdfSha}.pdf`;
      await deps.storage.put(pdfKey, pdf, "application/pdf");
      const { token, tokenHash } = newToken();
      const link = `${deps.appOrigin()}/done/${token}`;
      const to = customer?.email ?? proposal.snapshot.customer.email;
      const dedupeKey = `job-completed:${job.id}`;
      const mail = to ? {
        dedupeKey, kind: "job-completed",
        message: {
          companyId: actor.companyId, to,
          subject: `Your attic work is finished — ${report.company.name}`,
          text: [
            `Hello ${proposal.snapshot.customer.firstName},`, "",
            `${report.company.name} finished the work at ${report.site.address} on ${report.completedOn}.`, "",
            ...report.installed.map((l) => `- ${l}`), "",
            report.balanceCents > 0 ? `Balance due: $${(report.balanceCents / 100).toFixed(2)} — you can pay it from the page below.` : "Nothing is left to pay.", "",
            `The completion report, with photos of the finished work and the warranty, is attached and on this page: ${link}`, "",
            report.company.name, ...(report.company.phone ? [report.company.phone] : []),
          ].join("\n"),
          attachments: [{ filename: "completion-report.pdf", path: `data:application/pdf;base64,${pdf.toString("base64")}`, contentType: "application/pdf" }],
        },
      } : null;
      const done = await repo.complete(actor, job, { completedAt: now, completedBy: actor.userId, reportTokenHash: tokenHash, reportPdfKey: pdfKey, reportPdfSha256: pdfSha },
        { event: "job-completed", at: now, userId: actor.userId, ip: meta.ip, userAgent: meta.userAgent, pdfSha256: pdfSha, detail: { jobId: job.id, to: to ?? null, items: items.length } }, mail);
      if (!done) throw conflict("This job changed or was completed meanwhile. Reload it.", "job-completed");
      if (mail) await deps.jobs.nudgeMail(dedupeKey).catch(() => {});
      return { sheet: await this.sheet(actor, job.id), isHomeownerEmailed: Boolean(mail), link };
    },

    async reportPdf(actor: Actor, id: string) {
      const job = await requireJob(actor, id);
      return openReport(job);
    },

    // ——— the homeowner's link ———

    async publicReport(token: string) {
      const job = await byToken(token);
      const proposal = await repo.acceptedProposal(job, job.projectId);
      if (!proposal?.snapshot) throw new AppError("not-found", REPORT_LINK_PROBLEM, 404);
      const scope = await signedScope(job, proposal);
      const company = await deps.proposals.company(job);
      const items = await checklistState(job, job, scope.checklist);
      const report = completionReport({ snapshot: proposal.snapshot, option: scope.option, items, changes: scope.changes, money: await money(job, proposal, scope.changes, scope.option.price?.totalCents ?? 0), completedAt: job.completedAt ?? deps.now(), crewName: (await repo.crewName(job, job.crewUserId)) ?? "",
        company: { name: company?.name ?? proposal.snapshot.company.name, phone: company?.phone ?? null, email: company?.email ?? null, addressLine: company?.addressLine ?? null, licenseNumber: company?.licenseNumber ?? null, warrantyTerms: company?.settings.warrantyTerms ?? null } });
      const photos = items.flatMap((i) => i.photos.map((p) => ({ id: p.id, caption: p.caption, url: `/api/public/completion/${token}/photos/${p.id}` })));
      return { report, photos, isPdfReady: Boolean(job.reportPdfKey), proposalToken: null as string | null };
    },

    /** The balance of completed work, worked out here and paid through the deposit's checkout. */
    async publicBalanceCheckout(token: string, meta: RequestMeta) {
      const job = await byToken(token);
      const proposal = await repo.acceptedProposal(job, job.projectId);
      if (!proposal?.snapshot) throw new AppError("not-found", REPORT_LINK_PROBLEM, 404);
      if (!deps.payments) throw new AppError("payments-not-configured", "Online payment is not set up. Please contact the company to pay the balance.", 503);
      const scope = await signedScope(job, proposal);
      const due = await money(job, proposal, scope.changes, scope.option.price?.totalCents ?? 0);
      if (due.balanceCents <= 0) throw new AppError("nothing-due", "Nothing is left to pay for this job. Thank you.", 409);
      return deps.payments.startBalanceCheckout(proposal, { amountCents: due.balanceCents, back: `${deps.appOrigin()}/done/${encodeURIComponent(token)}` }, meta);
    },

    async publicPdf(token: string) {
      return openReport(await byToken(token));
    },

    async publicPhoto(token: string, photoId: string) {
      const job = await byToken(token);
      const photo = await repo.photo(job, job.projectId, photoId);
      if (!photo?.jobItemId) throw notFound("That photo");
      const object = await deps.storage.get(photo.storageKey);
      if (!object) throw notFound("That photo");
      return { ...object, contentType: photo.contentType };
    },
  };

  async function byToken(token: string): Promise<JobRow> {
    const job = token.length >= 20 && token.length <= 100 ? await repo.findByReportTokenHash(hashToken(token)) : null;
    if (!job || job.status !== "completed") throw new AppError("not-found", REPORT_LINK_PROBLEM, 404);
    return job;
  }

  async function openReport(job: JobRow) {
    if (!job.reportPdfKey || !job.reportPdfSha256) throw new AppError("pdf-not-ready", "The completion report is made when the crew completes the job.", 409);
    const object = await deps.storage.get(job.reportPdfKey);
    if (!object) throw new AppError("pdf-not-ready", "The report is not available.", 409);
    return { object, sha256: job.reportPdfSha256, filename: "completion-report.pdf" };
  }
}
export type JobsService = ReturnType<typeof createJobsService>;
