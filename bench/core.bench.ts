import { bench, describe } from "vitest";
import { analyzeAttic } from "../shared/ventilation/index";
import { largeAttic } from "./core-fixture";

const input = largeAttic();

describe("ventilation core", () => {
  bench("analyzeAttic: 20 sections, 200 vents", () => {
    analyzeAttic(input);
  });
});
