import type { ProjectRecord } from "@shared/schemas/projects";
import type { SpaceRoof, SiteChecklist } from "@shared/schemas/survey";
import type { Section, Vent } from "@shared/ventilation/index";

/** A project as the API answers it: the contract lives in shared/schemas/projects.ts. */
export type { ProjectRecord };

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
