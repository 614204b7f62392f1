import { ProjectPatchSchema, type ProjectPatch } from "@shared/schemas/projects";
import type { ProjectRecord } from "../api/types";

/** The project fields the page edits (everything but the customer and the version). */
export type ProjectFields = Required<Omit<ProjectPatch, "version" | "customerId">>;

export function fieldsFromRecord(p: ProjectRecord): ProjectFields {
  return {
    title: p.title,
    siteAddress: p.siteAddress,
    status: p.status,
    estimatorId: p.estimatorId,
    climateZone: p.climateZone,
    moistureRegime: p.moistureRegime,
    codeBasis: p.codeBasis,
    ceilingVaporRetarder: p.ceilingVaporRetarder,
    roofColor: p.roofColor,
    notes: p.notes,
  };
}

export interface CheckedFields {
  payload: ProjectFields | null;
  errors: Partial<Record<keyof ProjectFields, string>>;
  blockedReason: string | null;
}

/** Checks the edited fields with the shared patch schema; an invalid field holds the save back. */
export function checkFields(fields: ProjectFields): CheckedFields {
  const parsed = ProjectPatchSchema.safeParse({ ...fields, version: 1 });
  if (parsed.success) {
    const { version: _v, customerId: _c, ...rest } = parsed.data;
    return { payload: { ...fields, ...rest } as ProjectFields, errors: {}, blockedReason: null };
  }
  const errors: Partial<Record<keyof ProjectFields, string>> = {};
  for (const issue of parsed.error.issues) {
    const key = String(issue.path[0]) as keyof ProjectFields;
    errors[key] ??= issue.message;
  }
  return { payload: null, errors, blockedReason: Object.values(errors)[0] ?? "Check the project details." };
}
