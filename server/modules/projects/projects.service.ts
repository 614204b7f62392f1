import { AppError, notFound } from "../../lib/errors.ts";
import type { Audit } from "../../lib/audit.ts";
import type { Actor, RequestMeta } from "../../lib/request-context.ts";
import type { ListQuery, ProjectInput, ProjectPatch } from "../../../shared/schemas/projects.ts";
import { computePool } from "../../lib/compute/pool.ts";
import { photoView } from "../photos/photos.service.ts";
import type { ProjectRow, ProjectsRepository } from "./projects.repository.ts";

export const STALE_PROJECT_MESSAGE = "Someone else saved this project since you opened it.";

export function createProjectsService(deps: { repo: ProjectsRepository; audit: Audit }) {
  const { repo } = deps;

  async function requireProject(actor: Actor, id: string): Promise<ProjectRow> {
    const project = await repo.find(actor, id);
    if (!project) throw notFound("That project");
    return project;
  }

  /** Ids in the body must name rows of the caller's own company; a foreign one reads as "not found" in that field. */
  async function checkReferences(actor: Actor, input: { customerId?: string; estimatorId?: string | null }) {
    const fields: Record<string, string> = {};
    if (input.customerId !== undefined && !(await repo.customerExists(actor, input.customerId))) fields.customerId = "Choose one of your customers.";
    if (input.estimatorId) {
      const user = await repo.findUser(actor, input.estimatorId);
      if (!user || !user.isActive) fields.estimatorId = "Choose an active member of your team.";
    }
    const first = Object.entries(fields)[0];
    if (first) throw new AppError("invalid-input", `Please check ${first[0]}: ${first[1]}`, 400, fields);
  }

  return {
    requireProject,

    async list(actor: Actor, query: ListQuery) {
      const { items, total } = await repo.list(actor, query);
      return { items, total, page: query.page, pageSize: query.pageSize };
    },

    async create(actor: Actor, input: ProjectInput, meta: RequestMeta): Promise<ProjectRow> {
      await checkReferences(actor, input);
      const defaults = input.codeBasis && input.climateZone ? null : await repo.projectDefaults(actor);
      const project = await repo.insert(actor, {
        ...input,
        codeBasis: input.codeBasis ?? defaults!.codeBasis,
        climateZone: input.climateZone ?? defaults!.climateZone,
        estimatorId: input.estimatorId ?? null,
        moistureRegime: input.moistureRegime ?? null,
        notes: input.notes ?? null,
      });
      await deps.audit({ event: "project-created", companyId: actor.companyId, userId: actor.userId, detail: { projectId: project.id } }, meta);
      return project;
    },

    async detail(actor: Actor, id: string) {
      const row = await repo.detail(actor, id);
      if (!row) throw notFound("That project");
      const { customer, estimator, spaces, photos, ...project } = row;
      return { project, customer, estimator, spaces, photos: photos.map(photoView) };
    },

    async update(actor: Actor, id: string, input: ProjectPatch): Promise<ProjectRow> {
      const { version, ...patch } = input;
      await requireProject(actor, id);
      await checkReferences(actor, patch);
      const updated = await repo.updateIfVersion(actor, id, version, patch);
      if (updated) return updated;
      const current = await requireProject(actor, id);
      throw new AppError("stale-version", STALE_PROJECT_MESSAGE, 409, {}, { current });
    },

    /**
     * Every space of the project through the core, on the compute pool: the answer's JSON text
     * (`{ spaces: SpaceAnalysis[] }`), made on a worker thread so the request thread only sends it.
     */
    async analysisJson(actor: Actor, id: string): Promise<string> {
      const row = await repo.findWithSpaces(actor, id);
      if (!row) throw notFound("That project");
      const { spaces, ...project } = row;
      return computePool().run("analyzeProject", { project, spaces });
    },
  };
}
export type ProjectsService = ReturnType<typeof createProjectsService>;
