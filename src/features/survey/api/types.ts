import type { ProjectStatus } from "@shared/schemas/projects";
import type { SpaceRoof, SiteChecklist } from "@shared/schemas/survey";
import type { CodeBasis, RoofColor, Section, VaporRetarder, Vent } from "@shared/ventilation/index";

/** The project row as GET/PATCH /api/projects/:id answer it. Dates are ISO strings. */
export interface ProjectRecord {
  id: string;
  customerId: string;
  title: string;
  siteAddress: string;
  status: ProjectStatus;
  estimatorId: string | null;
  climateZone: number;
  moistureRegime: "A" | "B" | "C" | null;
  codeBasis: CodeBasis;
  ceilingVaporRetarder: VaporRetarder;
  roofColor: RoofColor;
  notes: string | null;
  version: number;
  createdAt: string;
  updatedAt: string;
}

/** One attic space as stored. */
export interface SpaceRecord {
  id: string;
  projectId: string;
  name: string;
  position: number;
  version: number;
  roof: SpaceRoof;
  sections: Section[];
  vents: Vent[];
  site: SiteChecklist;
  notes: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface PhotoRecord {
  id: string;
  projectId: string;
  spaceId: string | null;
  ventId: string | null;
  findingCode: string | null;
  caption: string | null;
  contentType: string;
  width: number;
  height: number;
  createdAt: string;
  url: string;
  thumbUrl: string;
}

export interface ProjectDetail {
  project: ProjectRecord;
  customer: { id: string; name: string; phone: string | null; email: string | null; billingAddress: string | null } | null;
  estimator: { id: string; name: string } | null;
  spaces: SpaceRecord[];
  photos: PhotoRecord[];
}
