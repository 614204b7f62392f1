import { describe, expect, it } from "vitest";
import { DEMO_IDS, demoCatalog } from "./demo-catalog.test-helpers";
import { sizeVentItem } from "./size-vent-item";

const catalog = demoCatalog();
const ridge = catalog.find((i) => i.id === DEMO_IDS.ridge)!;
const box = catalog.find((i) => i.id === DEMO_IDS.staticVent)!;

describe("sizeVentItem", () => {
  it("when 360 sq in of ridge vent at 18 sq in per ft is needed with 39 ft of ridge, then 20 ft (5 whole pieces) is installed (the TSDoc example)", () => {
    const sized = sizeVentItem(ridge, 360, { amount: 39, explanation: "40 ft ridge less ends" });
    expect(sized).toMatchObject({ fits: true, quantity: 20, nfaSqIn: 360 });
    if (sized.fits) expect(sized.explanation).toContain("360 ÷ 18 = 20 → 20 ft; bought in 4 ft pieces: 5 × 4 = 20 ft");
  });
  it("when whole pieces would overrun the ridge, then the needed whole feet are installed and the last piece cut", () => {
    // 700 ÷ 18 = 38.9 → 39 ft; 10 pieces = 40 ft > 39 ft available
    expect(sizeVentItem(ridge, 700, { amount: 39, explanation: "" })).toMatchObject({ fits: true, quantity: 39, nfaSqIn: 702 });
  });
  it("when the ridge is too short, then it does not fit and says by how much", () => {
    const sized = sizeVentItem(ridge, 322, { amount: 5, explanation: "6 ft ridge" });
    expect(sized.fits).toBe(false);
    if (!sized.fits) expect(sized.reason).toContain("18 ft, but only 5 ft is available");
  });
  it("when static vents are sized, then whole vents are rounded up and room limits them", () => {
    expect(sizeVentItem(box, 140, { amount: 18, explanation: "" })).toMatchObject({ fits: true, quantity: 3, nfaSqIn: 150 });
    expect(sizeVentItem(box, 500, { amount: 9, explanation: "" }).fits).toBe(false);
    expect(sizeVentItem(box, 0, { amount: 0, explanation: "" })).toMatchObject({ fits: true, quantity: 0 });
  });
});
