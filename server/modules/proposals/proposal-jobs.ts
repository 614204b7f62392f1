import sharp from "sharp";
import type PgBoss from "pg-boss";
import type { Logger } from "../../lib/logger.ts";
import { createQueues, type Jobs } from "../../lib/jobs.ts";
import type { OutgoingEmail } from "../../lib/mailer.ts";
import { readAll, type Storage } from "../../lib/storage/index.ts";
import { isDueToExpire, reminderDecision } from "../../../shared/proposals/lifecycle.ts";
import { coolingOffNotice, thirdBusinessDayAfter } from "../../../shared/proposals/disclosures.ts";
import { formatCents } from "../../../shared/pricing/index.ts";
import type { ProposalSnapshot } from "../../../shared/proposals/types.ts";
import { verifyPageUrl } from "../../../shared/proposals/public-paths.ts";
import { renderProposalPdfOffThread as renderProposalPdf } from "./pdf/render-off-thread.ts";
import { sha256Hex } from "./proposal-snapshot.ts";
import type { CompanySettings, ProposalsRepository, Tenant } from "./proposals.repository.ts";

export const PROPOSAL_QUEUES = {
  render: "proposal-render",
  renderSigned: "proposal-render-signed",
  reminder: "proposal-reminder",
  sweep: "proposal-sweep",
  mail: "proposal-mail",
} as const;

const RENDER_RETRIES = 3;

interface RenderJob { companyId: string; proposalId: string; snapshotSha256: string }
interface SignedJob { companyId: string; proposalId: string }
/** `tokenId`: the link the reminder carries; a job queued before it was recorded has none. */
interface ReminderJob { companyId: string; proposalId: string; to: string; link: string; tokenId?: string }
interface MailJob { dedupeKey: string }

export const pdfKey = (companyId: string, sha256: string) => `proposals/${companyId}/${sha256}.pdf`;

async function dataUrlOf(storage: Storage, key: string, contentType: string): Promise<string | null> {
  const object = await storage.get(key);
  if (!object) return null;
  return `data:${contentType};base64,${(await readAll(object)).toString("base64")}`;
}

/**
 * An image as the PDF draws it: scaled to fit `box` (pixels; the page shows photos about 3.3 in wide,
 * so 800 px is ~240 dpi) and re-encoded, so a proposal's size depends on how many images it has, not
 * on the phone's camera. That bound is what caps the public PDF check (uploads.ts).
 */
async function pdfImageDataUrl(storage: Storage, key: string, box: { widthPx: number; heightPx: number }, as: "jpeg" | "png"): Promise<string | null> {
  const object = await storage.get(key);
  if (!object) return null;
  const image = sharp(await readAll(object)).resize({ width: box.widthPx, height: box.heightPx, fit: "inside", withoutEnlargement: true });
  const bytes = as === "png" ? await image.png({ compressionLevel: 9 }).toBuffer() : await image.flatten({ background: "#ffffff" }).jpeg({ quality: 78 }).toBuffer();
  return `data:image/${as};base64,${bytes.toString("base64")}`;
}
export const PDF_PHOTO_BOX = { widthPx: 800, heightPx: 800 } as const;
export const PDF_LOGO_BOX = { widthPx: 600, heightPx: 300 } as const;

/**
 * Background work of proposals on pg-boss: rendering PDFs (with retries), the signed copy and
 * its e-mails, reminders and the expiry sweep. A request only enqueues; any server process
 * running workers picks the job up.
 */
