import { describe, expect, it } from "vitest";
import { areaEntry, lengthEntry, loadExpressionReader } from "./measure";

describe("measurement entries in the client", () => {
  it("when a plain entry is typed, then it is read at once, before the expression reader has loaded", () => {
    expect(lengthEntry(`17'-9"`)).toEqual({ text: `17'-9"`, value: 17.75, error: null, understood: "17 ft 9 in = 17.75 ft" });
    expect(areaEntry(`26'6" x 40'`)).toMatchObject({ value: 1060, error: null, understood: "26 ft 6 in × 40 ft = 1,060 sq ft" });
    expect(lengthEntry("5.2 m").value).toBeCloseTo(5.2 / 0.3048, 12);
  });

  it("when an expression is typed first, then the entry waits for the expression reader and reads once it is here", async () => {
    const pending = areaEntry("12 x 30 + 8 x 10");
    expect(pending).toEqual({ text: "12 x 30 + 8 x 10", value: null, error: null, understood: null, isPending: true });
    await loadExpressionReader();
    const read = areaEntry("12 x 30 + 8 x 10");
    expect(read).toMatchObject({ value: 440, error: null, understood: "12 ft × 30 ft + 8 ft × 10 ft = 440 sq ft (plain numbers are read as feet)" });
    expect(read).not.toHaveProperty("isPending");
  }, 60_000); // loading mathjs's modules takes seconds on a busy machine

  it("when an expression is mistyped, then the message comes at once without waiting", () => {
    expect(lengthEntry("30 +")).toMatchObject({ value: null, error: "The entry ends with an operator; finish the measurement." });
  });
});
