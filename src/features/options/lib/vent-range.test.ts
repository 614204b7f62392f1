import { describe, expect, it } from "vitest";
import { rangeMark, rangeStanding, rangeWords } from "./vent-range";

describe("a vent area against the wanted range", () => {
  it("when exhaust is 540 sq in where 289–360 sq in is wanted, then it is over the range and gets no check mark", () => {
    const standing = rangeStanding(540, 289, 360);
    expect(standing).toBe("over");
    expect(rangeMark(standing)).toBe("!");
    expect(`${rangeMark(standing)} ${rangeWords(standing, "289–360 sq in")}`).toBe("! more than the 289–360 sq in wanted");
  });

  it("when the value is inside the range, then it gets the check mark", () => {
    expect(rangeMark(rangeStanding(300, 289, 360))).toBe("✓");
    expect(rangeWords("in-range", "289–360 sq in")).toBe("289–360 sq in wanted");
  });

  it("when the value is short of the minimum, then the words say less", () => {
    expect(rangeWords(rangeStanding(200, 289, 360), "289–360 sq in")).toBe("less than the 289–360 sq in wanted");
  });
});
