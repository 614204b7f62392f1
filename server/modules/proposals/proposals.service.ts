import { estimateConditionsOf } from "./company.service.ts";
import { randomUUID } from "node:crypto";
import { AppError, conflict, notFound } from "../../lib/errors.ts";
import type { Actor, RequestMeta } from "../../lib/request-context.ts";
import type { Storage } from "../../lib/storage/index.ts";
import { hashToken, newToken } from "../../lib/tokens.ts";
import { linkExpiresAt, linkState, validUntilProblem } from "../../../shared/proposals/lifecycle.ts";
import { scopeOfWork } from "../../../shared/proposals/scope-of-work.ts";
import type { AcceptInput, ProposalPatch, SendInput } from "../../../shared/proposals/schemas.ts";
import type { CrewPlan, ProposalSnapshot, ScopeText, SignatureImage } from "../../../shared/proposals/types.ts";
import { DesignError, materialsList } from "../../../shared/design/index.ts";
import type { CatalogItem } from "../../../shared/schemas/catalog.ts";
import type { ProjectsRepository } from "../projects/projects.repository.ts";
import type { SpacesRepository } from "../spaces/spaces.repository.ts";
import type { OptionRow, OptionsRepository } from "../options/options.repository.ts";
import { pricingSettings, surveyOf } from "../options/options.service.ts";
import type { CatalogRepository } from "../catalog/catalog.repository.ts";
import { buildSnapshot, sha256Hex, snapshotSha256 } from "./proposal-snapshot.ts";
import { isCoolingOffNoticeOn } from "./company.service.ts";
import type { ProposalJobs } from "./proposal-jobs.ts";
import type { CompanySettings, ProposalRow, ProposalsRepository, Tenant } from "./proposals.repository.ts";
import { checkedSignaturePng } from "./signature-image.ts";
import { THUMB_CONTENT_TYPE } from "../photos/photos.service.ts";

const DEFAULT_VALID_DAYS = 30;
/** A second resend within this time sends nothing (a double click; a burst would flood the homeowner's inbox). Common practice. */
export const RESEND_MIN_INTERVAL_MS = 60_000;
const EDITABLE = ["draft"] as const;

const SIGNED_LOCKED = "The homeowner accepted this revision, so it is read-only. To change the signed work, draft a change order.";
const signedLocked = () => conflict(SIGNED_LOCKED, "accepted-locked");

const invalid = (field: string, message: string) => new AppError("invalid-input", `Please check ${field}: ${message}`, 400, { [field]: message });

/**
 * A link the company withdrew or replaced: what happened, in plain words, and nothing of the
 * proposal (410, like a replaced revision). Whatever was signed through it stands.
 */
function linkGone(reason: "revoked" | "replaced"): AppError {
  return reason === "revoked"
    ? new AppError("link-revoked", "The company that sent this link has withdrawn it, so it no longer opens the proposal. If you still need it, contact them: they can send you a new link. Anything you already signed stays as it was.", 410)
    : new AppError("link-replaced", "This link was replaced by a new link, sent to you by e-mail. Please use the link in the newest e-mail from the company, or contact them. Anything you already signed stays as it was.", 410);
}

/** What staff see of a proposal: never the token hash or storage keys. */
export function presentProposal(p: ProposalRow) {
  return {
    id: p.id, projectId: p.projectId, seriesId: p.seriesId, revision: p.revision, status: p.status,
    coverNote: p.coverNote, terms: p.terms, validUntil: p.validUntil, depositRule: p.depositRule,
    optionIds: p.optionIds, photoIds: p.photoIds, findingCodes: p.findingCodes, scopes: p.scopes,
    version: p.version, createdBy: p.createdBy, sellerUserId: p.sellerUserId,
    render: { status: p.renderStatus, attempts: p.renderAttempts, error: p.renderError, pdfSha256: p.pdfSha256, isCurrent: Boolean(p.pdfKey) && p.pdfSnapshotSha256 === p.snapshotSha256, updatedAt: p.renderUpdatedAt },
    signedRender: { status: p.signedRenderStatus, error: p.signedRenderError, pdfSha256: p.signedPdfSha256 },
    snapshotSha256: p.status === "draft" ? null : p.snapshotSha256,
    link: { isActive: Boolean(p.tokenHash) && !p.tokenRevokedAt && !p.supersededBy, expiresAt: p.tokenExpiresAt, revokedAt: p.tokenRevokedAt, tokenId: p.tokenId },
    supersededBy: p.supersededBy,
    acceptance: p.acceptance ? { ...p.acceptance, signature: { typed: p.acceptance.signature.typed, isDrawn: Boolean(p.acceptance.signature.pngStorageKey), pngSha256: p.acceptance.signature.pngSha256 } } : null,
    declineReason: p.declineReason,
    sentAt: p.sentAt, viewedAt: p.viewedAt, decidedAt: p.decidedAt, reminderSentAt: p.reminderSentAt,
    createdAt: p.createdAt, updatedAt: p.updatedAt,
  };
}
export type PresentedProposal = ReturnType<typeof presentProposal>;

