import type { CodeBasis, RoofColor, VaporRetarder } from "@shared/ventilation/index";
import { Select } from "@/components/ui/select";
import {
  CLIMATE_ZONE_OPTIONS,
  CODE_BASIS_OPTIONS,
  fitMoistureRegime,
  moistureOptions,
  ROOF_COLOR_OPTIONS,
  VAPOR_RETARDER_OPTIONS,
  type MoistureRegime,
} from "../lib/project-options";

export interface ProjectBasisValue {
  climateZone: number;
  moistureRegime: MoistureRegime | null;
  /** "" = the company's default (new projects only). */
  codeBasis: CodeBasis | "";
  ceilingVaporRetarder: VaporRetarder;
  roofColor: RoofColor;
}

export interface ProjectBasisFieldsProps {
  value: ProjectBasisValue;
  onChange: (patch: Partial<ProjectBasisValue>) => void;
  disabled?: boolean;
  errors?: Partial<Record<keyof ProjectBasisValue, string>>;
  /** Offer the company's default as the code basis (when starting a project), with these words. */
  companyDefaultLabel?: string;
}

/** What the code check depends on: climate zone and moisture regime, code text, vapor retarder, roof colour. */
export function ProjectBasisFields({ value, onChange, disabled, errors = {}, companyDefaultLabel }: ProjectBasisFieldsProps) {
  const regimes = moistureOptions(value.climateZone);
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <Select
        label="Climate zone"
        hint="From the IECC map, by county."
        options={CLIMATE_ZONE_OPTIONS}
        value={String(value.climateZone)}
        disabled={disabled}
        error={errors.climateZone}
        onChange={(event) => {
          const climateZone = Number(event.target.value);
          onChange({ climateZone, moistureRegime: fitMoistureRegime(climateZone, value.moistureRegime) });
        }}
      />
      <Select
        label="Moisture regime"
        hint={regimes.length === 0 ? "Zones 7 and 8 have none." : "The letter after the zone number."}
        options={regimes}
        placeholder={regimes.length === 0 ? "None in this zone" : "Not known"}
        value={value.moistureRegime ?? ""}
        disabled={disabled || regimes.length === 0}
        error={errors.moistureRegime}
        onChange={(event) => onChange({ moistureRegime: (event.target.value || null) as MoistureRegime | null })}
      />
      <Select
        label="Code basis"
        hint="The code text enforced locally."
        options={CODE_BASIS_OPTIONS}
        placeholder={companyDefaultLabel}
        value={value.codeBasis}
        disabled={disabled}
        error={errors.codeBasis}
        onChange={(event) => onChange({ codeBasis: event.target.value as CodeBasis | "" })}
      />
      <Select
        label="Ceiling vapor retarder"
        hint="On the warm side of the attic floor."
        options={VAPOR_RETARDER_OPTIONS}
        value={value.ceilingVaporRetarder}
        disabled={disabled}
        error={errors.ceilingVaporRetarder}
        onChange={(event) => onChange({ ceilingVaporRetarder: event.target.value as VaporRetarder })}
      />
      <Select
        // Alone on its row, and its choices are long: the full width keeps them readable.
        className="sm:col-span-2"
        label="Roof colour"
        hint="Dark roofs run hotter; fan sizing allows for it."
        options={ROOF_COLOR_OPTIONS}
        value={value.roofColor}
        disabled={disabled}
        error={errors.roofColor}
        onChange={(event) => onChange({ roofColor: event.target.value as RoofColor })}
      />
    </div>
  );
}
