/**
 * lib/numerics: numerical algorithms on plain numbers (no units, no mathjs, no imports from other
 * folders). Every result carries value, error estimate and evaluation count; every loop polls the
 * caller's `shouldStop` and throws StopRequested when it returns true.
 */
export { integrate, type IntegrateOptions, type IntegrateResult } from "./integrate.js";
export { brent, type BrentOptions, type RootResult } from "./brent.js";
export { newtonSafe, type NewtonSafeOptions } from "./newtonSafe.js";
export { cubicRoots, polishCubicRoot } from "./cubicRoots.js";
export { derivative, type DerivativeOptions, type DerivativeResult } from "./derivative.js";
export { kronrod21, KRONROD21_NODES, KRONROD21_WEIGHTS, GAUSS10_WEIGHTS } from "./gaussKronrod.js";
export {
  NumericsError,
  NumericsInputError,
  IntegrationError,
  RootError,
  DerivativeError,
  StopRequested,
} from "./errors.js";

import { brent } from "./brent.js";
/** `seek` is the product's name for bracketing root finding: Brent's method (see brent.ts). */
export const seek = brent;
