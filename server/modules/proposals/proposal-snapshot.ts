import { createHash } from "node:crypto";
import { buildAirflowPicture, describeAirflowPicture } from "../../../shared/airflow/index.ts";
import { describeConditions, ESTIMATE_DISCLAIMER, estimateAirflow, type AirflowEstimate, type EstimateConditions, type Season } from "../../../shared/airflow-model/index.ts";
import { applyOption, DesignError } from "../../../shared/design/apply-option.ts";
import { priceOption, PricingError, type PricingSettings } from "../../../shared/pricing/index.ts";
import { coolingOffNotice, esignDisclosure, ESIGN_CONSENT_VERSION, proposalCautions } from "../../../shared/proposals/disclosures.ts";
import { homeownerNotes, toHomeownerFinding } from "../../../shared/proposals/homeowner-words.ts";
import type { ProposalSnapshot, ScopeText, SignatureImage, SnapshotAirflow, SnapshotAnalysis, SnapshotOption, SnapshotSpace } from "../../../shared/proposals/types.ts";
import { OptionSpaceSchema, type OptionSpace } from "../../../shared/schemas/options.ts";
import type { CatalogItem } from "../../../shared/schemas/catalog.ts";
import type { SpaceSurvey } from "../../../shared/schemas/survey.ts";
import { toAtticInput } from "../../../shared/survey/to-attic-input.ts";
import { analyzeParsedAttic, isPoweredKind, ParsedAtticSchema } from "../../../shared/ventilation/index.ts";
import type { ProjectRow } from "../projects/projects.repository.ts";
import type { SpaceRow } from "../spaces/spaces.repository.ts";
import type { OptionRow } from "../options/options.repository.ts";
import { surveyOf } from "../options/options.service.ts";

export interface SnapshotInput {
  proposal: { id: string; seriesId: string; revision: number; validUntil: string; coverNote: string | null; terms: string | null; findingCodes: string[] | null; scopes: Record<string, ScopeText> };
  company: { name: string; licenseNumber: string | null; addressLine: string | null; phone: string | null; email: string | null; logo: ProposalSnapshot["company"]["logo"]; isCoolingOffNoticeEnabled: boolean; estimateConditions: EstimateConditions };
  customer: { name: string; email: string | null; phone: string | null };
  project: ProjectRow;
  spaces: SpaceRow[];
  options: OptionRow[];
  catalog: CatalogItem[];
  pricing: PricingSettings;
  photos: ProposalSnapshot["photos"];
  seller: { userId: string | null; name: string; email: string | null; signature: SignatureImage | null };
  now: Date;
}