/** The homeowner's view of the frozen snapshot: no storage keys, no seller signature image, the customer's first name. */
export function publicView(p: ProposalRow, snapshot: ProposalSnapshot) {
  return {
    proposal: {
      revision: p.revision, status: p.status, validUntil: p.validUntil, sentAt: p.sentAt,
      acceptedOptionId: p.acceptance?.optionId ?? null, decidedAt: p.decidedAt,
      isPdfReady: Boolean(p.pdfKey) && p.pdfSnapshotSha256 === p.snapshotSha256,
      isSignedPdfReady: Boolean(p.signedPdfKey),
      snapshotSha256: p.snapshotSha256,
    },
    company: { name: snapshot.company.name, licenseNumber: snapshot.company.licenseNumber, addressLine: snapshot.company.addressLine, phone: snapshot.company.phone, email: snapshot.company.email, hasLogo: Boolean(snapshot.company.logo) },
    customer: { firstName: snapshot.customer.firstName },
    site: { address: snapshot.site.address },
    seller: { name: snapshot.seller.name, email: snapshot.seller.email },
    coverNote: snapshot.coverNote,
    explanation: snapshot.explanation,
    before: snapshot.before,
    photos: snapshot.photos.map(({ id, caption, findingCode }) => ({ id, caption, findingCode })),
    options: snapshot.options,
    terms: snapshot.terms,
    cautions: snapshot.cautions,
    coolingOff: snapshot.coolingOff,
    esign: snapshot.esign,
  };
}

/** What the public PDF check answers (GET and POST /api/public/verify). */
export type VerifyAnswer =
  | { sha256: string; matches: false }
  | {
      sha256: string; matches: true;
      document: {
        /** "sent": the revision as mailed, before any signature; "signed": the copy with the signature and certificate. */
        kind: "sent" | "signed" | "change-order";
        companyName: string; revision: number; changeOrderNumber: number | null;
        status: string; sentAt: Date | null;
        /** When the homeowner signed (UTC, ISO 8601), or null while unsigned. */
        signedAt: string | null; decidedAt: Date | null;
        /** A newer revision of the proposal replaced this one. */
        isSuperseded: boolean;
      };
    };

