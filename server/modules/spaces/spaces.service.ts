import { randomUUID } from "node:crypto";
import { AppError, notFound } from "../../lib/errors.ts";
import type { Actor } from "../../lib/request-context.ts";
import { SpaceRoofSchema, type SpaceSurvey } from "../../../shared/schemas/survey.ts";
import { LIMITS, type Vent } from "../../../shared/ventilation/index.ts";
import type { ProjectsRepository } from "../projects/projects.repository.ts";
import type { SpaceRow, SpacesRepository } from "./spaces.repository.ts";

export const staleSpaceMessage = "Someone else saved this attic space since you opened it.";

/**
 * What the core's cross-field rules would refuse, checked at save time so a stored survey
 * never has two vents with one id (photos point at vent ids) or a vent on a missing section.
 */
export function surveyProblems(survey: Pick<SpaceSurvey, "sections" | "vents">): Record<string, string> {
  const fields: Record<string, string> = {};
  const sectionIds = new Set<string>();
  survey.sections.forEach((s, i) => {
    if (s.id === undefined) return;
    if (sectionIds.has(s.id)) fields[`sections.${i}.id`] = `Section id "${s.id}" is used twice.`;
    sectionIds.add(s.id);
  });
  const ventIds = new Set<string>();
  survey.vents.forEach((v, i) => {
    if (ventIds.has(v.id)) fields[`vents.${i}.id`] = `Vent id "${v.id}" is used twice.`;
    ventIds.add(v.id);
    if (v.sectionId !== undefined && !sectionIds.has(v.sectionId)) fields[`vents.${i}.sectionId`] = `No section has the id "${v.sectionId}".`;
  });
  return fields;
}

function assertConsistent(survey: SpaceSurvey) {
  const fields = surveyProblems(survey);
  const first = Object.entries(fields)[0];
  if (first) throw new AppError("invalid-input", `Please check ${first[0]}: ${first[1]}`, 400, fields);
}

/** A copied vent is a new physical vent: a new id, no section of the other space, no fan readings of the other fan. */
export function copyOfVent(vent: Vent): Vent {
  const { sectionId: _section, diagnostics: _readings, ...rest } = vent;
  return { ...rest, id: randomUUID() };
}

/** An id made on a device that some other record already has: said without naming that record. */
export const idTaken = (what: string) =>
  new AppError("id-taken", `This ${what} id is already used by something else. Create it again to get a new id.`, 409);

function sameProjectOrTaken(space: SpaceRow, projectId: string): SpaceRow {
  if (space.projectId !== projectId) throw idTaken("attic space");
  return space;
}

export function createSpacesService(deps: { repo: SpacesRepository; projects: ProjectsRepository }) {
  const { repo } = deps;

  async function requireProject(actor: Actor, projectId: string) {
    const project = await deps.projects.find(actor, projectId);
    if (!project) throw notFound("That project");
    return project;
  }
  async function requireSpace(actor: Actor, projectId: string, spaceId: string) {
    const space = await repo.find(actor, projectId, spaceId);
    if (!space) throw notFound("That attic space");
    return space;
  }

  return {
    requireSpace,

    /**
     * Adds a space. With an id made on the device, the same creation sent again answers the space
     * already made (`isNew: false`) instead of a second one; an id used elsewhere answers 409.
     */
    async create(actor: Actor, projectId: string, input: Partial<SpaceSurvey> & { name: string; id?: string }): Promise<{ space: SpaceRow; isNew: boolean }> {
      await requireProject(actor, projectId);
      if (input.id) {
        const existing = await repo.findById(actor, input.id);
        if (existing) return { space: sameProjectOrTaken(existing, projectId), isNew: false };
      }
      if ((await repo.listForProject(actor, projectId)).length >= LIMITS.maxSpacesPerProject) {
        throw new AppError("invalid-input", `A project has at most ${LIMITS.maxSpacesPerProject} attic spaces.`, 400, { name: `At most ${LIMITS.maxSpacesPerProject} attic spaces in one project.` });
      }
      const survey: SpaceSurvey = {
        name: input.name,
        roof: input.roof ?? SpaceRoofSchema.parse({}),
        sections: input.sections ?? [],
        vents: input.vents ?? [],
        site: input.site ?? {},
        notes: input.notes ?? null,
      };
      assertConsistent(survey);
      const inserted = await repo.insert(actor, projectId, survey, input.id);
      if (inserted) return { space: inserted, isNew: true };
      // Another copy of this creation committed first, or the id is another company's.
      const existing = input.id ? await repo.findById(actor, input.id) : null;
      if (!existing) throw idTaken("attic space");
      return { space: sameProjectOrTaken(existing, projectId), isNew: false };
    },

    async save(actor: Actor, projectId: string, spaceId: string, input: SpaceSurvey & { version: number }): Promise<SpaceRow> {
      await requireProject(actor, projectId);
      const { version, ...survey } = input;
      assertConsistent(survey);
      const saved = await repo.saveIfVersion(actor, projectId, spaceId, version, survey);
      if (saved) return saved;
      const current = await requireSpace(actor, projectId, spaceId);
      throw new AppError("stale-version", staleSpaceMessage, 409, {}, { current });
    },

    async remove(actor: Actor, projectId: string, spaceId: string) {
      if (!(await repo.remove(actor, projectId, spaceId))) throw notFound("That attic space");
    },

    async copyVents(actor: Actor, projectId: string, spaceId: string, fromSpaceId: string): Promise<SpaceRow> {
      const target = await requireSpace(actor, projectId, spaceId);
      if (fromSpaceId === spaceId) {
        throw new AppError("invalid-input", "Choose a different space to copy vents from.", 400, { fromSpaceId: "Choose a different space to copy vents from." });
      }
      const source = await repo.find(actor, projectId, fromSpaceId);
      if (!source) throw new AppError("invalid-input", "That space is not part of this project.", 400, { fromSpaceId: "That space is not part of this project." });
      if (source.vents.length === 0) throw new AppError("invalid-input", "That space has no vents to copy.", 400, { fromSpaceId: "That space has no vents to copy." });
      if (target.vents.length + source.vents.length > LIMITS.maxVents) {
        throw new AppError("invalid-input", `A space can hold at most ${LIMITS.maxVents.toLocaleString("en-US")} vents.`, 400, { fromSpaceId: "Copying these vents would pass the limit of vents in one space." });
      }
      const updated = await repo.appendVents(actor, projectId, spaceId, source.vents.map(copyOfVent));
      if (!updated) throw notFound("That attic space");
      return updated;
    },
  };
}
export type SpacesService = ReturnType<typeof createSpacesService>;
