import { describe, expect, it } from "vitest";
import { fanIntakeNeededSqIn, recommendFanCfm } from "./fan-sizing";

describe("recommendFanCfm", () => {
  it("when the attic is 1,800 sq ft, then 1,800 × 0.7 = 1,260 cfm (HVI attic ventilation guidance; SOURCES.md §8 E5)", () => {
    const s = recommendFanCfm({ floorAreaSqFt: 1800, volumeCuFt: null, isDark: false, isSteep: false });
    expect(s.areaMethodCfm).toBe(1260);
    expect(s.airChangeMethodCfm).toBeNull();
  });

  it("when the roof is dark or steep, then 15 % more: 1,260 × 1.15 = 1,449 cfm (HVI; E5)", () => {
    expect(recommendFanCfm({ floorAreaSqFt: 1800, volumeCuFt: null, isDark: true, isSteep: false }).recommendedCfm).toBe(1449);
    expect(recommendFanCfm({ floorAreaSqFt: 1800, volumeCuFt: null, isDark: false, isSteep: true }).recommendedCfm).toBe(1449);
    expect(recommendFanCfm({ floorAreaSqFt: 1800, volumeCuFt: null, isDark: true, isSteep: true }).recommendedCfm).toBe(1449); // not stacked
  });

  it.each([
    [1000, 700, 805],
    [2000, 1400, 1610],
    [3000, 2100, 2415],
  ])("when the attic is %d sq ft, then HVI's table gives %d / %d cfm (HVI table, SOURCES.md §3)", (area, plain, dark) => {
    expect(recommendFanCfm({ floorAreaSqFt: area, volumeCuFt: null, isDark: false, isSteep: false }).recommendedCfm).toBe(plain);
    expect(recommendFanCfm({ floorAreaSqFt: area, volumeCuFt: null, isDark: true, isSteep: false }).recommendedCfm).toBe(dark);
  });

  it("when the volume is 4,500 cu ft, then 10 air changes = 4,500 × 10 ÷ 60 = 750 cfm, and the larger 840 is recommended (HVI; E8)", () => {
    const s = recommendFanCfm({ floorAreaSqFt: 1200, volumeCuFt: 4500, isDark: false, isSteep: false });
    expect(s.airChangeMethodCfm).toBe(750);
    expect(s.areaMethodCfm).toBe(840);
    expect(s.recommendedCfm).toBe(840);
    expect(s.reasons.join(" ")).toContain("4,500 cu ft × 10 ÷ 60 minutes = 750 cfm");
  });

  it("when the mean attic height is above 4.2 ft, then the air-change figure wins (0.7 × 60 ÷ 10 = 4.2 ft, SOURCES.md §3)", () => {
    const s = recommendFanCfm({ floorAreaSqFt: 1000, volumeCuFt: 1000 * 5, isDark: false, isSteep: false });
    expect(s.recommendedCfm).toBe(Math.ceil((5000 * 10) / 60));
  });
});

describe("fanIntakeNeededSqIn", () => {
  it("when the fan is 1,200 cfm, then 1,200 ÷ 300 = 4 sq ft = 576 sq in (HVI 1 sq ft per 300 cfm; E6)", () => {
    expect(fanIntakeNeededSqIn(1200)).toBe(576);
    // HVI's "about half the cfm" shortcut gives 600: within 5 %.
    expect(Math.abs(fanIntakeNeededSqIn(1200) - 1200 / 2) / 600).toBeLessThan(0.05);
  });
  it("when the fan is 1,449 cfm, then 1,449 ÷ 300 × 144 = 695.52 → 696 sq in (E6)", () => {
    expect(fanIntakeNeededSqIn(1449)).toBe(696);
  });
  it("when the fan is 805 cfm, then HVI's example inlet is 386 sq in (805 ÷ 300 × 144 = 386.4) (HVI, SOURCES.md §3)", () => {
    expect(fanIntakeNeededSqIn(805)).toBe(387); // rounded up from 386.4
  });
});
