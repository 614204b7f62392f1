import { describe, expect, it } from "vitest";
import type { SnapshotAnalysis } from "@shared/proposals/types";
import { nfaSentences, providedSentence } from "./nfa-words";

const analysis: SnapshotAnalysis = {
  floorAreaSqFt: 1500,
  requirement: { ratio: 150, totalSqIn: 1440, totalSqFt: 10, lowerMinSqIn: 720, upperMinSqIn: 576, upperMaxSqIn: 720, reasons: [] },
  provided: { intakeSqIn: 300, exhaustSqIn: 360, totalSqIn: 660 },
  fan: null,
  compliant: false,
  summary: "",
  findings: [],
  hasPoweredFan: false,
};

describe("the vent requirement in plain words", () => {
  it("when the attic is 1,500 sq ft at 1/150, then the arithmetic is spelled out", () => {
    expect(nfaSentences(analysis)[1]).toBe("For 1,500 sq ft of attic floor that is 1,500 ÷ 150 = 10 sq ft, or 1,440 square inches of opening.");
  });
  it("when the attic is short, then the sentence says so", () => {
    expect(providedSentence(analysis, "today")).toBe("Today: 300 sq in of intake at the eaves and 360 sq in of exhaust up high, 660 sq in in all, where the code asks for at least 1,440 sq in — this is short of the code minimum.");
  });
});
