/**
 * Constants every session starts with. They are ordinary variables: a cell may reassign them
 * (`R = 8.314 J/(mol K)` just replaces the value, no warning), completion lists them with the other
 * names in scope, and inspect shows their meaning and source while they still hold the predefined
 * value. Values come from lib/units, which keeps each constant once with its source.
 */
import type { MathJsInstance } from "mathjs";
import { R_GAS } from "../units/index.js";

export interface PredefinedConstant {
  name: string;
  value: number;
  /** mathjs unit text of the value. */
  unit: string;
  doc: string;
  source: string;
}

export const CONSTANTS: readonly PredefinedConstant[] = [
  {
    name: "R",
    value: R_GAS,
    unit: "J/(mol K)",
    doc: "molar gas constant (predefined; you may assign R to something else)",
    source: "CODATA 2018: R = N_A k = 8.314462618... J/(mol K), exact since the 2019 SI redefinition (given here to 10 significant figures)",
  },
];

/** Fresh constant values for one session's scope (each session gets its own objects). */
export function constantValues(math: MathJsInstance): Map<string, unknown> {
  return new Map(CONSTANTS.map((c) => [c.name, math.unit(c.value, c.unit)]));
}
