/** fast-check arbitraries built from the schema's own ranges (LIMITS), for property tests. */
import fc from "fast-check";
import type { AtticInput, Section, Vent } from "./schema";
import { CODE_BASES, LIMITS } from "./schema";
import { isMechanicalKind, VENT_KINDS } from "./vent-kinds";

const pos = (max: number) => fc.double({ min: 0.01, max, noNaN: true, noDefaultInfinity: true });
const opt = <T>(arb: fc.Arbitrary<T>) => fc.option(arb, { nil: undefined });

const roof = fc.record(
  {
    roofForm: opt(fc.constantFrom("gable" as const, "hip" as const, "shed" as const)),
    pitchIn12: opt(fc.double({ min: 0, max: LIMITS.maxPitchIn12, noNaN: true })),
    spanFt: opt(pos(LIMITS.maxSideFt)),
  },
  { requiredKeys: [] },
);

const convexPolygon = fc
  // Radius ≤ 250 ft keeps the area under π × 250² ≈ 196,350 sq ft, inside LIMITS.maxSectionAreaSqFt.
  .tuple(fc.integer({ min: 3, max: 12 }), pos(250), fc.double({ min: -1000, max: 1000, noNaN: true }), fc.double({ min: -1000, max: 1000, noNaN: true }))
  .map(([n, r, cx, cy]) =>
    Array.from({ length: n }, (_, i) => [cx + r * Math.cos((2 * Math.PI * i) / n), cy + r * Math.sin((2 * Math.PI * i) / n)] as [number, number]),
  );

export const sectionArb: fc.Arbitrary<Section> = fc.oneof(
  fc.tuple(pos(LIMITS.maxSideFt), pos(LIMITS.maxSideFt), roof).map(([lengthFt, widthFt, r]) => ({ kind: "rect" as const, lengthFt, widthFt, ...clean(r) })),
  fc.tuple(pos(LIMITS.maxSectionAreaSqFt), roof).map(([areaSqFt, r]) => ({ kind: "area" as const, areaSqFt, ...clean(r) })),
  fc.tuple(convexPolygon, roof).map(([pointsFt, r]) => ({ kind: "polygon" as const, pointsFt, ...clean(r) })),
);

function clean<T extends object>(value: T): T {
  return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as T;
}

const passiveKinds = VENT_KINDS.filter((k) => !isMechanicalKind(k));
/** Attic fans and whole-house fans: rated in cfm. */
const poweredKinds = VENT_KINDS.filter((k) => isMechanicalKind(k));

const placement = fc.record(
  {
    location: fc.constantFrom("upper" as const, "lower" as const),
    dropBelowRidgeFt: opt(fc.double({ min: 0, max: LIMITS.maxHeightFt, noNaN: true })),
    heightAboveEaveFt: opt(fc.double({ min: 0, max: LIMITS.maxHeightFt, noNaN: true })),
    quantity: opt(fc.integer({ min: 1, max: LIMITS.maxQuantity })),
  },
  { requiredKeys: ["location"] },
);

const passiveSize = fc.oneof(
  pos(LIMITS.maxNfaSqInPerUnit).map((nfaSqIn) => ({ nfaSqIn })),
  pos(LIMITS.maxNfaSqInPerUnit).map((nfaSqInPerUnit) => ({ nfaSqInPerUnit })),
  fc.tuple(pos(LIMITS.maxVentLengthFt), pos(LIMITS.maxNfaSqInPerFt)).map(([lengthFt, nfaSqInPerFt]) => ({ lengthFt, nfaSqInPerFt })),
  fc
    .tuple(pos(LIMITS.maxGrossSideIn), pos(LIMITS.maxGrossSideIn), fc.constantFrom("1/4" as const, "1/8" as const, "1/16" as const), fc.boolean(), opt(fc.constantFrom("wood" as const, "metal" as const)))
    .map(([grossWidthIn, grossHeightIn, mesh, louvers, louverMaterial]) => ({ grossWidthIn, grossHeightIn, covering: clean({ mesh, louvers, louverMaterial }) })),
);

const conditionArb = fc.oneof(
  fc.constant({}),
  fc.constantFrom({ condition: "open" as const }, { condition: "blocked" as const }, { condition: "painted-over" as const }, { condition: "damaged" as const }),
  fc.double({ min: 0, max: 1, noNaN: true }).map((blockedShare) => ({ condition: "partly-blocked" as const, blockedShare })),
);

export const passiveVentArb = (id: string): fc.Arbitrary<Vent> =>
  fc
    .tuple(fc.constantFrom(...passiveKinds), placement, passiveSize, conditionArb, fc.nat())
    .map(([kind, p, size, condition, n]) => {
      const vent = { id, kind, ...clean(p), ...size, ...condition } as Vent;
      // Now and then "k of quantity" blocked instead of a share.
      if (vent.condition === "partly-blocked" && n % 2 === 0) {
        delete vent.blockedShare;
        vent.blockedQuantity = n % ((vent.quantity ?? 1) + 1);
      }
      return vent;
    });

