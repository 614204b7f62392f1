import { describe, expect, it } from "vitest";
import { toAtticInput } from "./to-attic-input.ts";
import { AtticInputSchema } from "../ventilation/schema.ts";

const project = { codeBasis: "irc-2018", climateZone: 4, ceilingVaporRetarder: "none", roofColor: "dark" } as const;

describe("toAtticInput", () => {
  it("when a section has no roof of its own, then it takes the space's form and pitch (the TSDoc example)", () => {
    const input = toAtticInput(project, {
      name: "Main attic", roof: { form: "hip", pitchIn12: 6, ridgeLengthFt: null, eaveLengthFt: null },
      sections: [{ kind: "rect", lengthFt: 40, widthFt: 30 }, { kind: "area", areaSqFt: 200, roofForm: "shed", pitchIn12: 3 }],
      vents: [], site: { soffitsBlocked: true, daylightAtRidge: true }, notes: null,
    });
    expect(input.sections[0]).toEqual({ kind: "rect", lengthFt: 40, widthFt: 30, roofForm: "hip", pitchIn12: 6 });
    expect(input.sections[1]).toMatchObject({ roofForm: "shed", pitchIn12: 3 });
    expect(input.site).toEqual({ soffitsBlocked: true });
    expect(AtticInputSchema.safeParse(input).success).toBe(true);
  });
});
