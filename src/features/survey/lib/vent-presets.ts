import type { UnitSystem } from "@shared/units/format";
import type { VentKind } from "@shared/ventilation/index";
import { emptyVent, type VentDraft } from "./drafts";
import { entryFromLength, numberEntry } from "./measure";

/**
 * Quick-add buttons for the vents found in most attics, started with typical values so the
 * estimator edits rather than types from nothing. These are common sizes, not any product's
 * rating: the form marks them "typical, check the label" until the estimator confirms them.
 */
export interface VentPreset {
  kind: VentKind;
  label: string;
  /** One line saying what was filled in. */
  summary: string;
  make: (context: { ridgeLengthFt: number | null; eaveLengthFt: number | null; system: UnitSystem }) => VentDraft;
}

const withNumbers = (draft: VentDraft, patch: Partial<Record<"quantity" | "nfaPerUnit" | "nfaPerFt" | "cfm" | "setPoint", string>>): VentDraft => {
  const next = { ...draft };
  for (const [key, text] of Object.entries(patch) as [keyof typeof patch, string][]) {
    next[key] = numberEntry(text, { isWhole: key === "quantity" });
  }
  return next;
};

export const VENT_PRESETS: readonly VentPreset[] = [
  {
    kind: "ridge",
    label: "Ridge vent",
    summary: "ridge length less 1 ft at each end, 18 sq in per ft",
    make: ({ ridgeLengthFt, system }) => ({
      ...withNumbers(emptyVent("ridge"), { nfaPerFt: "18" }),
      length: entryFromLength(ridgeLengthFt !== null && ridgeLengthFt > 4 ? ridgeLengthFt - 2 : 30, system),
    }),
  },
  {
    kind: "soffit-continuous",
    label: "Continuous soffit",
    summary: "the eave length, 9 sq in per ft",
    make: ({ eaveLengthFt, system }) => ({
      ...withNumbers(emptyVent("soffit-continuous"), { nfaPerFt: "9" }),
      length: entryFromLength(eaveLengthFt ?? 60, system),
    }),
  },
  {
    kind: "soffit-individual",
    label: "Soffit vents, 8 × 16",
    summary: "10 vents, 56 sq in each",
    make: () => withNumbers(emptyVent("soffit-individual"), { quantity: "10", nfaPerUnit: "56" }),
  },
  {
    kind: "box",
    label: "Box vents",
    summary: "4 vents, 50 sq in each",
    make: () => withNumbers(emptyVent("box"), { quantity: "4", nfaPerUnit: "50" }),
  },
  {
    kind: "turbine",
    label: "Turbines, 12 in",
    summary: "2 turbines, 112 sq in each",
    make: () => withNumbers(emptyVent("turbine"), { quantity: "2", nfaPerUnit: "112" }),
  },
  {
    kind: "gable-louver",
    label: "Gable louver",
    summary: "18 × 24 in opening, louvers and 1/8 in mesh",
    make: () => {
      const v = emptyVent("gable-louver");
      return { ...v, grossWidth: { text: "18", value: 18, error: null, understood: "18 in (45.7 cm)" }, grossHeight: { text: "24", value: 24, error: null, understood: "24 in (61 cm)" } };
    },
  },
  {
    kind: "powered-gable",
    label: "Powered gable fan",
    summary: "1,200 cfm, thermostat at 100 °F",
    make: () => ({ ...withNumbers(emptyVent("powered-gable"), { cfm: "1200", setPoint: "100" }), control: "thermostat" }),
  },
  {
    kind: "powered-roof",
    label: "Powered roof fan",
    summary: "1,200 cfm, thermostat at 100 °F",
    make: () => ({ ...withNumbers(emptyVent("powered-roof"), { cfm: "1200", setPoint: "100" }), control: "thermostat" }),
  },
];
