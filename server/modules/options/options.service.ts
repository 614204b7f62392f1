import { AppError, notFound } from "../../lib/errors.ts";
import type { Actor } from "../../lib/request-context.ts";
import { OptionSpaceSchema, type DesignOptionInput, type OptionSpace } from "../../../shared/schemas/options.ts";
import type { CatalogItem } from "../../../shared/schemas/catalog.ts";
import type { SpaceSurvey } from "../../../shared/schemas/survey.ts";
import { applyOption, DesignError, generateOptions, materialsList, withCatalogLabor, type MaterialsList, type OptionType } from "../../../shared/design/index.ts";
import { priceOption, PricingError, NO_DEPOSIT, type OptionPrice, type PricingSettings } from "../../../shared/pricing/index.ts";
import { analyzeSpace, type SpaceAnalysis } from "../projects/analyze-space.ts";
import type { ProjectRow, ProjectsRepository } from "../projects/projects.repository.ts";
import type { SpaceRow, SpacesRepository } from "../spaces/spaces.repository.ts";
import type { CatalogRepository } from "../catalog/catalog.repository.ts";
import { optionReferenceProblems } from "./option-references.ts";
import { applyChangeOrders } from "../../../shared/change-orders/crew-list.ts";
import type { AcceptedRevision, CompanyTerms, OptionRow, OptionsRepository, SignedPrice } from "./options.repository.ts";

export const STALE_OPTION_MESSAGE = "Someone else saved this design option since you opened it.";

/** What an option is judged against: its project, the surveyed spaces, the whole catalog and the company's terms. */
interface OptionContext {
  project: ProjectRow;
  spaces: SpaceRow[];
  catalog: CatalogItem[];
  pricing: PricingSettings;
}

/**
 * Why an option can no longer be edited: the homeowner signed it ("accepted"), or it was offered
 * beside the one they signed ("offered"). Signed work changes only through a change order.
 */
export interface OptionLock {
  reason: "accepted" | "offered";
  proposalId: string;
  revision: number;
  acceptedAt: Date | null;
  /** What to do instead, in words for the salesperson. */
  message: string;
  /** The price the homeowner saw in that revision; today's catalog may price the option differently. */
  signedPrice: SignedPrice | null;
}

const isoDay = (d: Date | null) => (d ? d.toISOString().slice(0, 10) : "");

const pick = (p: SignedPrice | null | undefined): SignedPrice | null =>
  p ? { subtotalCents: p.subtotalCents, discountCents: p.discountCents, taxCents: p.taxCents, totalCents: p.totalCents } : null;

export function lockOf(optionId: string, accepted: readonly AcceptedRevision[]): OptionLock | null {
  const signed = accepted.find((a) => a.acceptedOptionId === optionId);
  if (signed) {
    return {
      reason: "accepted", proposalId: signed.proposalId, revision: signed.revision, acceptedAt: signed.decidedAt, signedPrice: pick(signed.prices[optionId]),
      message: `The homeowner signed this option (proposal rev. ${signed.revision}, ${isoDay(signed.decidedAt)}), so it is read-only. To change the signed work, draft a change order; to offer something different, copy it into a new draft option.`,
    };
  }
  const offered = accepted.find((a) => a.optionIds.includes(optionId));
  if (!offered) return null;
  return {
    reason: "offered", proposalId: offered.proposalId, revision: offered.revision, acceptedAt: offered.decidedAt, signedPrice: pick(offered.prices[optionId]),
    message: `This option was offered in proposal rev. ${offered.revision}, which the homeowner accepted with another option, so it stays as offered. Copy it into a new draft option to change it.`,
  };
}

const lockedError = (lock: OptionLock) => new AppError("accepted-locked", lock.message, 409, {}, { lock });

export interface PresentedOption extends OptionRow {
  /** One entry per attic space of the project, as GET /projects/:id/analysis answers it, for the attic after this option's work. */
  analysis: { spaces: SpaceAnalysis[] };
  /** Integer cents throughout; null (with priceIssue) only when a line cannot be priced. */
  price: OptionPrice | null;
  priceIssue: string | null;
  /** Set when signed work makes the option read-only. */
  lock: OptionLock | null;
}