const diagnosticsArb = fc.record(
  {
    isPowerVerifiedOff: fc.boolean(),
    isLockedOut: fc.boolean(),
    isTesterProven: fc.boolean(),
    windingToGroundOhms: fc.oneof(fc.constant("open" as const), fc.double({ min: 0, max: 1e12, noNaN: true })),
    hasCapacitor: fc.boolean(),
    capacitor: fc.record({ ratedMicrofarads: fc.double({ min: 0.1, max: 1000, noNaN: true }), measuredMicrofarads: fc.double({ min: 0, max: 2000, noNaN: true }) }),
    windingResistanceOhms: fc.oneof(fc.constant("open" as const), fc.double({ min: 0, max: 1e12, noNaN: true })),
    thermostatTest: fc.record({
      switchedLegVoltsDialBelow: fc.double({ min: 0, max: 300, noNaN: true }),
      switchedLegVoltsDialAbove: fc.double({ min: 0, max: 300, noNaN: true }),
    }),
    isBladeFreeToSpin: fc.boolean(),
  },
  { requiredKeys: [] },
);

export const poweredVentArb = (id: string): fc.Arbitrary<Vent> =>
  fc
    .tuple(fc.constantFrom(...poweredKinds), placement, pos(LIMITS.maxCfm), opt(diagnosticsArb), opt(fc.boolean()))
    .map(([kind, p, cfm, diagnostics, sealedToOpening]) => clean({ id, kind, ...clean(p), cfm, diagnostics, sealedToOpening }) as Vent);

export const ventsArb = (maxVents = 12): fc.Arbitrary<Vent[]> =>
  fc
    .array(fc.boolean(), { maxLength: maxVents })
    .chain((isPoweredList) =>
      isPoweredList.length === 0
        ? fc.constant([] as Vent[])
        : fc.tuple(...isPoweredList.map((isPowered, i) => (isPowered ? poweredVentArb(`v${i}`) : passiveVentArb(`v${i}`)))),
    );

const unventedArb = fc.record(
  {
    insulation: fc.constantFrom("air-impermeable-only" as const, "air-impermeable-and-air-permeable" as const, "rigid-above-deck-and-air-permeable" as const, "air-permeable-only" as const),
    airImpermeableRValue: fc.double({ min: 0, max: 100, noNaN: true }),
    foamIsClassII: fc.boolean(),
    isInsideThermalEnvelope: fc.boolean(),
    roofCovering: fc.constantFrom("asphalt-shingles" as const, "wood-shingles-or-shakes" as const, "tile-or-metal" as const, "other" as const),
    hasVentedGapUnderShakes: fc.boolean(),
  },
  { requiredKeys: ["insulation"] },
);

/** Optional fields added after the first release: absent, as in older surveys, or any valid value. */
const laterFields = fc.record(
  {
    upperShareBase: fc.constantFrom("required" as const, "provided" as const),
    moistureRegime: fc.constantFrom("A" as const, "B" as const, "C" as const, null),
    sealed: fc.tuple(fc.constant("unvented" as const), unventedArb),
    enclosedRafterBays: fc.record({ bayCount: fc.integer({ min: 1, max: 500 }), baySpacingIn: fc.double({ min: 8, max: 96, noNaN: true }) }),
  },
  { requiredKeys: [] },
);

export const atticArb = (maxVents = 12): fc.Arbitrary<AtticInput> =>
  fc.tuple(baseAtticArb(maxVents), laterFields).map(([base, later]) => ({
    ...base,
    ...(later.upperShareBase !== undefined ? { upperShareBase: later.upperShareBase } : {}),
    ...(later.moistureRegime !== undefined ? { moistureRegime: later.moistureRegime } : {}),
    ...(later.sealed !== undefined ? { assembly: later.sealed[0], unvented: later.sealed[1] } : {}),
    ...(later.enclosedRafterBays !== undefined ? { enclosedRafterBays: later.enclosedRafterBays } : {}),
  }));

const baseAtticArb = (maxVents: number): fc.Arbitrary<AtticInput> =>
  fc.record({
    codeBasis: fc.constantFrom(...CODE_BASES),
    climateZone: fc.integer({ min: 1, max: 8 }),
    ceilingVaporRetarder: fc.constantFrom("none" as const, "class-I" as const, "class-II" as const, "class-III" as const),
    roofColor: fc.constantFrom("light" as const, "medium" as const, "dark" as const),
    sections: fc.array(sectionArb, { minLength: 1, maxLength: 6 }),
    vents: ventsArb(maxVents),
    site: fc.record(
      {
        atmosphericCombustionAppliance: fc.boolean(),
        gableFanSealed: fc.boolean(),
        soffitsBlocked: fc.boolean(),
        bafflesPresent: fc.boolean(),
        bathFanIntoAttic: fc.boolean(),
        kitchenOrDryerIntoAttic: fc.boolean(),
        ceilingAirSealed: fc.boolean(),
      },
      { requiredKeys: [] },
    ),
  });
