import { processLogo } from "../photos/photo-processing.ts";
import { DEFAULT_ESTIMATE_CONDITIONS, EstimateConditionsSchema, type EstimateConditions } from "../../../shared/airflow-model/schema.ts";
import { AppError, notFound } from "../../lib/errors.ts";
import type { Actor } from "../../lib/request-context.ts";
import type { Storage } from "../../lib/storage/index.ts";
import type { CompanyProfilePatch } from "../../../shared/proposals/schemas.ts";
import { sha256Hex } from "./proposal-snapshot.ts";
import type { CompanySettings, ProposalsRepository } from "./proposals.repository.ts";

export const MAX_LOGO_BYTES = 2 * 1024 * 1024;

type CompanyRow = NonNullable<Awaited<ReturnType<ProposalsRepository["company"]>>>;

/** On unless the owner turned it off: sales made at the home need the notice (FTC Cooling-Off Rule, 16 CFR 429.1). */
export const isCoolingOffNoticeOn = (settings: CompanySettings) => settings.isCoolingOffNoticeEnabled ?? true;

/** The company profile as settings shows it and proposals print it. */
export function presentCompany(c: CompanyRow) {
  const settings = c.settings as CompanySettings;
  return {
    id: c.id, name: c.name, licenseNumber: c.licenseNumber, addressLine: c.addressLine, phone: c.phone, email: c.email,
    defaultTerms: c.defaultTerms, taxRateBasisPoints: c.taxRateBasisPoints, depositRule: c.depositRule ?? null,
    isCoolingOffNoticeEnabled: isCoolingOffNoticeOn(settings),
    reminderDays: settings.reminderDays ?? null,
    upperShareBase: settings.upperShareBase ?? "required",
    defaultCodeBasis: c.defaultCodeBasis ?? "irc-2018",
    defaultClimateZone: settings.defaultClimateZone ?? 4,
    unitSystem: settings.unitSystem ?? "imperial",
    logo: settings.logoStorageKey ? { contentType: settings.logoContentType, sha256: settings.logoSha256, url: "/api/company/logo" } : null,
    estimateConditions: estimateConditionsOf(settings),
    isCrewShownPrices: settings.isCrewShownPrices ?? false,
    warrantyTerms: settings.warrantyTerms ?? null,
  };
}

/** The company's stated airflow-estimate conditions, or the defaults (read by every role). */
export function estimateConditionsOf(settings: CompanySettings): EstimateConditions {
  const parsed = EstimateConditionsSchema.safeParse(settings.estimateConditions);
  return parsed.success ? parsed.data : DEFAULT_ESTIMATE_CONDITIONS;
}

export function createCompanyService(deps: { repo: ProposalsRepository; storage: Storage }) {
  const { repo } = deps;
  async function current(actor: Actor) {
    const c = await repo.company(actor);
    if (!c) throw notFound("Your company");
    return c;
  }
  return {
    async get(actor: Actor) {
      return presentCompany(await current(actor));
    },

    async estimateConditions(actor: Actor) {
      return estimateConditionsOf((await current(actor)).settings as CompanySettings);
    },

    async update(actor: Actor, patch: CompanyProfilePatch) {
      const c = await current(actor);
      const { isCoolingOffNoticeEnabled, reminderDays, upperShareBase, estimateConditions, defaultClimateZone, unitSystem, isCrewShownPrices, warrantyTerms, ...columns } = patch;
      const settings: CompanySettings = { ...(c.settings as CompanySettings) };
      if (isCoolingOffNoticeEnabled !== undefined) settings.isCoolingOffNoticeEnabled = isCoolingOffNoticeEnabled;
      if (reminderDays !== undefined) settings.reminderDays = reminderDays;
      if (upperShareBase !== undefined) settings.upperShareBase = upperShareBase;
      if (estimateConditions !== undefined) settings.estimateConditions = estimateConditions;
      if (defaultClimateZone !== undefined) settings.defaultClimateZone = defaultClimateZone;
      if (unitSystem !== undefined) settings.unitSystem = unitSystem;
      if (isCrewShownPrices !== undefined) settings.isCrewShownPrices = isCrewShownPrices;
      if (warrantyTerms !== undefined) settings.warrantyTerms = warrantyTerms;
      const updated = await repo.updateCompany(actor, { ...columns, settings: settings as Record<string, unknown> });
      return presentCompany(updated!);
    },

    /** PNG or JPEG only, checked by the bytes and re-encoded (processLogo); stored under a key made from its hash. */
    async setLogo(actor: Actor, file: { buffer: Buffer } | undefined) {
      if (!file) throw new AppError("invalid-input", "Send the logo in the form field named file.", 400, { file: "Choose a PNG or JPEG logo." });
      const logo = await processLogo(file.buffer);
      const c = await current(actor);
      const sha256 = sha256Hex(logo.bytes);
      const key = `companies/${c.id}/logo-${sha256}.${logo.ext}`;
      await deps.storage.put(key, logo.bytes, logo.contentType);
      const settings: CompanySettings = { ...(c.settings as CompanySettings), logoStorageKey: key, logoContentType: logo.contentType, logoSha256: sha256 };
      return presentCompany((await repo.updateCompany(actor, { settings: settings as Record<string, unknown> }))!);
    },

    async openLogo(actor: Actor) {
      const settings = (await current(actor)).settings as CompanySettings;
      const object = settings.logoStorageKey ? await deps.storage.get(settings.logoStorageKey) : null;
      if (!object) throw notFound("The logo");
      return { object, contentType: settings.logoContentType ?? "application/octet-stream" };
    },
  };
}
export type CompanyService = ReturnType<typeof createCompanyService>;