/** The same JSON always hashes the same: keys sorted at every level. */
export function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(",")}]`;
  if (value && typeof value === "object") {
    return `{${Object.keys(value).sort().filter((k) => (value as Record<string, unknown>)[k] !== undefined)
      .map((k) => `${JSON.stringify(k)}:${canonicalJson((value as Record<string, unknown>)[k])}`).join(",")}}`;
  }
  return JSON.stringify(value);
}
export const sha256Hex = (bytes: string | Uint8Array) => createHash("sha256").update(bytes).digest("hex");
export const snapshotSha256 = (snapshot: ProposalSnapshot) => sha256Hex(canonicalJson(snapshot));

function frozenAirflow(estimate: AirflowEstimate): SnapshotAirflow {
  const season = (name: Season) => {
    const f = estimate[name];
    return {
      conditionsText: describeConditions(name, f.conditions),
      houseAirDrawnCfm: f.houseAirDrawnCfm,
      atticAirChangesPerHour: f.atticAirChangesPerHour,
      fanCfm: f.fanCfm,
      houseDepressurizationByFansPa: f.houseDepressurizationByFansPa,
      depressurizationSentence: f.depressurization.sentence,
      isOverLimit: f.depressurization.isOverLimit,
    };
  };
  return { summer: season("summer"), winter: season("winter"), assumptions: estimate.assumptions, disclaimer: ESTIMATE_DISCLAIMER };
}

function spaceView(project: ProjectRow, space: SpaceRow, survey: SpaceSurvey, findingCodes: string[] | null, conditions: EstimateConditions): SnapshotSpace {
  const base = { spaceId: space.id, name: space.name };
  if (survey.sections.length === 0) return { ...base, analysis: null, picture: null, pictureDescription: [], issues: ["No attic floor was measured for this space."] };
  const parsed = ParsedAtticSchema.safeParse(toAtticInput(project, survey));
  if (!parsed.success) return { ...base, analysis: null, picture: null, pictureDescription: [], issues: parsed.error.issues.map((i) => i.message) };
  const a = analyzeParsedAttic(parsed.data);
  const estimate = estimateAirflow(parsed.data, conditions);
  const picture = buildAirflowPicture(parsed.data, a, { airflow: estimate.results.summer });
  const analysis: SnapshotAnalysis = {
    floorAreaSqFt: a.floorAreaSqFt,
    requirement: {
      ratio: a.requirement.ratio, totalSqIn: a.requirement.totalSqIn, totalSqFt: a.requirement.totalSqFt,
      upperMinSqIn: a.requirement.split.upperMinSqIn, upperMaxSqIn: a.requirement.split.upperMaxSqIn, lowerMinSqIn: a.requirement.split.lowerMinSqIn,
      reasons: a.requirement.reasons,
    },
    provided: { intakeSqIn: a.provided.intakeSqIn, exhaustSqIn: a.provided.exhaustSqIn, totalSqIn: a.provided.totalSqIn },
    fan: a.fan ? { installedCfm: a.fan.installedCfm, recommendedCfm: a.fan.recommendedCfm } : null,
    compliant: a.compliant,
    summary: a.summary,
    findings: a.findings.filter((f) => !findingCodes || findingCodes.includes(f.code)).map(toHomeownerFinding),
    hasPoweredFan: parsed.data.vents.some((v) => isPoweredKind(v.kind)),
  };
  return { ...base, analysis, airflow: frozenAirflow(estimate), picture, pictureDescription: [describeAirflowPicture(picture)], issues: [] };
}

const planFor = (option: OptionRow, spaceId: string): OptionSpace => option.spaces.find((s) => s.spaceId === spaceId) ?? OptionSpaceSchema.parse({ spaceId });

function optionView(input: SnapshotInput, option: OptionRow): SnapshotOption {
  const after = input.spaces.map((space) => {
    try {
      return spaceView(input.project, space, applyOption(surveyOf(space), planFor(option, space.id), input.catalog), null, input.company.estimateConditions);
    } catch (err) {
      if (!(err instanceof DesignError)) throw err;
      return { spaceId: space.id, name: space.name, analysis: null, picture: null, pictureDescription: [], issues: [err.message] };
    }
  });
  let price: SnapshotOption["price"] = null;
  let materials: SnapshotOption["materials"] = [];
  try {
    const p = priceOption(option, input.catalog, input.pricing);
    price = {
      subtotalCents: p.subtotalCents, discountCents: p.discountCents, taxCents: p.taxCents, taxRateBasisPoints: p.taxRateBasisPoints,
      totalCents: p.totalCents, materialsCents: p.materialsCents, laborCents: p.laborCents, depositCents: p.deposit.depositCents,
      lines: p.lines.map((l) => ({ description: l.description, totalCents: l.totalCents, explanation: l.explanation })),
      explanation: p.explanation,
    };
    materials = p.lines.filter((l) => l.source === "catalog-item" && l.category === "materials").map((l) => ({ description: l.description, quantity: l.quantity, unit: l.unit }));
  } catch (err) {
    if (!(err instanceof PricingError)) throw err;
  }
  const byId = new Map(input.catalog.map((c) => [c.id, c]));
  const addsFan = option.spaces.some((s) => s.added.some((a) => isPoweredKind((byId.get(a.catalogItemId)?.kind ?? "other") as never)));
  return {
    id: option.id, name: option.name, notes: homeownerNotes(option.notes),
    scope: input.proposal.scopes[option.id]?.lines ?? [],
    materials, price, after,
    hasPoweredFan: addsFan || after.some((s) => s.analysis?.hasPoweredFan),
  };
}

function firstName(name: string): string {
  return name.trim().split(/\s+/)[0] ?? name;
}

/** Everything the proposal shows, as plain data: what the PDF draws and the homeowner's page reads. */
export function buildSnapshot(input: SnapshotInput): ProposalSnapshot {
  const before = input.spaces.map((space) => spaceView(input.project, space, surveyOf(space), input.proposal.findingCodes, input.company.estimateConditions));
  const options = input.options.map((o) => optionView(input, o));
  const findingCount = before.reduce((n, s) => n + (s.analysis?.findings.length ?? 0), 0);
  const explanation = [
    `${firstName(input.customer.name)}, we surveyed ${before.length === 1 ? "your attic" : `the ${before.length} attic spaces`} at ${input.project.siteAddress} and measured every vent. An attic needs air to come in low, at the eaves, and leave high, near the ridge; that keeps the roof deck dry in winter and the attic cooler in summer.`,
    ...before.map((s) => `${s.name}: ${s.analysis?.summary ?? "not analysed yet."}`),
    findingCount ? `We found ${findingCount === 1 ? "one thing" : `${findingCount} things`} worth knowing about the attic; each is explained in this proposal.` : "We found nothing that needs fixing.",
  ];
  return {
    formatVersion: 1,
    proposalId: input.proposal.id,
    seriesId: input.proposal.seriesId,
    revision: input.proposal.revision,
    preparedAt: input.now.toISOString(),
    validUntil: input.proposal.validUntil,
    company: { name: input.company.name, licenseNumber: input.company.licenseNumber, addressLine: input.company.addressLine, phone: input.company.phone, email: input.company.email, logo: input.company.logo },
    customer: { name: input.customer.name, firstName: firstName(input.customer.name), email: input.customer.email, phone: input.customer.phone },
    site: { address: input.project.siteAddress, projectTitle: input.project.title },
    seller: input.seller,
    coverNote: input.proposal.coverNote,
    terms: input.proposal.terms,
    explanation,
    before,
    photos: input.photos,
    options,
    cautions: proposalCautions({ hasPoweredFanNow: before.some((s) => s.analysis?.hasPoweredFan), hasPoweredFanInAnyOption: options.some((o) => o.hasPoweredFan) }),
    coolingOff: {
      isEnabled: input.company.isCoolingOffNoticeEnabled,
      notice: input.company.isCoolingOffNoticeEnabled
        ? coolingOffNotice({ companyName: input.company.name, companyAddress: input.company.addressLine, transactionDate: "the date you sign", cancelByDate: "the third business day after the date you sign" })
        : [],
    },
    esign: { version: ESIGN_CONSENT_VERSION, text: esignDisclosure(input.company.name) },
  };
}
