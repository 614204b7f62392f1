import { useMemo } from "react";
import { buildAirflowPicture } from "@shared/airflow";
import type { AtticAnalysis, AtticInput } from "@shared/ventilation/index";
import { AirflowPicture } from "@/components/airflow/airflow-picture";

export interface AirflowSectionProps {
  input: AtticInput;
  analysis: AtticAnalysis;
  spaceName: string;
}

/** The airflow cross-section of this space, from the same picture data the PDF draws. */
export function AirflowSection({ input, analysis, spaceName }: AirflowSectionProps) {
  const picture = useMemo(() => {
    try {
      return buildAirflowPicture(input, analysis);
    } catch {
      // A survey the picture can't draw yet (it is still being typed): say so instead of breaking the panel.
      return null;
    }
  }, [input, analysis]);
  return (
    <section aria-labelledby="airflow-title" className="space-y-2">
      <h3 id="airflow-title" className="text-lg font-semibold text-ink-900">
        Airflow picture
      </h3>
      {picture ? (
        <div className="rounded-md border border-ink-200 bg-white p-2">
          <AirflowPicture picture={picture} title={`Airflow in ${spaceName} as surveyed`} />
        </div>
      ) : (
        <p className="text-base text-ink-700">The picture appears once the floor sections and vents are complete.</p>
      )}
    </section>
  );
}
