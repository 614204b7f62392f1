/**
 * The proposal's data contracts (DESIGN.md §3): statuses, the frozen snapshot a sent revision
 * shows, and the acceptance record. Plain serialisable data: the PDF, the homeowner page and
 * the hashes all read the same snapshot.
 */
import type { AirflowPicture } from "../airflow/types";
import type { MaterialsList } from "../design/materials-list";
import type { OptionPrice } from "../pricing/price-option";
import type { Severity } from "../ventilation/findings";

export const PROPOSAL_STATUSES = ["draft", "sent", "viewed", "accepted", "declined", "expired"] as const;
export type ProposalStatus = (typeof PROPOSAL_STATUSES)[number];

/** Where a PDF render stands; "none" before the first request. */
export const RENDER_STATUSES = ["none", "queued", "rendering", "ready", "failed"] as const;
export type RenderStatus = (typeof RENDER_STATUSES)[number];

/** The company's deposit rule, as the company profile stores it: percent (10 = 10 %) or cents. */
export interface DepositRule {
  kind: "percent" | "amount";
  value: number;
  capCents: number | null;
}

/** The scope of work of one option: sentences, generated then edited by the salesperson. */
export interface ScopeText {
  lines: string[];
  isEdited: boolean;
}

export interface SignatureImage {
  typed: string | null;
  /** A PNG data URL, when drawn. */
  pngDataUrl: string | null;
}

export interface SnapshotFinding {
  code: string;
  severity: Severity;
  /** The homeowner's words for the finding. */
  title: string;
  /** What it means for the house in one plain sentence (absent in snapshots taken before it existed). */
  plain?: string | null;
  /** The core's technical detail: the rule, the inputs and the arithmetic. */
  detail: string;
}

export interface SnapshotAnalysis {
  floorAreaSqFt: number;
  requirement: { ratio: number; totalSqIn: number; totalSqFt: number; upperMinSqIn: number; upperMaxSqIn: number; lowerMinSqIn: number; reasons: string[] };
  provided: { intakeSqIn: number; exhaustSqIn: number; totalSqIn: number };
  fan: { installedCfm: number; recommendedCfm: number } | null;
  compliant: boolean;
  /** The core's one plain sentence. */
  summary: string;
  findings: SnapshotFinding[];
  hasPoweredFan: boolean;
}

/** One season of the airflow estimate (shared/airflow-model), as the proposal froze it. */
export interface SnapshotAirflowSeason {
  /** The conditions in words: "summer: 92 °F outdoors, attic 130 °F, house 75 °F, calm". */
  conditionsText: string;
  houseAirDrawnCfm: number;
  atticAirChangesPerHour: number;
  fanCfm: number;
  houseDepressurizationByFansPa: number | null;
  /** The depressurization check's sentence, with its caution when past the limit. */
  depressurizationSentence: string;
  isOverLimit: boolean;
}

export interface SnapshotAirflow {
  summer: SnapshotAirflowSeason;
  winter: SnapshotAirflowSeason;
  assumptions: string[];
  disclaimer: string;
}

export interface SnapshotSpace {
  spaceId: string;
  name: string;
  analysis: SnapshotAnalysis | null;
  /** The airflow estimate; absent in proposals frozen before it existed. */
  airflow?: SnapshotAirflow | null;
  picture: AirflowPicture | null;
  pictureDescription: string[];
  /** Why the analysis is missing, in words, when it is. */
  issues: string[];
}

export interface SnapshotMaterial {
  description: string;
  quantity: number;
  unit: string;
}

export interface SnapshotOption {
  id: string;
  name: string;
  notes: string | null;
  scope: string[];
  materials: SnapshotMaterial[];
  price: Pick<OptionPrice, "subtotalCents" | "discountCents" | "taxCents" | "taxRateBasisPoints" | "totalCents" | "materialsCents" | "laborCents"> & {
    depositCents: number;
    lines: { description: string; totalCents: number; explanation: string }[];
    explanation: string[];
  } | null;
  /** The attic after this option's work, per space. */
  after: SnapshotSpace[];
  hasPoweredFan: boolean;
}

export interface ProposalSnapshot {
  formatVersion: 1;
  proposalId: string;
  seriesId: string;
  revision: number;
  /** ISO time the snapshot was taken (sending time for a sent revision). */
  preparedAt: string;
  validUntil: string;
  company: {
    name: string;
    licenseNumber: string | null;
    addressLine: string | null;
    phone: string | null;
    email: string | null;
    /** SHA-256 of the logo bytes, so the hash of the snapshot covers the logo too. */
    logo: { storageKey: string; contentType: string; sha256: string } | null;
  };
  customer: { name: string; firstName: string; email: string | null; phone: string | null };
  site: { address: string; projectTitle: string };
  seller: { userId: string | null; name: string; email: string | null; signature: SignatureImage | null };
  coverNote: string | null;
  terms: string | null;
  explanation: string[];
  before: SnapshotSpace[];
  photos: { id: string; caption: string | null; findingCode: string | null; storageKey: string; contentType: string }[];
  options: SnapshotOption[];
  cautions: string[];
  coolingOff: { isEnabled: boolean; notice: string[] };
  esign: { version: string; text: string[] };
}

export interface ProposalAcceptance {
  optionId: string;
  signerName: string;
  signature: { typed: string | null; pngStorageKey: string | null; pngSha256: string | null };
  consentTextVersion: string;
  acceptedAt: string;
  ip: string | null;
  userAgent: string | null;
  tokenId: string | null;
}

/**
 * The crew's side of one offered option, frozen when the proposal is sent: the materials list and
 * work lines as they stood then. Acceptance releases the chosen one as is, so nothing edited later
 * (the option, the catalog, the survey) can change what the crew works from.
 */
export interface CrewPlan {
  optionId: string;
  optionName: string;
  /** The attic spaces the work lines name. */
  spaces: { id: string; name: string }[];
  materials: MaterialsList;
}
