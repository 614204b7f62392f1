import { useDeferredValue, useMemo } from "react";
import { buildAirflowPicture } from "@shared/airflow";
import type { AirflowResult } from "@shared/airflow-model/index";
import type { AtticAnalysis, AtticInput } from "@shared/ventilation/index";
import { AirflowPicture } from "@/components/airflow/airflow-picture";

export interface AirflowSectionProps {
  input: AtticInput;
  analysis: AtticAnalysis;
  /** The summer airflow estimate: arrows are drawn as wide as their cfm. */
  airflow: AirflowResult | null;
  spaceName: string;
  /** False while the panel is hidden behind the phone's Survey tab: the picture is drawn when it shows. */
  isShown: boolean;
}

/** The airflow cross-section of this space, from the same picture data the PDF draws. */
export function AirflowSection({ input, analysis, airflow, spaceName, isShown }: AirflowSectionProps) {
  // Building and laying out the picture costs more than the rest of the panel: the typed character
  // and the figures above paint first, and the picture follows in a render the next key can interrupt.
  const drawnInput = useDeferredValue(input);
  const drawnAnalysis = useDeferredValue(analysis);
  const drawnAirflow = useDeferredValue(airflow);
  const picture = useMemo(() => {
    if (!isShown) return null;
    try {
      return buildAirflowPicture(drawnInput, drawnAnalysis, drawnAirflow ? { airflow: drawnAirflow } : {});
    } catch {
      // A survey the picture can't draw yet (it is still being typed): say so instead of breaking the panel.
      return null;
    }
  }, [isShown, drawnInput, drawnAnalysis, drawnAirflow]);
  const title = `Airflow in ${spaceName} as surveyed`;
  // The same element until the picture changes, so the urgent render skips the drawing entirely.
  const drawing = useMemo(() => (picture ? <AirflowPicture picture={picture} title={title} /> : null), [picture, title]);
  return (
    <section aria-labelledby="airflow-title" className="space-y-2">
      <h3 id="airflow-title" className="text-lg font-semibold text-ink-900">
        Airflow picture
      </h3>
      {!isShown ? null : drawing ? (
        <div className="rounded-md border border-ink-200 bg-white p-2">{drawing}</div>
      ) : (
        <p className="text-base text-ink-700">The picture appears once the floor sections and vents are complete.</p>
      )}
    </section>
  );
}