/**
 * The company profile's deposit rule in the pricing module's terms: a percent (10 = 10 %) or an
 * amount in cents, with an optional cap in cents.
 */
export function pricingSettings(terms: CompanyTerms): PricingSettings {
  const rule = terms.depositRule;
  const deposit = !rule
    ? NO_DEPOSIT
    : {
        request: rule.kind === "percent"
          ? { kind: "percent" as const, basisPoints: Math.round(rule.value * 100) }
          : { kind: "amount" as const, cents: Math.round(rule.value) },
        capCents: rule.capCents,
        capBasisPoints: null,
      };
  return { taxRateBasisPoints: terms.taxRateBasisPoints, isLaborTaxed: true, deposit };
}

export const surveyOf = (space: SpaceRow): SpaceSurvey => ({
  name: space.name, roof: space.roof, sections: space.sections, vents: space.vents, site: space.site, notes: space.notes,
});

/** The option's plan for a space; a space it does not mention is analysed as surveyed. */
const planFor = (option: Pick<DesignOptionInput, "spaces">, spaceId: string): OptionSpace =>
  option.spaces.find((s) => s.spaceId === spaceId) ?? OptionSpaceSchema.parse({ spaceId });

/** One space of the project after the option's work, through the same core as the survey's own analysis. */
export function analyzeOptionSpace(project: ProjectRow, space: SpaceRow, optionSpace: OptionSpace, catalog: readonly CatalogItem[]): SpaceAnalysis {
  try {
    return analyzeSpace(project, { ...applyOption(surveyOf(space), optionSpace, catalog), id: space.id });
  } catch (err) {
    if (!(err instanceof DesignError)) throw err;
    const index = optionSpace.added.findIndex((a) => a.id === err.addedItemId);
    return { spaceId: space.id, name: space.name, analysis: null, issues: [{ path: index >= 0 ? `added.${index}` : "added", message: err.message }] };
  }
}

export interface Proposal extends Pick<PresentedOption, "analysis" | "price" | "priceIssue"> {
  spaceId: string;
  spaceName: string;
  type: OptionType;
  /** The body to POST to /projects/:id/options to keep it. */
  option: DesignOptionInput;
}
export interface OptionMaterials {
  option: { id: string; name: string; version: number; projectId: string };
  project: { id: string; title: string; siteAddress: string };
  /** The spaces the option works in, to label the work lines' spaceId. */
  spaces: { id: string; name: string }[];
  materials: MaterialsList;
  /**
   * Set when an accepted proposal released this list to the crew: the list is then the one frozen
   * when that proposal was sent, changed only by the signed change orders named here.
   */
  release: { releasedAt: Date; proposalId: string; revision: number; changeOrders: number[] } | null;
}
export interface SkippedProposal {
  spaceId: string;
  spaceName: string;
  type: OptionType;
  reason: string;
}

export function presentOption<T extends Pick<DesignOptionInput, "spaces" | "laborLines" | "discount">>(option: T, ctx: OptionContext): T & Pick<PresentedOption, "analysis" | "price" | "priceIssue"> {
  const spaces = ctx.spaces.map((space) => analyzeOptionSpace(ctx.project, space, planFor(option, space.id), ctx.catalog));
  let price: OptionPrice | null = null;
  let priceIssue: string | null = null;
  try {
    price = priceOption(option, ctx.catalog, ctx.pricing);
  } catch (err) {
    if (!(err instanceof PricingError)) throw err;
    priceIssue = err.message;
  }
  return { ...option, analysis: { spaces }, price, priceIssue };
}

function invalid(fields: Record<string, string>): AppError {
  const [field, message] = Object.entries(fields)[0]!;
  return new AppError("invalid-input", `Please check ${field}: ${message}`, 400, fields);
}

