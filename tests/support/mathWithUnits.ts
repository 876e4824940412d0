/**
 * A fresh mathjs instance with the project's units installed (installUnits), built the way the cell
 * language builds its own, for the lib/units tests.
 */
import type { MathJsInstance } from "mathjs";
import { loadMathjs } from "../../lib/language/mathjs.js";
import { installUnits } from "../../lib/units/index.js";

export function mathWithUnits(): MathJsInstance {
  const m = loadMathjs();
  const math = m.create(m.all, {}) as unknown as MathJsInstance;
  installUnits(math);
  return math;
}
