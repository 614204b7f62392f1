/**
 * Vent kinds (trade terms, DESIGN.md §4) and what each implies for the rules.
 */

export const VENT_KINDS = [
  "ridge",
  "soffit-continuous",
  "soffit-individual",
  "drip-edge",
  "fascia",
  "box",
  "turbine",
  "off-ridge",
  "cupola",
  "gable-louver",
  "powered-roof",
  "powered-gable",
  "solar-powered",
  "whole-house-fan",
] as const;

export type VentKind = (typeof VENT_KINDS)[number];

export const POWERED_KINDS: ReadonlySet<VentKind> = new Set<VentKind>(["powered-roof", "powered-gable", "solar-powered"]);

/** Eave and cornice vents: the "eave or cornice vents" of IRC R806.2. */
export const EAVE_KINDS: ReadonlySet<VentKind> = new Set<VentKind>([
  "soffit-continuous",
  "soffit-individual",
  "drip-edge",
  "fascia",
]);

/**
 * Kinds that sit at (or within inches of) the ridge, so their drop below the ridge is taken as
 * 0 ft when the estimator did not record one. An off-ridge vent sits just below the ridge line;
 * a cupola straddles it. This is Eavesight's assumption and is stated in the reasons.
 */
export const AT_RIDGE_KINDS: ReadonlySet<VentKind> = new Set<VentKind>(["ridge", "off-ridge", "cupola"]);

/** Powered ATTIC fans: they pull air out of the attic (and size by HVI's attic rules). */
export const isPoweredKind = (kind: VentKind): boolean => POWERED_KINDS.has(kind);

/**
 * A whole-house fan is a different device: mounted in a ceiling, it pulls house air (and outdoor
 * air through open windows) INTO the attic, which must let it out through its vents — any of them,
 * ridge included. It is rated in cfm and has no net free area of its own.
 */
export const isWholeHouseFanKind = (kind: VentKind): boolean => kind === "whole-house-fan";

/** Rated in cfm, no net free area: attic fans and whole-house fans. */
export const isMechanicalKind = (kind: VentKind): boolean => isPoweredKind(kind) || isWholeHouseFanKind(kind);

export const VENT_KIND_LABELS: Readonly<Record<VentKind, string>> = {
  ridge: "ridge vent",
  "soffit-continuous": "continuous soffit vent",
  "soffit-individual": "individual soffit vent",
  "drip-edge": "drip-edge intake vent",
  fascia: "fascia vent",
  box: "box (static) vent",
  turbine: "turbine vent",
  "off-ridge": "off-ridge vent",
  cupola: "cupola",
  "gable-louver": "gable louver",
  "powered-roof": "powered roof fan",
  "powered-gable": "powered gable fan",
  "solar-powered": "solar-powered fan",
  "whole-house-fan": "whole-house fan",
};

/**
 * How a sentence names a vent: its kind, with the estimator's label when there is one. Ids are
 * never shown (they are often generated), so a homeowner reads "the ridge vent", not a code.
 *
 * @example
 * ventDisplayName({ kind: "gable-louver", label: "north gable" }) // 'the gable louver "north gable"'
 * ventDisplayName({ kind: "ridge" })                              // "the ridge vent"
 */
export function ventDisplayName(vent: { kind: VentKind; label?: string | undefined }): string {
  const label = vent.label?.trim();
  return label ? `the ${VENT_KIND_LABELS[vent.kind]} "${label}"` : THE_KIND[vent.kind];
}

/** "the ridge vent", … built once: most vents have no label and a big attic names them often. */
const THE_KIND = Object.fromEntries(VENT_KINDS.map((kind) => [kind, `the ${VENT_KIND_LABELS[kind]}`])) as Readonly<Record<VentKind, string>>;

/** Several vents in one phrase, each name once: "the ridge vent and the box (static) vent". */
export function ventListPhrase(vents: ReadonlyArray<{ kind: VentKind; label?: string | undefined }>): string {
  const unique = new Set<string>();
  for (const vent of vents) unique.add(ventDisplayName(vent));
  const names = [...unique];
  if (names.length <= 1) return names[0] ?? "";
  return `${names.slice(0, -1).join(", ")} and ${names[names.length - 1]}`;
}