export function createOptionsService(deps: { repo: OptionsRepository; projects: ProjectsRepository; spaces: SpacesRepository; catalog: CatalogRepository }) {
  const { repo } = deps;

  async function requireProject(actor: Actor, id: string): Promise<ProjectRow> {
    const project = await deps.projects.find(actor, id);
    if (!project) throw notFound("That project");
    return project;
  }
  async function requireOption(actor: Actor, id: string): Promise<OptionRow> {
    const option = await repo.find(actor, id);
    if (!option) throw notFound("That design option");
    return option;
  }
  async function contextFor(actor: Actor, project: ProjectRow): Promise<OptionContext> {
    const [spaces, catalog, terms] = await Promise.all([
      deps.spaces.listForProject(actor, project.id), deps.catalog.all(actor), repo.companyTerms(actor),
    ]);
    return { project, spaces, catalog, pricing: pricingSettings(terms) };
  }
  function checkReferences(ctx: OptionContext, spaces: readonly OptionSpace[], previously?: OptionRow) {
    const used = new Set((previously?.spaces ?? []).flatMap((s) => s.added.map((a) => a.catalogItemId)));
    const problems = optionReferenceProblems(spaces, ctx.spaces, new Map(ctx.catalog.map((item) => [item.id, item])), used);
    if (Object.keys(problems).length) throw invalid(problems);
  }

  return {
    async list(actor: Actor, projectId: string): Promise<PresentedOption[]> {
      const project = await requireProject(actor, projectId);
      const [ctx, options, accepted] = await Promise.all([contextFor(actor, project), repo.listForProject(actor, projectId), repo.acceptedRevisions(actor, projectId)]);
      return options.map((option) => ({ ...presentOption(option, ctx), lock: lockOf(option.id, accepted) }));
    },

    async get(actor: Actor, id: string): Promise<PresentedOption> {
      const option = await requireOption(actor, id);
      const [ctx, accepted] = await Promise.all([contextFor(actor, await requireProject(actor, option.projectId)), repo.acceptedRevisions(actor, option.projectId)]);
      return { ...presentOption(option, ctx), lock: lockOf(option.id, accepted) };
    },

    async create(actor: Actor, projectId: string, input: DesignOptionInput): Promise<PresentedOption> {
      const ctx = await contextFor(actor, await requireProject(actor, projectId));
      checkReferences(ctx, input.spaces);
      return { ...presentOption(await repo.insert(actor, projectId, withCatalogLabor(input, ctx.catalog)), ctx), lock: null };
    },

    /** A new draft with the same content: how an offered or signed option is reworked without touching it. */
    async copy(actor: Actor, id: string): Promise<PresentedOption> {
      const source = await requireOption(actor, id);
      const ctx = await contextFor(actor, await requireProject(actor, source.projectId));
      const name = `${source.name.slice(0, 113)} (copy)`;
      const input: DesignOptionInput = {
        name, notes: source.notes, spaces: source.spaces, laborLines: source.laborLines, discount: source.discount,
        isKept: true, origin: source.origin, rationale: source.rationale,
      };
      return { ...presentOption(await repo.insert(actor, source.projectId, input), ctx), lock: null };
    },

    async update(actor: Actor, id: string, version: number, patch: Partial<DesignOptionInput>): Promise<PresentedOption> {
      const current = await requireOption(actor, id);
      const project = await requireProject(actor, current.projectId);
      const lock = lockOf(id, await repo.acceptedRevisions(actor, project.id));
      if (lock) throw lockedError(lock);
      const ctx = await contextFor(actor, project);
      if (patch.spaces) checkReferences(ctx, patch.spaces, current);
      // Catalog labour follows the quantities, whichever of the two this patch changes.
      const synced = withCatalogLabor({ spaces: patch.spaces ?? current.spaces, laborLines: patch.laborLines ?? current.laborLines }, ctx.catalog);
      const laborChanged = JSON.stringify(synced.laborLines) !== JSON.stringify(patch.laborLines ?? current.laborLines);
      const updated = await repo.updateIfVersion(actor, id, version, laborChanged || patch.laborLines ? { ...patch, laborLines: synced.laborLines } : patch);
      if (updated) return { ...presentOption(updated, ctx), lock: null };
      // Accepted meanwhile, or saved by someone else.
      const accepted = await repo.acceptedRevisions(actor, project.id);
      const lockNow = lockOf(id, accepted);
      if (lockNow) throw lockedError(lockNow);
      const latest = await requireOption(actor, id);
      throw new AppError("stale-version", STALE_OPTION_MESSAGE, 409, {}, { current: { ...presentOption(latest, ctx), lock: null } });
    },

    async remove(actor: Actor, id: string): Promise<void> {
      const option = await requireOption(actor, id);
      const lock = lockOf(id, await repo.acceptedRevisions(actor, option.projectId));
      if (lock) throw lockedError(lock);
      if (await repo.remove(actor, id)) return;
      const lockNow = lockOf(id, await repo.acceptedRevisions(actor, option.projectId));
      if (lockNow) throw lockedError(lockNow);
      throw notFound("That design option");
    },

    /**
     * The generator's proposals for each chosen space (all by default), not saved: each carries the
     * option body to POST back and its analysis and price exactly as the saved option will show them.
     */
    async generate(actor: Actor, projectId: string, input: { spaceIds?: string[] }): Promise<{ proposals: Proposal[]; skipped: SkippedProposal[] }> {
      const ctx = await contextFor(actor, await requireProject(actor, projectId));
      const fields: Record<string, string> = {};
      input.spaceIds?.forEach((id, i) => {
        if (!ctx.spaces.some((s) => s.id === id)) fields[`spaceIds.${i}`] = "That attic space is not part of this project.";
      });
      if (Object.keys(fields).length) throw invalid(fields);
      const targets = input.spaceIds ? ctx.spaces.filter((s) => input.spaceIds!.includes(s.id)) : ctx.spaces;
      const proposals: Proposal[] = [];
      const skipped: SkippedProposal[] = [];
      for (const space of targets) {
        const result = generateOptions({ project: ctx.project, spaceId: space.id, space: surveyOf(space), catalog: ctx.catalog, settings: { pricing: ctx.pricing } });
        for (const generated of result.options) {
          const { analysis, price, priceIssue } = presentOption({ ...generated.option }, ctx);
          proposals.push({ spaceId: space.id, spaceName: space.name, type: generated.type, option: generated.option, analysis, price, priceIssue });
        }
        for (const skip of result.skipped) skipped.push({ spaceId: space.id, spaceName: space.name, type: skip.type, reason: skip.reason });
      }
      return { proposals, skipped };
    },

    /** The crew's list: what to buy, rounded to how it is sold, and the work with its cautions. */
    async materials(actor: Actor, id: string): Promise<OptionMaterials> {
      const option = await requireOption(actor, id);
      const project = await requireProject(actor, option.projectId);
      const released = await repo.release(actor, option.id);
      const changes = released ? await repo.signedChanges(actor, released.proposalId) : [];
      const release = released ? { releasedAt: released.releasedAt, proposalId: released.proposalId, revision: released.revision, changeOrders: changes.map((c) => c.number) } : null;
      const base = { option: { id: option.id, name: option.name, version: option.version, projectId: project.id }, project: { id: project.id, title: project.title, siteAddress: project.siteAddress } };
      // Released: the list frozen when the signed proposal was sent plus signed change orders, never recomputed from today's catalog or survey.
      if (released?.plan) return { ...base, spaces: released.plan.spaces, materials: applyChangeOrders(released.plan.materials, changes), release };
      const [spaces, catalog] = await Promise.all([deps.spaces.listForProject(actor, project.id), deps.catalog.all(actor)]);
      const surveyed = Object.fromEntries(spaces.map((space) => [space.id, surveyOf(space)]));
      return {
        ...base,
        spaces: spaces.filter((space) => option.spaces.some((s) => s.spaceId === space.id)).map((space) => ({ id: space.id, name: space.name })),
        materials: materialsList(option, catalog, surveyed),
        release,
      };
    },
  };
}
export type OptionsService = ReturnType<typeof createOptionsService>;