export function createProposalJobs(deps: {
  jobs: Jobs; repo: ProposalsRepository; storage: Storage; logger: Logger; now: () => Date; appOrigin: () => string;
  /** JOBS_RECOVERY_SECONDS in ms: the outbox lease, and how long work may look stalled before it is re-queued. */
  recoveryAfterMs: number;
}) {
  const { repo, storage, logger, recoveryAfterMs } = deps;
  const boss: PgBoss = deps.jobs.boss;
  // Leases and stall detection are between processes, so they use the wall clock, never the app's
  // (which tests move by days).
  const wallClock = () => new Date();

  /** Queues an outbox e-mail's job; the outbox row, not the job, decides whether it is sent. */
  async function nudgeMail(dedupeKey: string): Promise<void> {
    await ready;
    await boss.send(PROPOSAL_QUEUES.mail, { dedupeKey } satisfies MailJob, { retryLimit: 5, retryDelay: 2, retryBackoff: true });
  }

  /** Puts the e-mail in the outbox and queues it: a second call with the same key sends nothing. */
  async function deliverOnce(tenant: Tenant, proposalId: string, dedupeKey: string, kind: string, message: OutgoingEmail): Promise<boolean> {
    if (!(await repo.queueMail(tenant, proposalId, { dedupeKey, kind, message }))) return false;
    // Should this fail, the row stays undelivered and the recovery sweep queues it again.
    await nudgeMail(dedupeKey).catch((err: unknown) => logger.warn({ err, dedupeKey }, "e-mail job not queued; the recovery sweep will"));
    return true;
  }

  /** Sends one outbox e-mail under a lease, then marks it delivered: exactly once unless the relay dies mid-reply. */
  async function runMail(data: MailJob): Promise<void> {
    const message = await repo.leaseMail(data.dedupeKey, wallClock(), recoveryAfterMs);
    if (!message) return; // delivered already, or another worker is sending it
    try {
      const messageId = await deps.jobs.deliverNow(message);
      await repo.markMailDelivered(data.dedupeKey, wallClock());
      logger.info({ dedupeKey: data.dedupeKey, messageId }, "proposal e-mail sent");
    } catch (err) {
      await repo.releaseMailLease(data.dedupeKey).catch(() => {});
      throw err;
    }
  }

  /**
   * Picks up work a dead server left behind: outbox e-mails never sent, renders queued or running
   * past the recovery time. Every handler is idempotent, so a job queued twice does no harm.
   */
  async function recover(): Promise<{ mails: number; renders: number }> {
    const now = wallClock();
    const before = new Date(now.getTime() - recoveryAfterMs);
    const mails = await repo.mailsToRecover(now, before);
    for (const { dedupeKey } of mails) await nudgeMail(dedupeKey);
    const renders = await repo.rendersToRecover(now, before);
    for (const r of renders) if (r.snapshotSha256) await enqueueRender({ companyId: r.companyId }, r.id, r.snapshotSha256);
    const signed = await repo.signedRendersToRecover(now, before);
    for (const r of signed) await enqueueSignedRender({ companyId: r.companyId }, r.id);
    const counts = { mails: mails.length, renders: renders.length + signed.length };
    if (counts.mails || counts.renders) logger.warn(counts, "re-queued stalled proposal work");
    return counts;
  }

  async function assets(snapshot: ProposalSnapshot) {
    const logo = snapshot.company.logo;
    const logoDataUrl = logo ? await pdfImageDataUrl(storage, logo.storageKey, PDF_LOGO_BOX, logo.contentType === "image/png" ? "png" : "jpeg") : null;
    const photoDataUrls: Record<string, string> = {};
    for (const photo of snapshot.photos) {
      // Every stored photo format (JPEG, PNG, WebP) is drawn as a JPEG of the PDF's size.
      const url = await pdfImageDataUrl(storage, photo.storageKey, PDF_PHOTO_BOX, "jpeg");
      if (url) photoDataUrls[photo.id] = url;
    }
    return { logoDataUrl, photoDataUrls };
  }

  async function runRender(data: RenderJob, isLastAttempt: boolean): Promise<void> {
    const tenant = { companyId: data.companyId };
    const row = await repo.find(tenant, data.proposalId);
    // A newer snapshot was queued meanwhile: that job draws it.
    if (!row?.snapshot || row.snapshotSha256 !== data.snapshotSha256) return;
    if (row.pdfSnapshotSha256 === data.snapshotSha256 && row.pdfKey) return;
    await repo.update(tenant, row.id, { renderStatus: "rendering", renderAttempts: row.renderAttempts + 1, renderUpdatedAt: deps.now() });
    try {
      const bytes = await renderProposalPdf({ snapshot: row.snapshot, ...(await assets(row.snapshot)), verifyUrl: verifyPageUrl(deps.appOrigin()) });
      const sha256 = sha256Hex(bytes);
      await storage.put(pdfKey(row.companyId, sha256), bytes, "application/pdf");
      const done = await repo.update(tenant, row.id, {
        pdfKey: pdfKey(row.companyId, sha256), pdfSha256: sha256, pdfSnapshotSha256: data.snapshotSha256,
        renderStatus: "ready", renderError: null, renderUpdatedAt: deps.now(),
      });
      if (done && done.status !== "draft") {
        await repo.addEvent(tenant, row.id, { event: "pdf-created", snapshotSha256: data.snapshotSha256, pdfSha256: sha256, tokenId: row.tokenId, detail: { bytes: bytes.length } });
      }
    } catch (err) {
      const message = err instanceof Error ? err.message.slice(0, 500) : "unknown error";
      await repo.update(tenant, row.id, { renderStatus: isLastAttempt ? "failed" : "queued", renderError: message, renderUpdatedAt: deps.now() });
      throw err;
    }
  }

  async function runSignedRender(data: SignedJob, isLastAttempt: boolean): Promise<void> {
    const tenant = { companyId: data.companyId };
    const row = await repo.find(tenant, data.proposalId);
    if (!row?.snapshot || !row.acceptance || !row.snapshotSha256) return;
    if (!row.signedPdfKey) {
      await repo.update(tenant, row.id, { signedRenderStatus: "rendering", signedRenderUpdatedAt: wallClock() });
      try {
        const a = row.acceptance;
        const signatureUrl = a.signature.pngStorageKey ? await dataUrlOf(storage, a.signature.pngStorageKey, "image/png") : null;
        const events = await repo.events(tenant, row.id);
        const signDate = a.acceptedAt.slice(0, 10);
        const snapshot: ProposalSnapshot = row.snapshot.coolingOff.isEnabled
          ? { ...row.snapshot, coolingOff: { isEnabled: true, notice: coolingOffNotice({ companyName: row.snapshot.company.name, companyAddress: row.snapshot.company.addressLine, transactionDate: signDate, cancelByDate: thirdBusinessDayAfter(signDate) }) } }
          : row.snapshot;
        const bytes = await renderProposalPdf({
          snapshot, ...(await assets(row.snapshot)), verifyUrl: verifyPageUrl(deps.appOrigin()),
          signed: {
            acceptance: a, signaturePngDataUrl: signatureUrl, originalPdfSha256: row.pdfSha256, snapshotSha256: row.snapshotSha256,
            events: events.map((e) => ({ event: e.event, at: e.at.toISOString(), ip: e.ip, userAgent: e.userAgent })),
          },
        });
        const sha256 = sha256Hex(bytes);
        await storage.put(pdfKey(row.companyId, sha256), bytes, "application/pdf");
        // "ready" only once the e-mails below are in the outbox: a crash in between leaves the render
        // looking stalled, and the recovery sweep comes back here (skipping the drawing).
        await repo.update(tenant, row.id, { signedPdfKey: pdfKey(row.companyId, sha256), signedPdfSha256: sha256, signedRenderError: null, signedRenderUpdatedAt: wallClock() });
        await repo.addEvent(tenant, row.id, { event: "signed-pdf-created", snapshotSha256: row.snapshotSha256, pdfSha256: sha256, tokenId: row.tokenId, detail: { originalPdfSha256: row.pdfSha256 } });
      } catch (err) {
        await repo.update(tenant, row.id, { signedRenderStatus: isLastAttempt ? "failed" : "queued", signedRenderError: err instanceof Error ? err.message.slice(0, 500) : "unknown error", signedRenderUpdatedAt: wallClock() });
        throw err;
      }
    }
    const fresh = (await repo.find(tenant, row.id))!;
    const pdf = await storage.get(fresh.signedPdfKey!);
    if (!pdf) throw new Error("signed PDF missing from storage");
    const bytes = await readAll(pdf);
    const snap = fresh.snapshot!;
    const option = snap.options.find((o) => o.id === fresh.acceptance!.optionId);
    const total = option?.price ? formatCents(option.price.totalCents) : "";
    if (snap.customer.email) {
      await deliverOnce(tenant, fresh.id, `signed-copy:${fresh.id}`, "signed-copy", {
        companyId: fresh.companyId, to: snap.customer.email,
        subject: `Your signed proposal from ${snap.company.name}`,
        text: `Hello ${snap.customer.firstName},\n\nThank you for accepting "${option?.name ?? "your option"}"${total ? ` (${total})` : ""}. Your signed copy is attached as a PDF; please keep it.\n\nIts SHA-256 fingerprint is ${fresh.signedPdfSha256}.\n\n${snap.company.name}${snap.company.phone ? `\n${snap.company.phone}` : ""}`,
        attachments: [{ filename: `signed-proposal-rev-${fresh.revision}.pdf`, path: `data:application/pdf;base64,${bytes.toString("base64")}`, contentType: "application/pdf" }],
      });
    }
    const sellerId = fresh.sellerUserId ?? fresh.createdBy;
    const seller = sellerId ? await repo.user(tenant, sellerId) : null;
    if (seller) {
      await deliverOnce(tenant, fresh.id, `accepted-notice:${fresh.id}`, "accepted-notice", {
        companyId: fresh.companyId, to: seller.email,
        subject: `Accepted: ${snap.customer.name} signed option "${option?.name ?? ""}"`,
        text: `${fresh.acceptance!.signerName} accepted option "${option?.name ?? ""}"${total ? ` for ${total}` : ""} on ${fresh.acceptance!.acceptedAt} (UTC).\nThe project is now marked sold.\n\n${deps.appOrigin()}/projects/${fresh.projectId}`,
      });
    }
    if (fresh.signedRenderStatus !== "ready") await repo.update(tenant, fresh.id, { signedRenderStatus: "ready", signedRenderUpdatedAt: wallClock() });
  }

  async function runReminder(data: ReminderJob): Promise<void> {
    const tenant = { companyId: data.companyId };
    const [row, company] = await Promise.all([repo.find(tenant, data.proposalId), repo.company(tenant)]);
    if (!row || !company) return;
    // The link was replaced since the reminder was queued: never mail a link that no longer works.
    if (data.tokenId && data.tokenId !== row.tokenId) return;
    const decision = reminderDecision(row, deps.now(), (company.settings as CompanySettings).reminderDays ?? null);
    if (!decision.shouldSend) return;
    const sent = await deliverOnce(tenant, row.id, `reminder:${row.id}`, "reminder", {
      companyId: row.companyId, to: data.to,
      subject: `A reminder: your proposal from ${company.name}`,
      text: `Hello ${row.snapshot?.customer.firstName ?? ""},\n\nYour attic ventilation proposal from ${company.name} is waiting for you. It is valid until ${row.validUntil}.\n\nOpen it here: ${data.link}\n\n${company.name}`,
    });
    if (sent) {
      await repo.update(tenant, row.id, { reminderSentAt: deps.now() });
      await repo.addEvent(tenant, row.id, { event: "reminded", tokenId: row.tokenId, snapshotSha256: row.snapshotSha256, pdfSha256: row.pdfSha256, detail: { reason: decision.reason } });
    }
  }

  /** Marks every sent revision past its link's expiry as expired, with an event. Time passed in. */
  async function sweep(now: Date): Promise<number> {
    const due = await repo.dueToExpire(now);
    let count = 0;
    for (const { id, companyId } of due) {
      const tenant = { companyId };
      const row = await repo.find(tenant, id);
      if (!row || !isDueToExpire(row, now)) continue;
      const updated = await repo.update(tenant, id, { status: "expired", decidedAt: now });
      if (updated) {
        count++;
        await repo.addEvent(tenant, id, { event: "expired", at: now, tokenId: row.tokenId, snapshotSha256: row.snapshotSha256, pdfSha256: row.pdfSha256 });
      }
    }
    return count;
  }

  type Meta = { data: unknown; retryCount: number; retryLimit: number };
  const lastAttempt = (job: Meta) => job.retryCount >= job.retryLimit;

  const ready = (async () => {
    await createQueues(boss, Object.values(PROPOSAL_QUEUES));
    if (!deps.jobs.runsWorkers) return;
    await boss.work<RenderJob>(PROPOSAL_QUEUES.render, { pollingIntervalSeconds: 0.5, includeMetadata: true }, async (batch) => {
      for (const job of batch) await runRender(job.data, lastAttempt(job));
    });
    await boss.work<SignedJob>(PROPOSAL_QUEUES.renderSigned, { pollingIntervalSeconds: 0.5, includeMetadata: true }, async (batch) => {
      for (const job of batch) await runSignedRender(job.data, lastAttempt(job));
    });
    await boss.work<ReminderJob>(PROPOSAL_QUEUES.reminder, { pollingIntervalSeconds: 2 }, async (batch) => {
      for (const job of batch) await runReminder(job.data);
    });
    await boss.work<MailJob>(PROPOSAL_QUEUES.mail, { pollingIntervalSeconds: 0.5 }, async (batch) => {
      for (const job of batch) await runMail(job.data);
    });
    await boss.work(PROPOSAL_QUEUES.sweep, { pollingIntervalSeconds: 5 }, async () => {
      const expired = await sweep(deps.now());
      if (expired) logger.info({ expired }, "proposals expired");
    });
    // Every 15 minutes: expiry is a matter of a day, and the sweep is one indexed query.
    await boss.schedule(PROPOSAL_QUEUES.sweep, "*/15 * * * *");
    // Recovery runs in every worker process, at once (a restart after a crash) and then a few
    // times per recovery period; the sweep's UPDATE … RETURNING hands each stalled row to one process.
    const recoverLogged = () => recover().catch((err: unknown) => logger.warn({ err }, "recovery sweep failed; it runs again shortly"));
    void recoverLogged();
    const timer = setInterval(recoverLogged, Math.max(1_000, Math.round(recoveryAfterMs / 3)));
    timer.unref();
    boss.once("stopped", () => clearInterval(timer));
  })().catch((err: unknown) => {
    logger.error({ err }, "proposal job queues could not be set up");
    throw err;
  });
  // Awaited by every enqueue; unhandled here only so a failed start is logged once.
  ready.catch(() => {});

  const retry = { retryLimit: RENDER_RETRIES, retryDelay: 2, retryBackoff: true };
  async function enqueueRender(tenant: Tenant, proposalId: string, snapshotSha256: string) {
    await ready;
    await boss.send(PROPOSAL_QUEUES.render, { companyId: tenant.companyId, proposalId, snapshotSha256 } satisfies RenderJob, { ...retry, singletonKey: `${proposalId}:${snapshotSha256}` });
  }
  async function enqueueSignedRender(tenant: Tenant, proposalId: string) {
    await ready;
    await boss.send(PROPOSAL_QUEUES.renderSigned, { companyId: tenant.companyId, proposalId } satisfies SignedJob, { ...retry, singletonKey: `signed:${proposalId}` });
  }

  return {
    ready,
    deliverOnce,
    nudgeMail,
    recover,
    sweep,
    runReminder,
    enqueueRender,
    enqueueSignedRender,
    async scheduleReminder(tenant: Tenant, proposalId: string, to: string, link: string, afterDays: number, tokenId: string) {
      await ready;
      await boss.send(PROPOSAL_QUEUES.reminder, { companyId: tenant.companyId, proposalId, to, link, tokenId } satisfies ReminderJob, { startAfter: Math.round(afterDays * 86_400), retryLimit: 3, singletonKey: `reminder:${proposalId}` });
    },
  };
}
export type ProposalJobs = ReturnType<typeof createProposalJobs>;
