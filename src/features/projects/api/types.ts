import type { ProjectPatch, ProjectRecord, ProjectStatus } from "@shared/schemas/projects";

export type ProjectSort = "updatedAt" | "createdAt" | "title" | "customerName" | "status";

export interface ProjectListParams {
  q: string;
  status: ProjectStatus | "";
  estimatorId: string;
  sort: ProjectSort;
  dir: "asc" | "desc";
  page: number;
  pageSize: number;
}

export interface ProjectListItem {
  id: string;
  title: string;
  siteAddress: string;
  status: ProjectStatus;
  customer: { id: string; name: string };
  estimator: { id: string; name: string } | null;
  updatedAt: string;
  createdAt: string;
  spaceCount: number;
}

export interface ProjectPage {
  items: ProjectListItem[];
  total: number;
  page: number;
  pageSize: number;
}

/** A project as the API answers it: the contract lives in shared/schemas/projects.ts. */
export type Project = ProjectRecord;

/** A member of the team, for the estimator pickers. */
export interface TeamMember {
  id: string;
  name: string;
  role: string;
}

export interface CustomerSummary {
  id: string;
  name: string;
  phone: string | null;
  email: string | null;
  billingAddress: string | null;
}

/** The fields of a project its details form edits (everything but the customer and version). */
export type ProjectDetailsValue = Required<Omit<ProjectPatch, "version" | "customerId">>;
