import { useQuery } from "@tanstack/react-query";
import type { ProjectStatus } from "@shared/schemas/projects";
import { TextArea, TextField } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { projectQueries } from "../api/queries";
import type { ProjectDetailsValue } from "../api/types";
import { STATUS_OPTIONS } from "../lib/project-options";
import { ProjectBasisFields } from "./project-basis-fields";

export interface ProjectDetailsFieldsProps {
  value: ProjectDetailsValue;
  onChange: (patch: Partial<ProjectDetailsValue>) => void;
  isReadOnly: boolean;
  /** Messages beside fields, keyed by field name. */
  errors?: Partial<Record<keyof ProjectDetailsValue, string>>;
}

/** The project's own details, edited in place on the project page (it saves itself). */
export function ProjectDetailsFields({ value, onChange, isReadOnly, errors = {} }: ProjectDetailsFieldsProps) {
  const estimators = useQuery(projectQueries.estimators());
  const estimatorOptions = (estimators.data ?? []).map((e) => ({ value: e.id, label: e.name }));
  if (value.estimatorId && !estimatorOptions.some((o) => o.value === value.estimatorId)) {
    estimatorOptions.push({ value: value.estimatorId, label: "Current estimator (no longer active)" });
  }
  return (
    <fieldset disabled={isReadOnly} className="space-y-4">
      <legend className="sr-only">Project details</legend>
      <TextField
        label="Project title"
        value={value.title}
        error={errors.title}
        onChange={(event) => onChange({ title: event.target.value })}
      />
      <TextArea
        label="Site address"
        rows={2}
        value={value.siteAddress}
        error={errors.siteAddress}
        onChange={(event) => onChange({ siteAddress: event.target.value })}
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <Select
          label="Status"
          options={STATUS_OPTIONS}
          value={value.status}
          error={errors.status}
          onChange={(event) => onChange({ status: event.target.value as ProjectStatus })}
        />
        <Select
          label="Estimator"
          options={estimatorOptions}
          placeholder="Not assigned"
          value={value.estimatorId ?? ""}
          error={errors.estimatorId}
          onChange={(event) => onChange({ estimatorId: event.target.value || null })}
        />
      </div>
      <ProjectBasisFields
        value={{ ...value, moistureRegime: value.moistureRegime ?? null }}
        disabled={isReadOnly}
        errors={errors}
        onChange={(patch) => {
          const { codeBasis, ...rest } = patch;
          onChange(codeBasis ? { ...rest, codeBasis } : rest);
        }}
      />
      <TextArea
        label="Project notes"
        rows={3}
        isOptional
        value={value.notes ?? ""}
        error={errors.notes}
        onChange={(event) => onChange({ notes: event.target.value === "" ? null : event.target.value })}
      />
    </fieldset>
  );
}
