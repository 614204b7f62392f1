/** Builders for tests only: a Tallgrass Exteriors survey in Marrow Creek, filled in as needed. */
import type { AtticInput, Vent } from "./schema";

export function attic(overrides: Partial<AtticInput> = {}): AtticInput {
  return {
    codeBasis: "irc-2018",
    climateZone: 4,
    ceilingVaporRetarder: "none",
    roofColor: "medium",
    sections: [{ kind: "area", areaSqFt: 1500 }],
    vents: [],
    ...overrides,
  };
}

export const soffit = (id: string, nfaSqIn: number, extra: Partial<Vent> = {}): Vent => ({
  id,
  kind: "soffit-continuous",
  location: "lower",
  nfaSqIn,
  ...extra,
});

export const ridge = (id: string, nfaSqIn: number, extra: Partial<Vent> = {}): Vent => ({
  id,
  kind: "ridge",
  location: "upper",
  nfaSqIn,
  ...extra,
});

export const box = (id: string, nfaSqIn: number, extra: Partial<Vent> = {}): Vent => ({
  id,
  kind: "box",
  location: "upper",
  nfaSqIn,
  ...extra,
});

export const roofFan = (id: string, cfm: number, extra: Partial<Vent> = {}): Vent => ({
  id,
  kind: "powered-roof",
  location: "upper",
  cfm,
  ...extra,
});