export function createProposalsService(deps: {
  repo: ProposalsRepository; projects: ProjectsRepository; spaces: SpacesRepository; options: OptionsRepository; catalog: CatalogRepository;
  storage: Storage; jobs: ProposalJobs; now: () => Date; appOrigin: () => string;
}) {
  const { repo } = deps;
  const today = () => deps.now().toISOString().slice(0, 10);

  async function requireProposal(tenant: Tenant, id: string): Promise<ProposalRow> {
    const p = await repo.find(tenant, id);
    if (!p) throw notFound("That proposal");
    return p;
  }
  async function requireProject(actor: Actor, id: string) {
    const project = await deps.projects.find(actor, id);
    if (!project) throw notFound("That project");
    return project;
  }

  async function optionsOf(actor: Actor, projectId: string, ids: string[], field = "optionIds"): Promise<OptionRow[]> {
    const all = await deps.options.listForProject(actor, projectId);
    const byId = new Map(all.map((o) => [o.id, o]));
    const chosen: OptionRow[] = [];
    ids.forEach((id, i) => {
      const o = byId.get(id);
      if (!o) throw invalid(`${field}.${i}`, "That design option is not part of this project.");
      if (!chosen.includes(o)) chosen.push(o);
    });
    return chosen;
  }

  async function generatedScopes(actor: Actor, projectId: string, options: OptionRow[], catalog?: CatalogItem[]): Promise<Record<string, ScopeText>> {
    const [spaces, items] = await Promise.all([deps.spaces.listForProject(actor, projectId), catalog ? Promise.resolve(catalog) : deps.catalog.all(actor)]);
    return Object.fromEntries(options.map((o) => [o.id, { lines: scopeOfWork(spaces, o.spaces, items, o.laborLines), isEdited: false }]));
  }

  /** The snapshot of what the proposal shows now, from the live project, options, catalog and profile. */
  async function snapshotNow(actor: Actor, p: ProposalRow, seller: { userId: string | null; name: string; email: string | null; signature: SignatureImage | null }): Promise<ProposalSnapshot> {
    const project = await requireProject(actor, p.projectId);
    const [company, customer, spaces, options, catalog, photos] = await Promise.all([
      repo.company(actor), repo.customer(actor, project.customerId), deps.spaces.listForProject(actor, p.projectId),
      deps.options.listForProject(actor, p.projectId), deps.catalog.all(actor), repo.photosFor(actor, p.projectId, p.photoIds),
    ]);
    if (!company || !customer) throw notFound("That project");
    const chosen = p.optionIds.map((id) => options.find((o) => o.id === id)).filter((o): o is OptionRow => Boolean(o));
    if (chosen.length === 0) throw new AppError("no-options", "None of this proposal's design options exist any more; choose at least one.", 400, { optionIds: "Choose at least one design option." });
    const settings = company.settings as CompanySettings;
    return buildSnapshot({
      proposal: { id: p.id, seriesId: p.seriesId, revision: p.revision, validUntil: p.validUntil, coverNote: p.coverNote, terms: p.terms, findingCodes: p.findingCodes, scopes: p.scopes },
      company: {
        name: company.name, licenseNumber: company.licenseNumber, addressLine: company.addressLine, phone: company.phone, email: company.email,
        logo: settings.logoStorageKey && settings.logoContentType && settings.logoSha256 ? { storageKey: settings.logoStorageKey, contentType: settings.logoContentType, sha256: settings.logoSha256 } : null,
        isCoolingOffNoticeEnabled: isCoolingOffNoticeOn(settings),
        estimateConditions: estimateConditionsOf(settings),
      },
      customer, project, spaces, options: chosen, catalog,
      pricing: pricingSettings({ taxRateBasisPoints: company.taxRateBasisPoints, depositRule: p.depositRule ?? company.depositRule ?? null }),
      photos: p.photoIds.map((id) => photos.find((ph) => ph.id === id)).filter((x): x is NonNullable<typeof x> => Boolean(x)),
      seller, now: deps.now(),
    });
  }

  /** The crew's list of each offered option as it stands now; frozen into the proposal when it is sent. */
  async function crewPlansNow(actor: Actor, p: ProposalRow): Promise<Record<string, CrewPlan | null>> {
    const [spaces, options, catalog] = await Promise.all([deps.spaces.listForProject(actor, p.projectId), deps.options.listForProject(actor, p.projectId), deps.catalog.all(actor)]);
    const surveyed = Object.fromEntries(spaces.map((space) => [space.id, surveyOf(space)]));
    return Object.fromEntries(p.optionIds.map((id) => {
      const option = options.find((o) => o.id === id);
      if (!option) return [id, null];
      try {
        return [id, {
          optionId: id, optionName: option.name,
          spaces: spaces.filter((space) => option.spaces.some((s) => s.spaceId === space.id)).map((space) => ({ id: space.id, name: space.name })),
          materials: materialsList(option, catalog, surveyed),
        }];
      } catch (err) {
        if (err instanceof DesignError) return [id, null];
        throw err;
      }
    }));
  }

  /**
   * Whom the homeowner's e-mail goes to: the customer's address, or the one sales typed now, which
   * becomes the customer's address from then on (one record, no second copy to drift).
   */
  async function recipientFor(actor: Actor, p: ProposalRow, input: SendInput, meta: RequestMeta): Promise<{ id: string; email: string }> {
    const project = await requireProject(actor, p.projectId);
    let customer = await repo.customer(actor, project.customerId);
    if (customer && input.recipientEmail && input.recipientEmail !== customer.email) {
      customer = await repo.setCustomerEmail(actor, customer.id, input.recipientEmail);
      await repo.addEvent(actor, p.id, { event: "recipient-changed", userId: actor.userId, ip: meta.ip, userAgent: meta.userAgent, detail: { to: input.recipientEmail } });
    }
    if (!customer?.email) throw new AppError("customer-email-missing", "The customer has no e-mail address: enter it in the send dialog.", 400, { recipientEmail: "Enter the homeowner's e-mail address." });
    return { id: customer.id, email: customer.email };
  }

  /** Why this revision's link can't be sent again or replaced, or null when it can. */
  function linkChangeRefusal(p: ProposalRow): AppError | null {
    if (!p.tokenHash || p.status === "draft") return conflict("This proposal has not been sent, so it has no link yet. Send it first.", "no-link");
    if (p.supersededBy) return new AppError("superseded", "A newer revision of this proposal exists; send that one instead.", 409, {}, { supersededBy: p.supersededBy });
    if (p.status === "declined") return conflict("The homeowner declined this proposal. To offer the work again, change it to make a new revision and send that.", "already-declined");
    // Expiry by date, whatever the revocation: a new link to an expired proposal would not open it either.
    if (p.status === "expired" || linkState({ ...p, tokenRevokedAt: null }, deps.now()) === "expired") {
      return conflict("This proposal has expired. Change it (with a later validity date) to make a new revision and send that.", "expired");
    }
    return null;
  }

  async function checkPhotos(actor: Actor, projectId: string, ids: string[]) {
    const found = await repo.photosFor(actor, projectId, ids);
    ids.forEach((id, i) => {
      if (!found.some((f) => f.id === id)) throw invalid(`photoIds.${i}`, "That photo is not part of this project.");
    });
  }

  return {
    requireProposal,

    async listForProject(actor: Actor, projectId: string) {
      await requireProject(actor, projectId);
      return (await repo.listForProject(actor, projectId)).map(presentProposal);
    },

    async create(actor: Actor, projectId: string, input: { optionIds: string[]; validUntil?: string }, meta: RequestMeta) {
      const project = await requireProject(actor, projectId);
      const options = await optionsOf(actor, project.id, input.optionIds);
      const company = await repo.company(actor);
      const validUntil = input.validUntil ?? new Date(deps.now().getTime() + DEFAULT_VALID_DAYS * 86_400_000).toISOString().slice(0, 10);
      const dateProblem = validUntilProblem(validUntil, today());
      if (dateProblem) throw invalid("validUntil", dateProblem);
      const id = randomUUID();
      const row = await repo.insert(actor, {
        id, projectId, seriesId: id, revision: 1, validUntil, optionIds: options.map((o) => o.id),
        terms: company?.defaultTerms ?? null, scopes: await generatedScopes(actor, projectId, options), createdBy: actor.userId,
      } as never);
      await repo.addEvent(actor, row.id, { event: "created", userId: actor.userId, ip: meta.ip, userAgent: meta.userAgent });
      return presentProposal(row);
    },

    async detail(actor: Actor, id: string) {
      const p = await requireProposal(actor, id);
      const events = await repo.events(actor, id);
      return {
        proposal: presentProposal(p),
        snapshot: p.status === "draft" ? null : p.snapshot,
        events: events.map((e) => ({ id: e.id, event: e.event, at: e.at, userId: e.userId, ip: e.ip, userAgent: e.userAgent, tokenId: e.tokenId, snapshotSha256: e.snapshotSha256, pdfSha256: e.pdfSha256, consentTextVersion: e.consentTextVersion, detail: e.detail })),
      };
    },

    /** A draft changes in place; a sent one makes a new draft revision and is marked superseded. */
    async update(actor: Actor, id: string, input: ProposalPatch, meta: RequestMeta) {
      const p = await requireProposal(actor, id);
      if (p.status === "accepted") throw signedLocked();
      if (p.supersededBy) throw new AppError("superseded", "A newer revision of this proposal exists; edit that one.", 409, {}, { supersededBy: p.supersededBy });
      const { version, ...patch } = input;
      const dateProblem = patch.validUntil === undefined ? null : validUntilProblem(patch.validUntil, today());
      if (dateProblem) throw invalid("validUntil", dateProblem);
      const values: Record<string, unknown> = { ...patch };
      if (patch.optionIds) {
        const options = await optionsOf(actor, p.projectId, patch.optionIds);
        values.optionIds = options.map((o) => o.id);
        const fresh = await generatedScopes(actor, p.projectId, options.filter((o) => !p.scopes[o.id]));
        values.scopes = { ...Object.fromEntries(Object.entries(p.scopes).filter(([k]) => values.optionIds && (values.optionIds as string[]).includes(k))), ...fresh };
      }
      if (patch.scopes) {
        const optionIds = (values.optionIds as string[] | undefined) ?? p.optionIds;
        for (const key of Object.keys(patch.scopes)) if (!optionIds.includes(key)) throw invalid(`scopes.${key}`, "That option is not in this proposal.");
        values.scopes = { ...((values.scopes as Record<string, ScopeText> | undefined) ?? p.scopes), ...Object.fromEntries(Object.entries(patch.scopes).map(([k, lines]) => [k, { lines, isEdited: true }])) };
      }
      if (patch.photoIds) await checkPhotos(actor, p.projectId, patch.photoIds);

      if (p.status === "draft") {
        const updated = await repo.updateIfVersion(actor, id, version, { ...values, renderStatus: p.renderStatus === "ready" ? "none" : p.renderStatus } as never, [...EDITABLE]);
        if (updated) return { proposal: presentProposal(updated), revisedFrom: null };
        const current = await requireProposal(actor, id);
        throw new AppError("stale-version", "Someone else saved this proposal since you opened it.", 409, {}, { current: presentProposal(current) });
      }
      if (p.version !== version) throw new AppError("stale-version", "Someone else saved this proposal since you opened it.", 409, {}, { current: presentProposal(p) });
      const next = await repo.reviseFrom(actor, p, values as never);
      if (!next) {
        const now = await requireProposal(actor, id);
        if (now.status === "accepted") throw signedLocked();
        throw new AppError("stale-version", "This proposal changed meanwhile (revised by someone else, or answered by the homeowner). Reload it.", 409, {}, { current: presentProposal(now) });
      }
      await repo.addEvent(actor, p.id, { event: "superseded", userId: actor.userId, ip: meta.ip, userAgent: meta.userAgent, tokenId: p.tokenId, detail: { supersededBy: next.id, revision: next.revision } });
      await repo.addEvent(actor, next.id, { event: "created", userId: actor.userId, ip: meta.ip, userAgent: meta.userAgent, detail: { revisionOf: p.id } });
      return { proposal: presentProposal(next), revisedFrom: p.id };
    },

    /** Queues a PDF of the draft as it stands now (or of the frozen snapshot of a sent one). */
    async render(actor: Actor, id: string) {
      const p = await requireProposal(actor, id);
      if (p.status !== "draft") {
        if (p.status === "accepted" && p.renderStatus !== "failed") throw signedLocked();
        if (p.renderStatus !== "failed") throw conflict("A sent proposal's PDF is made once, when it is sent.", "already-rendered");
        const updated = await repo.update(actor, id, { renderStatus: "queued", renderError: null, renderUpdatedAt: deps.now() });
        await deps.jobs.enqueueRender(actor, id, p.snapshotSha256!);
        return presentProposal(updated!);
      }
      const creator = p.createdBy ? await repo.user(actor, p.createdBy) : null;
      const snapshot = await snapshotNow(actor, p, { userId: creator?.id ?? null, name: creator?.name ?? actor.name, email: creator?.email ?? null, signature: null });
      const sha = snapshotSha256(snapshot);
      const updated = await repo.update(actor, id, { snapshot, snapshotSha256: sha, renderStatus: "queued", renderError: null, renderAttempts: 0, renderUpdatedAt: deps.now() }, undefined);
      await deps.jobs.enqueueRender(actor, id, sha);
      return presentProposal(updated!);
    },

    async renderStatus(actor: Actor, id: string) {
      return presentProposal(await requireProposal(actor, id)).render;
    },

    async pdf(tenant: Tenant, p: ProposalRow, kind: "original" | "signed" | "latest") {
      const useSigned = kind === "signed" || (kind === "latest" && Boolean(p.signedPdfKey));
      const key = useSigned ? p.signedPdfKey : p.pdfKey;
      const sha = useSigned ? p.signedPdfSha256 : p.pdfSha256;
      if (!key || !sha || (!useSigned && p.pdfSnapshotSha256 !== p.snapshotSha256)) {
        throw new AppError("pdf-not-ready", useSigned ? "The signed PDF is still being prepared; try again in a moment." : "The PDF is not ready yet; render it first or try again in a moment.", 409);
      }
      const object = await deps.storage.get(key);
      if (!object) throw new AppError("pdf-not-ready", "The PDF is not available; render it again.", 409);
      return { object, sha256: sha, filename: `proposal-rev-${p.revision}${useSigned ? "-signed" : ""}.pdf` };
    },

    /** Signs with the seller's saved signature, freezes the snapshot, makes the link and mails it once. */
    async send(actor: Actor, id: string, meta: RequestMeta, input: SendInput = {}) {
      const p = await requireProposal(actor, id);
      if (p.supersededBy) throw new AppError("superseded", "A newer revision of this proposal exists; send that one.", 409, {}, { supersededBy: p.supersededBy });
      if (p.status === "accepted") throw signedLocked();
      if (p.status !== "draft") throw conflict("This proposal was already sent. Change it to make a new revision, then send that.", "already-sent");
      if (p.validUntil < today()) throw invalid("validUntil", "The validity date has passed; choose a later one before sending.");
      // A draft saved before the limit existed may still hold a far date; links and reminders are derived from it.
      const dateProblem = validUntilProblem(p.validUntil, today());
      if (dateProblem) throw invalid("validUntil", dateProblem);
      const seller = await repo.user(actor, actor.userId);
      if (!seller || (!seller.signatureTyped && !seller.signatureDataUrl)) {
        throw new AppError("signature-required", "Add your signature to your profile before sending (typed or drawn).", 409);
      }
      const customer = await recipientFor(actor, p, input, meta);

      const snapshot = await snapshotNow(actor, p, { userId: seller.id, name: seller.name, email: seller.email, signature: { typed: seller.signatureTyped, pngDataUrl: seller.signatureDataUrl } });
      const sha = snapshotSha256(snapshot);
      const crewPlans = await crewPlansNow(actor, p);
      const { token, tokenHash } = newToken();
      const tokenId = randomUUID();
      const now = deps.now();
      const link = `${deps.appOrigin()}/p/${token}`;
      const dedupeKey = `send:${id}`;
      const sent = await repo.markSent(actor, id, p.version, {
        status: "sent", snapshot, snapshotSha256: sha, crewPlans, sellerUserId: seller.id, sentAt: now,
        tokenHash, tokenId, tokenExpiresAt: linkExpiresAt(p.validUntil), tokenRevokedAt: null,
        renderStatus: "queued", renderError: null, renderAttempts: 0, renderUpdatedAt: now,
      }, { event: "sent", userId: actor.userId, ip: meta.ip, userAgent: meta.userAgent, tokenId, snapshotSha256: sha, detail: { to: customer.email, revision: p.revision } }, {
        dedupeKey, kind: "proposal",
        message: {
          companyId: actor.companyId, to: customer.email,
          subject: `Your attic ventilation proposal from ${snapshot.company.name}`,
          text: `Hello ${snapshot.customer.firstName},\n\n${seller.name} of ${snapshot.company.name} has sent you a proposal for the attic at ${snapshot.site.address}. It explains what we found, shows how air moves through the attic, and offers ${snapshot.options.length === 1 ? "one option" : `${snapshot.options.length} options`} with prices.\n\nOpen it here (valid until ${p.validUntil}): ${link}\n\nYou can download the PDF and accept or decline on that page.\n\n${snapshot.company.name}${snapshot.company.phone ? `\n${snapshot.company.phone}` : ""}`,
        },
      }, p.projectId);
      if (!sent) throw conflict("This proposal changed or was sent meanwhile. Reload it.", "already-sent");
      // Committed: from here a crash loses nothing, since the recovery sweep re-queues both jobs.
      await deps.jobs.enqueueRender(actor, id, sha);
      await deps.jobs.nudgeMail(dedupeKey);
      const company = await repo.company(actor);
      const reminderDays = (company?.settings as CompanySettings | undefined)?.reminderDays ?? null;
      if (reminderDays) await deps.jobs.scheduleReminder(actor, id, customer.email, link, reminderDays, tokenId);
      return { proposal: presentProposal(sent), link };
    },

    async revokeLink(actor: Actor, id: string, meta: RequestMeta) {
      const p = await requireProposal(actor, id);
      if (!p.tokenHash) throw conflict("This proposal has no link yet.", "no-link");
      if (p.tokenRevokedAt) return presentProposal(p);
      const updated = await repo.update(actor, id, { tokenRevokedAt: deps.now() });
      await repo.addEvent(actor, id, { event: "link-revoked", userId: actor.userId, ip: meta.ip, userAgent: meta.userAgent, tokenId: p.tokenId });
      return presentProposal(updated!);
    },

    /**
     * The same link in a new e-mail (the first one was lost, or went to a wrong address): a copy of
     * the e-mail that carried the current link, through the outbox, logged as "resent". Two clicks
     * at once send one e-mail. Only while the homeowner can still answer.
     */
    async resend(actor: Actor, id: string, meta: RequestMeta, input: SendInput = {}) {
      const p = await requireProposal(actor, id);
      const refusal = linkChangeRefusal(p);
      if (refusal) throw refusal;
      if (p.status === "accepted") throw conflict("The homeowner has signed this proposal. To give them a link to what they signed, issue a new link.", "already-accepted");
      if (p.tokenRevokedAt) throw conflict("This link was revoked, so it can't be sent again. Issue a new link instead: the homeowner gets it by e-mail.", "link-revoked");
      const carried = await repo.mailCarryingLink(actor, p.id, p.tokenId);
      if (!carried) throw conflict("The e-mail that carried this link was not kept, so it can't be sent again as it was. Issue a new link instead.", "no-mail");
      const recipient = await recipientFor(actor, p, input, meta);
      const seller = await repo.user(actor, actor.userId);
      const dedupeKey = await repo.queueResend(actor, id, {
        kind: "proposal-resend",
        message: {
          ...carried, to: recipient.email, subject: `Sent again: ${carried.subject}`,
          text: `${seller?.name ?? actor.name} asked us to send this again. The link is the same one as in the first e-mail.\n\n${carried.text}`,
        },
      }, { event: "resent", userId: actor.userId, ip: meta.ip, userAgent: meta.userAgent, tokenId: p.tokenId, snapshotSha256: p.snapshotSha256, detail: { to: recipient.email, revision: p.revision } }, deps.now(), RESEND_MIN_INTERVAL_MS);
      // Committed; should the nudge fail, the recovery sweep sends it.
      if (dedupeKey) await deps.jobs.nudgeMail(dedupeKey).catch(() => {});
      return { proposal: presentProposal(await requireProposal(actor, id)), isQueued: dedupeKey !== null };
    },

    /**
     * A new link in place of the current one (revoked or not): the old one stops at once and tells
     * its holder it was replaced; the new one is mailed through the outbox. After acceptance the new
     * link shows what was signed, read-only: the acceptance, the signed PDF and the crew's release
     * are not touched (they are not link columns, and the database refuses changes to them).
     */
    async reissueLink(actor: Actor, id: string, meta: RequestMeta, input: SendInput = {}) {
      const p = await requireProposal(actor, id);
      const refusal = linkChangeRefusal(p);
      if (refusal) throw refusal;
      const recipient = await recipientFor(actor, p, input, meta);
      const snapshot = p.snapshot!;
      const { token, tokenHash } = newToken();
      const tokenId = randomUUID();
      const link = `${deps.appOrigin()}/p/${token}`;
      const dedupeKey = `link:${tokenId}`;
      const isSigned = p.status === "accepted";
      const closing = `${snapshot.company.name}${snapshot.company.phone ? `\n${snapshot.company.phone}` : ""}`;
      const updated = await repo.reissueLink(actor, p, { tokenHash, tokenId }, p.tokenRevokedAt ? "revoked" : "replaced", {
        event: "link-reissued", userId: actor.userId, ip: meta.ip, userAgent: meta.userAgent, tokenId, snapshotSha256: p.snapshotSha256,
        detail: { previousTokenId: p.tokenId, to: recipient.email, revision: p.revision },
      }, {
        dedupeKey, kind: "proposal-link",
        message: isSigned
          ? {
              companyId: actor.companyId, to: recipient.email, subject: `A new link to your signed proposal from ${snapshot.company.name}`,
              text: `Hello ${snapshot.customer.firstName},\n\n${snapshot.company.name} has sent you a new link to the proposal you signed for ${snapshot.site.address}. The link you had before no longer works. What you signed is unchanged.\n\nOpen it here: ${link}\n\nYou can read what you signed and download your signed copy on that page.\n\n${closing}`,
            }
          : {
              companyId: actor.companyId, to: recipient.email, subject: `A new link to your proposal from ${snapshot.company.name}`,
              text: `Hello ${snapshot.customer.firstName},\n\n${snapshot.company.name} has sent you a new link to your attic ventilation proposal for ${snapshot.site.address}. The link you had before no longer works; please use this one (valid until ${p.validUntil}):\n\n${link}\n\nYou can read the proposal, download the PDF and accept or decline on that page.\n\n${closing}`,
            },
      });
      if (!updated) throw conflict("The link changed meanwhile (someone else replaced it, or a newer revision was made). Reload and try again.", "stale-version");
      await deps.jobs.nudgeMail(dedupeKey).catch(() => {});
      return { proposal: presentProposal(updated), link };
    },

    // ——— the homeowner's link ———

    /** The proposal behind a token, or the right refusal: 404 unknown; 410 revoked, replaced by a new link, superseded or expired. */
    async byToken(token: string): Promise<ProposalRow> {
      const tokenHash = token.length >= 20 && token.length <= 100 ? hashToken(token) : null;
      const p = tokenHash ? await repo.findByTokenHash(tokenHash) : null;
      if (!p || !p.snapshot) {
        const retired = tokenHash ? await repo.findRetiredLink(tokenHash) : null;
        if (retired) throw linkGone(retired.reason);
        throw new AppError("not-found", "This proposal link is not valid. Please check the link or contact the company that sent it.", 404);
      }
      const state = linkState(p, deps.now());
      if (state === "revoked") throw linkGone("revoked");
      if (state === "superseded") throw new AppError("superseded", "This proposal has been replaced by a newer revision. Look for the newer e-mail, or contact the company that sent it.", 410, {}, { supersededByRevision: true });
      if (state === "expired") throw new AppError("expired", "This proposal has expired. Contact the company that sent it for a new one.", 410);
      return p;
    },

    async view(token: string, meta: RequestMeta) {
      let p = await this.byToken(token);
      if (p.status === "sent") {
        const viewed = await repo.markViewed(p, p.id, deps.now());
        if (viewed) {
          await repo.addEvent(p, p.id, { event: "viewed", ip: meta.ip, userAgent: meta.userAgent, tokenId: p.tokenId, snapshotSha256: p.snapshotSha256, pdfSha256: p.pdfSha256 });
          p = viewed;
        }
      }
      return publicView(p, p.snapshot!);
    },

    /** The logo the link's snapshot references (the one frozen at sending); 404 when it has none. */
    async publicLogo(token: string) {
      const p = await this.byToken(token);
      const logo = p.snapshot!.company.logo;
      const object = logo ? await deps.storage.get(logo.storageKey) : null;
      if (!logo || !object) throw notFound("The logo");
      return { ...object, contentType: logo.contentType };
    },

    /** A photo the link's snapshot includes (or its thumbnail); any other id answers 404 as if unknown. */
    async publicPhoto(token: string, photoId: string, isThumb: boolean) {
      const p = await this.byToken(token);
      const included = p.snapshot!.photos.find((ph) => ph.id === photoId);
      if (!included) throw notFound("That photo");
      const files = isThumb ? await repo.photoFiles(p, photoId) : null;
      if (isThumb && !files) throw notFound("That photo");
      const object = await deps.storage.get(files ? files.thumbKey : included.storageKey);
      if (!object) throw notFound("That photo");
      return { ...object, contentType: files ? THUMB_CONTENT_TYPE : included.contentType };
    },

    async accept(token: string, input: AcceptInput, meta: RequestMeta) {
      const p = await this.byToken(token);
      if (p.status === "accepted") throw conflict("This proposal was already accepted.", "already-accepted");
      if (p.status === "declined") throw conflict("This proposal was declined. Contact the company for a new one.", "already-declined");
      const snapshot = p.snapshot!;
      if (!snapshot.options.some((o) => o.id === input.optionId)) throw invalid("optionId", "Choose one of the options in this proposal.");
      if (input.consent.consentTextVersion !== snapshot.esign.version) {
        throw invalid("consent.consentTextVersion", "The consent text has changed; please reload the page and read it again.");
      }
      let png: Buffer | null = null;
      if (input.signature.drawnPngDataUrl) png = await checkedSignaturePng(input.signature.drawnPngDataUrl, "signature.drawnPngDataUrl");
      const now = deps.now();
      const pngSha256 = png ? sha256Hex(png) : null;
      const pngKey = png ? `proposals/${p.companyId}/${p.id}/signature-${pngSha256}.png` : null;
      if (png && pngKey) await deps.storage.put(pngKey, png, "image/png");
      const acceptance = {
        optionId: input.optionId, signerName: input.signerName,
        signature: { typed: input.signature.typed ?? null, pngStorageKey: pngKey, pngSha256 },
        consentTextVersion: input.consent.consentTextVersion, acceptedAt: now.toISOString(), ip: meta.ip, userAgent: meta.userAgent, tokenId: p.tokenId,
      };
      const updated = await repo.acceptAndRelease(p, p.id, p.version, input.optionId, { status: "accepted", acceptance, decidedAt: now, signedRenderStatus: "queued", signedRenderUpdatedAt: now }, {
        event: "accepted", at: now, ip: meta.ip, userAgent: meta.userAgent, tokenId: p.tokenId,
        snapshotSha256: p.snapshotSha256, pdfSha256: p.pdfSha256, consentTextVersion: input.consent.consentTextVersion,
        detail: { optionId: input.optionId, signerName: input.signerName, signature: png ? "drawn" : "typed", signaturePngSha256: pngSha256, esignConsent: true },
      }, p.projectId, now);
      if (!updated) {
        const current = await repo.find(p, p.id);
        if (current?.supersededBy) throw new AppError("superseded", "This proposal has just been replaced by a newer revision. Look for the newer e-mail, or contact the company that sent it.", 410, {}, { supersededByRevision: true });
        throw conflict("This proposal changed meanwhile; please reload the page.", "stale-version");
      }
      // Committed with the acceptance; this only nudges the worker (the recovery sweep would queue it too).
      await deps.jobs.enqueueSignedRender(p, p.id).catch(() => {});
      return publicView(updated, snapshot);
    },

    async decline(token: string, reason: string | null | undefined, meta: RequestMeta) {
      const p = await this.byToken(token);
      if (p.status === "accepted") throw conflict("This proposal was already accepted.", "already-accepted");
      if (p.status === "declined") throw conflict("This proposal was already declined.", "already-declined");
      const now = deps.now();
      const updated = await repo.updateIfVersion(p, p.id, p.version, { status: "declined", declineReason: reason ?? null, decidedAt: now }, ["sent", "viewed"]);
      if (!updated) throw conflict("This proposal changed meanwhile; please reload the page.", "stale-version");
      await repo.addEvent(p, p.id, { event: "declined", at: now, ip: meta.ip, userAgent: meta.userAgent, tokenId: p.tokenId, snapshotSha256: p.snapshotSha256, pdfSha256: p.pdfSha256, detail: { reason: reason ?? null } });
      return publicView(updated, p.snapshot!);
    },

    /**
     * Does this SHA-256 belong to a PDF we recorded (a revision as sent or signed, or a change order)?
     * A match tells what the file itself already shows (company, revision or change order) and where
     * it stands; no match tells nothing but that. Only someone holding the file knows its hash.
     */
    async verify(sha256: string): Promise<VerifyAnswer> {
      const hit = await repo.findByPdfHash(sha256);
      if (hit) {
        return {
          sha256, matches: true,
          document: {
            kind: hit.signedPdfSha256 === sha256 ? "signed" : "sent", companyName: hit.companyName ?? "", revision: hit.revision, changeOrderNumber: null,
            status: hit.status, sentAt: hit.sentAt, signedAt: hit.status === "accepted" ? hit.signedAt : null, decidedAt: hit.decidedAt, isSuperseded: hit.supersededBy !== null,
          },
        };
      }
      const change = await repo.findChangeOrderByPdfHash(sha256);
      if (!change) return { sha256, matches: false };
      return {
        sha256, matches: true,
        document: {
          kind: "change-order", companyName: change.companyName ?? "", revision: change.revision, changeOrderNumber: change.number,
          status: change.status, sentAt: change.sentAt, signedAt: change.status === "signed" && change.decidedAt ? change.decidedAt.toISOString() : null, decidedAt: change.decidedAt, isSuperseded: false,
        },
      };
    },

    async setSellerSignature(actor: Actor, input: { typed?: string; drawnPngDataUrl?: string }) {
      if (input.drawnPngDataUrl) await checkedSignaturePng(input.drawnPngDataUrl, "drawnPngDataUrl");
      await repo.setSignature(actor, actor.userId, { signatureTyped: input.typed ?? null, signatureDataUrl: input.drawnPngDataUrl ?? null });
      return { signature: { typed: input.typed ?? null, drawnPngDataUrl: input.drawnPngDataUrl ?? null } };
    },

    async sellerSignature(actor: Actor) {
      const u = await repo.user(actor, actor.userId);
      return { signature: u && (u.signatureTyped || u.signatureDataUrl) ? { typed: u.signatureTyped, drawnPngDataUrl: u.signatureDataUrl } : null };
    },
  };
}
export type ProposalsService = ReturnType<typeof createProposalsService>;
