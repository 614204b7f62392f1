import { randomUUID } from "node:crypto";
import { AppError, conflict, notFound } from "../../lib/errors.ts";
import type { Actor, RequestMeta } from "../../lib/request-context.ts";
import type { Storage } from "../../lib/storage/index.ts";
import { hashToken, newToken } from "../../lib/tokens.ts";
import { changeLineTotalCents, changeOrderTotals, type ChangeOrderDraftInput, type ChangeOrderLine, type ChangeOrderSnapshot } from "../../../shared/change-orders/index.ts";
import type { ChangeOrderSignInput } from "../../../shared/change-orders/schemas.ts";
import { esignDisclosure } from "../../../shared/proposals/disclosures.ts";
import { verifyPageUrl } from "../../../shared/proposals/public-paths.ts";
import type { CatalogRepository } from "../catalog/catalog.repository.ts";
import type { ProposalJobs } from "../proposals/proposal-jobs.ts";
import { sha256Hex, snapshotSha256 as canonicalSha256 } from "../proposals/proposal-snapshot.ts";
import type { ProposalRow, ProposalsRepository, Tenant } from "../proposals/proposals.repository.ts";
import { checkedSignaturePng } from "../proposals/signature-image.ts";
import type { ChangeOrderRow, ChangeOrdersRepository } from "./change-orders.repository.ts";

const invalid = (field: string, message: string) => new AppError("invalid-input", `Please check ${field}: ${message}`, 400, { [field]: message });
const UNIT_WORDS = { each: "each", "linear-ft": "ft", hour: "h" } as const;
const LINK_PROBLEM = "This change order link is not valid. Please check the link or contact the company that sent it.";

export interface ChangeOrdersDeps {
  repo: ChangeOrdersRepository;
  proposals: ProposalsRepository;
  catalog: CatalogRepository;
  storage: Storage;
  jobs: Pick<ProposalJobs, "nudgeMail">;
  renderPdf: (input: { snapshot: ChangeOrderSnapshot; acceptance: ChangeOrderRow["acceptance"]; verifyUrl: string }) => Promise<Buffer>;
  now: () => Date;
  appOrigin: () => string;
}

/** What staff see of a change order: never the token hash or storage keys. */
export function presentChangeOrder(c: ChangeOrderRow) {
  return {
    id: c.id, projectId: c.projectId, proposalId: c.proposalId, number: c.number, status: c.status, reason: c.reason, lines: c.lines, photoIds: c.photoIds,
    totals: c.snapshot?.totals ?? null, previousTotalCents: c.snapshot?.previousTotalCents ?? null, newTotalCents: c.snapshot?.newTotalCents ?? null,
    snapshotSha256: c.snapshotSha256, pdfSha256: c.pdfSha256, signerName: c.acceptance?.signerName ?? null, declineReason: c.declineReason,
    sentAt: c.sentAt, decidedAt: c.decidedAt, version: c.version, createdAt: c.createdAt, updatedAt: c.updatedAt,
  };
}
export type PresentedChangeOrder = ReturnType<typeof presentChangeOrder>;

/** The signed total of the accepted option, from the revision's frozen snapshot. */
function signedOptionTotal(p: ProposalRow): { totalCents: number; taxRateBasisPoints: number; optionName: string } {
  const option = p.snapshot?.options.find((o) => o.id === p.acceptance?.optionId);
  if (!option?.price) throw conflict("The signed option has no price, so a change order can't be priced against it.", "no-signed-price");
  return { totalCents: option.price.totalCents, taxRateBasisPoints: option.price.taxRateBasisPoints, optionName: option.name };
}

