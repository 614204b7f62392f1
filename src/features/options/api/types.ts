import type { MaterialsList, OptionType } from "@shared/design/index";
import type { OptionPrice } from "@shared/pricing/index";
import type { CatalogItem } from "@shared/schemas/catalog";
import type { DesignOptionInput } from "@shared/schemas/options";
import type { SpaceRoof, SiteChecklist } from "@shared/schemas/survey";
import type { AtticAnalysis, CodeBasis, RoofColor, Section, UpperShareBase, VaporRetarder, Vent } from "@shared/ventilation/index";

/** One attic space's analysis as the server computes it (GET /projects/:id/analysis shape). */
export interface SpaceAnalysisRecord {
  spaceId: string;
  name: string;
  analysis: AtticAnalysis | null;
  issues: { path: string; message: string }[];
}

/** A saved design option with the server's analysis per space and price (integer cents). */
export interface OptionRecord extends DesignOptionInput {
  id: string;
  projectId: string;
  position: number;
  version: number;
  createdAt: string;
  updatedAt: string;
  analysis: { spaces: SpaceAnalysisRecord[] };
  price: OptionPrice | null;
  priceIssue: string | null;
  /** Set when the homeowner signed this option, or signed another one offered beside it: the option is then read-only. */
  lock: OptionLock | null;
}

export interface OptionLock {
  reason: "accepted" | "offered";
  proposalId: string;
  revision: number;
  acceptedAt: string | null;
  /** What to do instead (draft a change order, or copy into a new draft). */
  message: string;
  /** The price in the signed revision; the live price follows today's catalog. */
  signedPrice: { subtotalCents: number; discountCents: number; taxCents: number; totalCents: number } | null;
}

/** What the generator proposes (not saved): POST `option` back to keep it. */
export interface ProposalRecord {
  spaceId: string;
  spaceName: string;
  type: OptionType;
  option: DesignOptionInput;
  analysis: { spaces: SpaceAnalysisRecord[] };
  price: OptionPrice | null;
  priceIssue: string | null;
}

export interface SkippedProposal {
  spaceId: string;
  spaceName: string;
  type: OptionType;
  reason: string;
}

export interface GenerateResult {
  proposals: ProposalRecord[];
  skipped: SkippedProposal[];
}

export interface OptionMaterials {
  option: { id: string; name: string; version: number; projectId: string };
  project: { id: string; title: string; siteAddress: string };
  spaces: { id: string; name: string }[];
  materials: MaterialsList;
  /** Set once an accepted proposal released this list to the crew (ISO time). */
  release: { releasedAt: string; proposalId: string; revision: number; changeOrders: number[] } | null;
}

/** The project fields the options workspace needs, from GET /api/projects/:id. */
export interface ProjectRecord {
  id: string;
  title: string;
  siteAddress: string;
  climateZone: number;
  /** IECC moisture letter; null for zones 7–8 or when not recorded. */
  moistureRegime?: "A" | "B" | "C" | null;
  codeBasis: CodeBasis;
  ceilingVaporRetarder: VaporRetarder;
  roofColor: RoofColor;
  /** The company's reading of the 1/300 upper-vent share (company profile). */
  upperShareBase?: UpperShareBase;
}

export interface SpaceRecord {
  id: string;
  name: string;
  position: number;
  version: number;
  roof: SpaceRoof;
  sections: Section[];
  vents: Vent[];
  site: SiteChecklist;
  notes: string | null;
}

export interface ProjectDetail {
  project: ProjectRecord;
  customer: { id: string; name: string } | null;
  spaces: SpaceRecord[];
}

export type CatalogRecord = CatalogItem;
