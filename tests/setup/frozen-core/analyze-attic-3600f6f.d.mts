/** The frozen core before issue 17 (see the .mjs): validates its input with the schema of that commit. */
import type { AtticAnalysis, AtticInput } from "../../../shared/ventilation/index";

export declare function analyzeAttic(input: AtticInput): AtticAnalysis;