export function createChangeOrdersService(deps: ChangeOrdersDeps) {
  const { repo } = deps;

  async function requireAccepted(tenant: Tenant, proposalId: string): Promise<ProposalRow> {
    const p = await deps.proposals.find(tenant, proposalId);
    if (!p) throw notFound("That proposal");
    if (p.status !== "accepted") throw conflict("Change orders are for accepted work; until the homeowner accepts, revise the proposal instead.", "not-accepted");
    return p;
  }
  async function requireChangeOrder(tenant: Tenant, id: string): Promise<ChangeOrderRow> {
    const c = await repo.find(tenant, id);
    if (!c) throw notFound("That change order");
    return c;
  }

  /** The job as it stands: the signed option's total and every signed change order after it. */
  async function history(tenant: Tenant, p: ProposalRow) {
    const signed = signedOptionTotal(p);
    const orders = await repo.listForProposal(tenant, p.id);
    const signedOrders = orders.filter((o) => o.status === "signed");
    const currentTotalCents = signed.totalCents + signedOrders.reduce((sum, o) => sum + (o.snapshot?.totals.changeCents ?? 0), 0);
    return {
      original: { proposalId: p.id, revision: p.revision, optionName: signed.optionName, totalCents: signed.totalCents, acceptedAt: p.decidedAt },
      changeOrders: orders.map(presentChangeOrder),
      current: { totalCents: currentTotalCents, signedChangeOrders: signedOrders.map((o) => o.number) },
    };
  }

  async function linesFrom(actor: Actor, input: ChangeOrderDraftInput["lines"]): Promise<ChangeOrderLine[]> {
    const catalog = await deps.catalog.all(actor);
    return input.map((l, i) => {
      const item = l.catalogItemId ? catalog.find((c) => c.id === l.catalogItemId) : null;
      if (l.catalogItemId && !item) throw invalid(`lines.${i}.catalogItemId`, "That catalog item is not in your catalog.");
      const description = l.description || item?.name;
      if (!description) throw invalid(`lines.${i}.description`, "Describe the work, or choose a catalog item.");
      const unitPriceCents = l.unitPriceCents ?? item?.sellPriceCents;
      if (unitPriceCents === undefined || unitPriceCents === null) throw invalid(`lines.${i}.unitPriceCents`, "Give a price for this line.");
      return {
        id: l.id, action: l.action, description, quantity: l.quantity, unit: l.unit || (item ? UNIT_WORDS[item.unit] : "each"), unitPriceCents,
        item: item ? { id: item.id, sku: item.sku, name: item.name, kind: item.kind, unit: item.unit, soldInLengthFt: item.soldInLengthFt } : null,
      };
    });
  }

  async function checkPhotos(actor: Actor, projectId: string, ids: string[]) {
    const found = await deps.proposals.photosFor(actor, projectId, ids);
    ids.forEach((id, i) => {
      if (!found.some((f) => f.id === id)) throw invalid(`photoIds.${i}`, "That photo is not part of this project.");
    });
  }

  /** The change order behind a homeowner's token; a wrong or revoked token answers 404 in plain words. */
  async function byToken(token: string): Promise<ChangeOrderRow> {
    const c = token.length >= 20 && token.length <= 100 ? await repo.findByTokenHash(hashToken(token)) : null;
    if (!c?.snapshot) throw new AppError("not-found", LINK_PROBLEM, 404);
    return c;
  }

  const publicView = (c: ChangeOrderRow) => ({
    changeOrder: { number: c.number, status: c.status, sentAt: c.sentAt, decidedAt: c.decidedAt, signerName: c.acceptance?.signerName ?? null, isPdfReady: Boolean(c.pdfKey), pdfSha256: c.pdfSha256 },
    snapshot: { ...c.snapshot!, photos: c.snapshot!.photos.map(({ id, caption }) => ({ id, caption })) },
  });

  return {
    /** The job's history: the signed proposal, its change orders and the current total (nothing before acceptance). */
    async listForProposal(actor: Actor, proposalId: string) {
      const p = await deps.proposals.find(actor, proposalId);
      if (!p) throw notFound("That proposal");
      if (p.status !== "accepted") return { original: null, changeOrders: [], current: null };
      return history(actor, p);
    },

    async create(actor: Actor, proposalId: string, input: ChangeOrderDraftInput, meta: RequestMeta) {
      const p = await requireAccepted(actor, proposalId);
      await checkPhotos(actor, p.projectId, input.photoIds);
      const row = await repo.insertDraft(actor, {
        projectId: p.projectId, proposalId: p.id, reason: input.reason, lines: await linesFrom(actor, input.lines), photoIds: input.photoIds, createdBy: actor.userId,
      }, { event: "change-order-drafted", userId: actor.userId, ip: meta.ip, userAgent: meta.userAgent, detail: {} });
      if (!row) throw conflict("Another change order was drafted at the same moment; reload and try again.", "stale-version");
      return presentChangeOrder(row);
    },

    async update(actor: Actor, id: string, input: ChangeOrderDraftInput & { version: number }) {
      const c = await requireChangeOrder(actor, id);
      if (c.status !== "draft") throw conflict("This change order was sent, so it is read-only. Draft a new change order instead.", "accepted-locked");
      await checkPhotos(actor, c.projectId, input.photoIds);
      const updated = await repo.updateDraft(actor, id, input.version, { reason: input.reason, lines: await linesFrom(actor, input.lines), photoIds: input.photoIds });
      if (!updated) throw new AppError("stale-version", "Someone else saved or sent this change order since you opened it.", 409, {}, { current: presentChangeOrder(await requireChangeOrder(actor, id)) });
      return presentChangeOrder(updated);
    },

    /** Freezes and prices it, draws its PDF, makes the homeowner's link and mails it once. */
    async send(actor: Actor, id: string, meta: RequestMeta) {
      const c = await requireChangeOrder(actor, id);
      if (c.status !== "draft") throw conflict("This change order was already sent. Draft a new one to change anything else.", "already-sent");
      const p = await requireAccepted(actor, c.proposalId);
      const customerEmail = p.snapshot!.customer.email;
      if (!customerEmail) throw new AppError("customer-email-missing", "The customer has no e-mail address; add one to the customer first.", 400);
      const [company, seller, photos, { current }] = await Promise.all([
        deps.proposals.company(actor), deps.proposals.user(actor, actor.userId), deps.proposals.photosFor(actor, c.projectId, c.photoIds), history(actor, p),
      ]);
      const signed = signedOptionTotal(p);
      const totals = changeOrderTotals(c.lines, signed.taxRateBasisPoints);
      const now = deps.now();
      const snapshot: ChangeOrderSnapshot = {
        formatVersion: 1, changeOrderId: c.id, number: c.number, proposalId: p.id, proposalRevision: p.revision, optionName: signed.optionName, preparedAt: now.toISOString(),
        company: { name: company?.name ?? p.snapshot!.company.name, licenseNumber: company?.licenseNumber ?? null, addressLine: company?.addressLine ?? null, phone: company?.phone ?? null, email: company?.email ?? null },
        customer: { name: p.snapshot!.customer.name, firstName: p.snapshot!.customer.firstName },
        site: p.snapshot!.site,
        seller: { name: seller?.name ?? actor.name, email: seller?.email ?? null },
        reason: c.reason,
        lines: c.lines.map((l) => ({ ...l, totalCents: changeLineTotalCents(l) })),
        totals, previousTotalCents: current.totalCents, newTotalCents: current.totalCents + totals.changeCents,
        photos: c.photoIds.map((pid) => photos.find((ph) => ph.id === pid)).filter((x): x is NonNullable<typeof x> => Boolean(x)).map(({ id: pid, caption, storageKey, contentType }) => ({ id: pid, caption, storageKey, contentType })),
        esign: { version: p.snapshot!.esign.version, text: esignDisclosure(p.snapshot!.company.name) },
      };
      const snapshotSha = canonicalSha256(snapshot as never);
      // A one-page document: drawn here so its hash is on record before the e-mail can go out.
      const pdf = await deps.renderPdf({ snapshot, acceptance: null, verifyUrl: verifyPageUrl(deps.appOrigin()) });
      const pdfSha = sha256Hex(pdf);
      const pdfKey = `change-orders/${actor.companyId}/${pdfSha}.pdf`;
      await deps.storage.put(pdfKey, pdf, "application/pdf");
      const { token, tokenHash } = newToken();
      const tokenId = randomUUID();
      const link = `${deps.appOrigin()}/c/${token}`;
      const dedupeKey = `change-order:${c.id}`;
      const change = totals.changeCents;
      const sent = await repo.markSent(actor, id, c.version, { snapshot, snapshotSha256: snapshotSha, pdfKey, pdfSha256: pdfSha, tokenHash, tokenId, sentAt: now, sentBy: actor.userId },
        { event: "change-order-sent", userId: actor.userId, ip: meta.ip, userAgent: meta.userAgent, tokenId, snapshotSha256: snapshotSha, pdfSha256: pdfSha, detail: { changeOrderId: c.id, number: c.number, to: customerEmail, changeCents: change } },
        {
          dedupeKey, kind: "change-order",
          message: {
            companyId: actor.companyId, to: customerEmail,
            subject: `Change order ${c.number} for your attic work — ${snapshot.company.name}`,
            text: `Hello ${snapshot.customer.firstName},\n\n${snapshot.seller.name} of ${snapshot.company.name} asks you to approve a change to the work you signed for ${snapshot.site.address}.\n\nWhy: ${c.reason}\n\nIt changes the job total by ${change < 0 ? "−" : "+"}$${(Math.abs(change) / 100).toFixed(2)}, from $${(snapshot.previousTotalCents / 100).toFixed(2)} to $${(snapshot.newTotalCents / 100).toFixed(2)}. Nothing changes unless you sign it.\n\nRead and sign (or decline) here: ${link}\n\n${snapshot.company.name}${snapshot.company.phone ? `\n${snapshot.company.phone}` : ""}`,
          },
        });
      if (!sent) throw conflict("This change order changed or was sent meanwhile. Reload it.", "already-sent");
      await deps.jobs.nudgeMail(dedupeKey).catch(() => {});
      return { changeOrder: presentChangeOrder(sent), link };
    },

    async pdf(tenant: Tenant, id: string) {
      const c = await requireChangeOrder(tenant, id);
      return openPdf(c);
    },

    // ——— the homeowner's link ———

    async view(token: string) {
      return publicView(await byToken(token));
    },

    async publicPdf(token: string) {
      return openPdf(await byToken(token));
    },

    async sign(token: string, input: ChangeOrderSignInput, meta: RequestMeta) {
      const c = await byToken(token);
      if (c.status !== "sent") throw conflict(c.status === "signed" ? "You have already signed this change order." : "This change order was declined, so it can no longer be signed. Contact the company for a new one.", `already-${c.status}`);
      if (input.consent.consentTextVersion !== c.snapshot!.esign.version) throw invalid("consent.consentTextVersion", "The consent text has changed; please reload the page and read it again.");
      const png = input.signature.drawnPngDataUrl ? await checkedSignaturePng(input.signature.drawnPngDataUrl, "signature.drawnPngDataUrl") : null;
      const pngSha256 = png ? sha256Hex(png) : null;
      const pngKey = png ? `change-orders/${c.companyId}/${c.id}/signature-${pngSha256}.png` : null;
      if (png && pngKey) await deps.storage.put(pngKey, png, "image/png");
      const now = deps.now();
      const acceptance = { signerName: input.signerName, signature: { typed: input.signature.typed ?? null, pngStorageKey: pngKey, pngSha256 }, consentTextVersion: input.consent.consentTextVersion, signedAt: now.toISOString(), ip: meta.ip, userAgent: meta.userAgent };
      const signed = await repo.decide(c, c.id, { status: "signed", acceptance, decidedAt: now }, {
        event: "change-order-signed", at: now, ip: meta.ip, userAgent: meta.userAgent, tokenId: c.tokenId, snapshotSha256: c.snapshotSha256, pdfSha256: c.pdfSha256, consentTextVersion: input.consent.consentTextVersion,
        detail: { changeOrderId: c.id, number: c.number, signerName: input.signerName, signature: png ? "drawn" : "typed", signaturePngSha256: pngSha256, esignConsent: true, changeCents: c.snapshot!.totals.changeCents },
      });
      if (!signed) throw conflict("This change order was answered meanwhile; please reload the page.", "stale-version");
      return publicView(signed);
    },

    async decline(token: string, reason: string | null | undefined, meta: RequestMeta) {
      const c = await byToken(token);
      if (c.status !== "sent") throw conflict(c.status === "signed" ? "You have already signed this change order." : "This change order was already declined.", `already-${c.status}`);
      const now = deps.now();
      const declined = await repo.decide(c, c.id, { status: "declined", declineReason: reason ?? null, decidedAt: now }, {
        event: "change-order-declined", at: now, ip: meta.ip, userAgent: meta.userAgent, tokenId: c.tokenId, snapshotSha256: c.snapshotSha256, pdfSha256: c.pdfSha256,
        detail: { changeOrderId: c.id, number: c.number, reason: reason ?? null },
      });
      if (!declined) throw conflict("This change order was answered meanwhile; please reload the page.", "stale-version");
      return publicView(declined);
    },
  };

  async function openPdf(c: ChangeOrderRow) {
    if (!c.pdfKey || !c.pdfSha256) throw new AppError("pdf-not-ready", "A change order's PDF is made when it is sent.", 409);
    const object = await deps.storage.get(c.pdfKey);
    if (!object) throw new AppError("pdf-not-ready", "The PDF is not available.", 409);
    return { object, sha256: c.pdfSha256, filename: `change-order-${c.number}.pdf` };
  }
}
export type ChangeOrdersService = ReturnType<typeof createChangeOrdersService>;
