import { useId, useMemo, useState } from "react";
import { buildAirflowPicture } from "@shared/airflow";
import { AirflowPicture } from "@/components/airflow/airflow-picture";
import { Tabs, tabId, tabPanelId } from "@/components/ui/tabs";
import type { AnalysedAttic } from "../lib/live";

function usePicture(attic: AnalysedAttic | null) {
  return useMemo(() => {
    if (!attic?.input || !attic.result.ok) return null;
    try {
      return buildAirflowPicture(attic.input, attic.result.analysis);
    } catch {
      return null; // a space the picture can't draw yet
    }
  }, [attic]);
}

export interface AirflowViewProps {
  spaceName: string;
  before?: AnalysedAttic | null;
  after: AnalysedAttic;
  /** Show the before/after switch (the editor); the compare view shows "after" only. */
  hasToggle?: boolean;
}

/** The option's airflow cross-section, with a switch to the attic as surveyed. */
export function AirflowView({ spaceName, before = null, after, hasToggle = true }: AirflowViewProps) {
  const [which, setWhich] = useState<"after" | "before">("after");
  const idBase = useId().replace(/:/g, "");
  const beforePicture = usePicture(before);
  const afterPicture = usePicture(after);
  const picture = which === "before" ? beforePicture : afterPicture;
  const title = which === "before" ? `Airflow in ${spaceName} today, as surveyed` : `Airflow in ${spaceName} after this option's work`;
  return (
    <div className="space-y-2">
      {hasToggle && before ? (
        <Tabs
          label={`Airflow picture of ${spaceName}`}
          idBase={idBase}
          isFullWidth
          value={which}
          onChange={setWhich}
          items={[
            { value: "after", label: "After the work" },
            { value: "before", label: "Today (surveyed)" },
          ]}
        />
      ) : null}
      <div
        role={hasToggle && before ? "tabpanel" : undefined}
        id={hasToggle && before ? tabPanelId(idBase, which) : undefined}
        aria-labelledby={hasToggle && before ? tabId(idBase, which) : undefined}
        className="rounded-md border border-ink-200 bg-white p-2"
      >
        {picture ? (
          <AirflowPicture picture={picture} title={title} />
        ) : (
          <p className="p-3 text-base text-ink-700">The picture appears once this space can be analysed.</p>
        )}
      </div>
    </div>
  );
}
