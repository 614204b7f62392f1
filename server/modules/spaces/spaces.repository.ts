import { asc, eq, sql } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { atticSpaces, projects } from "../../db/schema/index.ts";
import { scoped } from "../../lib/tenant.ts";
import type { Actor } from "../../lib/request-context.ts";
import type { SpaceSurvey } from "../../../shared/schemas/survey.ts";
import type { Vent } from "../../../shared/ventilation/index.ts";

export const spaceColumns = {
  id: atticSpaces.id, projectId: atticSpaces.projectId, name: atticSpaces.name, position: atticSpaces.position,
  version: atticSpaces.version, roof: atticSpaces.roof, sections: atticSpaces.sections, vents: atticSpaces.vents,
  site: atticSpaces.site, notes: atticSpaces.notes, createdAt: atticSpaces.createdAt, updatedAt: atticSpaces.updatedAt,
};

const inProject = (projectId: string, spaceId: string) => [eq(atticSpaces.projectId, projectId), eq(atticSpaces.id, spaceId)];

export function createSpacesRepository(db: Database) {
  type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];
  /** A survey edit changes the project too: it moves up the "recently updated" list. */
  const touchProject = (tx: Tx, actor: Actor, projectId: string) =>
    tx.update(projects).set({ updatedAt: new Date() }).where(scoped(projects, actor, eq(projects.id, projectId)));

  return {
    listForProject: (actor: Actor, projectId: string) =>
      db.select(spaceColumns).from(atticSpaces).where(scoped(atticSpaces, actor, eq(atticSpaces.projectId, projectId))).orderBy(asc(atticSpaces.position), asc(atticSpaces.createdAt)),

    async find(actor: Actor, projectId: string, spaceId: string) {
      const [row] = await db.select(spaceColumns).from(atticSpaces).where(scoped(atticSpaces, actor, ...inProject(projectId, spaceId))).limit(1);
      return row ?? null;
    },

    /** Any space of the caller's company by id, whatever its project. */
    async findById(actor: Actor, spaceId: string) {
      const [row] = await db.select(spaceColumns).from(atticSpaces).where(scoped(atticSpaces, actor, eq(atticSpaces.id, spaceId))).limit(1);
      return row ?? null;
    },

    /**
     * Adds the space at the end of the project's list. With an id given, null when a row with that
     * id exists already (a parallel copy of this creation, or anyone else's): the caller decides.
     */
    insert: (actor: Actor, projectId: string, survey: SpaceSurvey, id?: string) =>
      db.transaction(async (tx) => {
        const [{ next } = { next: 0 }] = await tx
          .select({ next: sql<number>`coalesce(max(${atticSpaces.position}) + 1, 0)::int` })
          .from(atticSpaces).where(scoped(atticSpaces, actor, eq(atticSpaces.projectId, projectId)));
        const [row] = await tx
          .insert(atticSpaces)
          .values({ ...survey, ...(id ? { id } : {}), companyId: actor.companyId, projectId, position: next })
          .onConflictDoNothing({ target: atticSpaces.id })
          .returning(spaceColumns);
        if (!row) return null;
        await touchProject(tx, actor, projectId);
        return row;
      }),

    /** Saves the whole survey only if the stored version is the one the editor saw (one statement). */
    saveIfVersion: (actor: Actor, projectId: string, spaceId: string, version: number, survey: SpaceSurvey) =>
      db.transaction(async (tx) => {
        const [row] = await tx
          .update(atticSpaces)
          .set({ ...survey, version: sql`${atticSpaces.version} + 1`, updatedAt: new Date() })
          .where(scoped(atticSpaces, actor, ...inProject(projectId, spaceId), eq(atticSpaces.version, version)))
          .returning(spaceColumns);
        if (row) await touchProject(tx, actor, projectId);
        return row ?? null;
      }),

    /** Appends vents in SQL, so vents another editor added meanwhile are kept. */
    appendVents: (actor: Actor, projectId: string, spaceId: string, vents: Vent[]) =>
      db.transaction(async (tx) => {
        const [row] = await tx
          .update(atticSpaces)
          .set({ vents: sql`${atticSpaces.vents} || ${JSON.stringify(vents)}::jsonb`, version: sql`${atticSpaces.version} + 1`, updatedAt: new Date() })
          .where(scoped(atticSpaces, actor, ...inProject(projectId, spaceId)))
          .returning(spaceColumns);
        if (row) await touchProject(tx, actor, projectId);
        return row ?? null;
      }),

    remove: (actor: Actor, projectId: string, spaceId: string) =>
      db.transaction(async (tx) => {
        const rows = await tx.delete(atticSpaces).where(scoped(atticSpaces, actor, ...inProject(projectId, spaceId))).returning({ id: atticSpaces.id });
        if (rows.length) await touchProject(tx, actor, projectId);
        return rows.length > 0;
      }),
  };
}
export type SpacesRepository = ReturnType<typeof createSpacesRepository>;
export type SpaceRow = NonNullable<Awaited<ReturnType<SpacesRepository["find"]>>>;
