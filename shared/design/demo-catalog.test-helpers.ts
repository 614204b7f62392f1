/**
 * A small demo-like catalog for tests and benchmarks (Tallgrass Exteriors, Marrow Creek; invented
 * generic names, no brands or model numbers). NFA and airflow figures are typical values from
 * memory; a real product's label wins. Prices are invented.
 */
import type { CatalogItem } from "../schemas/catalog";

const id = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, "0")}`;

export const DEMO_IDS = {
  ridge: id(1),
  soffitStrip: id(2),
  staticVent: id(3),
  roundSoffit: id(4),
  rectSoffit: id(5),
  turbine: id(6),
  roofFan: id(7),
  baffle: id(8),
  insulationClearing: id(9),
  patch: id(10),
  sealGable: id(11),
  disconnect: id(12),
  deckCut: id(13),
  labor: id(14),
  retiredStatic: id(15),
  bathFanDuct: id(16),
} as const;

const item = (fields: Partial<CatalogItem> & Pick<CatalogItem, "id" | "sku" | "name" | "kind" | "unit" | "sellPriceCents">): CatalogItem => ({
  nfaSqInPerUnit: null,
  nfaSqInPerFt: null,
  cfm: null,
  soldInLengthFt: null,
  materialCostCents: Math.round(fields.sellPriceCents * 0.45),
  laborMinutesPerUnit: 0,
  isActive: true,
  ...fields,
});

export function demoCatalog(): CatalogItem[] {
  return [
    // Typical values from memory; a real product's label wins.
    item({ id: DEMO_IDS.ridge, sku: "RV-4", name: "Shingle-over ridge vent, 4 ft", kind: "ridge", unit: "linear-ft", nfaSqInPerFt: 18, soldInLengthFt: 4, sellPriceCents: 750, laborMinutesPerUnit: 3 }),
    item({ id: DEMO_IDS.soffitStrip, sku: "SS-8", name: "Continuous soffit strip, 8 ft", kind: "soffit-continuous", unit: "linear-ft", nfaSqInPerFt: 9, soldInLengthFt: 8, sellPriceCents: 400, laborMinutesPerUnit: 4 }),
    item({ id: DEMO_IDS.staticVent, sku: "SRV", name: "Static roof vent", kind: "box", unit: "each", nfaSqInPerUnit: 50, sellPriceCents: 3_500, laborMinutesPerUnit: 30 }),
    item({ id: DEMO_IDS.roundSoffit, sku: "RSV-4", name: "Round soffit vent 4 in", kind: "soffit-individual", unit: "each", nfaSqInPerUnit: 9, sellPriceCents: 600, laborMinutesPerUnit: 10 }),
    item({ id: DEMO_IDS.rectSoffit, sku: "SV-16x8", name: "Rectangular soffit vent 16 × 8 in", kind: "soffit-individual", unit: "each", nfaSqInPerUnit: 56, sellPriceCents: 1_800, laborMinutesPerUnit: 15 }),
    item({ id: DEMO_IDS.turbine, sku: "TV-12", name: "Turbine vent 12 in", kind: "turbine", unit: "each", nfaSqInPerUnit: 112, sellPriceCents: 8_500, laborMinutesPerUnit: 45 }),
    item({ id: DEMO_IDS.roofFan, sku: "PRF", name: "Powered roof fan", kind: "powered-roof", unit: "each", cfm: 1_200, sellPriceCents: 32_000, laborMinutesPerUnit: 120 }),
    item({ id: DEMO_IDS.baffle, sku: "BAF", name: "Rafter-bay baffle (vent chute)", kind: "baffle", unit: "each", sellPriceCents: 450, laborMinutesPerUnit: 5 }),
    item({ id: DEMO_IDS.insulationClearing, sku: "CLR", name: "Pull insulation back from the eaves", kind: "insulation-clearing", unit: "linear-ft", sellPriceCents: 150, laborMinutesPerUnit: 2 }),
    item({ id: DEMO_IDS.patch, sku: "PATCH", name: "Patch a roof vent opening (deck and shingles)", kind: "patch-vent-opening", unit: "each", sellPriceCents: 9_500, laborMinutesPerUnit: 60 }),
    item({ id: DEMO_IDS.sealGable, sku: "SEAL-G", name: "Seal a gable opening from inside", kind: "seal-gable-opening", unit: "each", sellPriceCents: 6_500, laborMinutesPerUnit: 45 }),
    item({ id: DEMO_IDS.disconnect, sku: "DISC", name: "Disconnect a fan circuit (licensed electrician)", kind: "electrical-disconnect", unit: "each", sellPriceCents: 15_000 }),
    item({ id: DEMO_IDS.deckCut, sku: "CUT", name: "Cut the ridge slot in the roof deck", kind: "deck-cut", unit: "linear-ft", sellPriceCents: 200, laborMinutesPerUnit: 2 }),
    item({ id: DEMO_IDS.labor, sku: "LAB", name: "Installation labour", kind: "labor", unit: "hour", sellPriceCents: 9_500 }),
    item({ id: DEMO_IDS.bathFanDuct, sku: "BATH-DUCT", name: "Duct a bath fan to a roof cap", kind: "bath-fan-duct", unit: "each", sellPriceCents: 28_500, laborMinutesPerUnit: 90 }),
    item({ id: DEMO_IDS.retiredStatic, sku: "OLD-SRV", name: "Static roof vent (discontinued)", kind: "box", unit: "each", nfaSqInPerUnit: 60, sellPriceCents: 1_000, isActive: false }),
  ];
}
