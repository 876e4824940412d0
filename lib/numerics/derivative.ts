/**
 * Numerical first or second derivative by central differences with Richardson extrapolation (Ridders'
 * method: C. J. F. Ridders, Adv. Eng. Software 4 (1982) 75; as in Press et al., Numerical Recipes,
 * 3rd ed., section 5.7). The step starts at h and shrinks by 1.4 per stage; a Neville tableau
 * extrapolates the differences to h -> 0, and the stage where the tableau stops improving gives both
 * the value and an error estimate (the difference between neighbouring extrapolants).
 *
 * Step: by default h = 0.01 * |x|, i.e. from the scale of x, so a pressure near 1e5 Pa gets
 * h = 1e3 Pa and a volume near 1e-4 m^3/mol gets h = 1e-6. Pass `scale` (a typical magnitude of x)
 * to use 0.01 * scale instead, which is needed when x is 0 or near a sign change (the default then
 * assumes a scale of 1).
 *
 * Units: plain numbers; the result has the units of f divided by those of x (squared for order 2).
 * Validity: f smooth near x and finite on [x - h, x + h] (if not, h is cut by 10 up to 8 times before
 * giving up). Accuracy: typically 1e-10 to 1e-13 relative for analytic f; `error` estimates it.
 */
import { DerivativeError, NumericsInputError } from "./errors.js";
import { optionCount, optionNumber, requireFunction, requireKnownOptions, requireNumber, stopper } from "./checks.js";

export interface DerivativeOptions {
  /** Initial step (default 0.01 * scale). Should be large enough for f to change noticeably. */
  h?: number;
  /** Typical magnitude of x for the default step (default |x|, or 1 when x is 0). */
  scale?: number;
  /** Derivative order: 1 (default) or 2. */
  order?: number;
  /** Extrapolation stages (default 10). */
  stages?: number;
  shouldStop?: () => boolean;
}

export interface DerivativeResult {
  value: number;
  /** Estimated absolute error. */
  error: number;
  evaluations: number;
}

const WHERE = "derivative";
const KNOWN = ["h", "scale", "order", "stages", "shouldStop"] as const;
const SHRINK = 1.4;
const SHRINK2 = SHRINK * SHRINK;
const SAFE = 2;

export function derivative(f: (x: number) => number, x: number, options: DerivativeOptions = {}): DerivativeResult {
  requireFunction(WHERE, "f", f);
  requireNumber(WHERE, "x", x);
  requireKnownOptions(WHERE, options, KNOWN);
  const scale = optionNumber(WHERE, "scale", options.scale, x !== 0 ? Math.abs(x) : 1, 0, true);
  let h = optionNumber(WHERE, "h", options.h, 0.01 * scale, 0, true);
  const order = options.order ?? 1;
  if (order !== 1 && order !== 2) {
    throw new NumericsInputError(`${WHERE}: option 'order' must be 1 or 2; got ${String(order)}`);
  }
  const stages = optionCount(WHERE, "stages", options.stages, 10, 2);
  const poll = stopper(WHERE, options.shouldStop);

  let evaluations = 0;
  const fx0 = order === 2 ? call(x) : 0;
  function call(t: number): number {
    const y = f(t);
    evaluations++;
    return typeof y === "number" ? y : NaN;
  }
  const difference = (step: number): number => {
    const up = call(x + step);
    const down = call(x - step);
    return order === 1 ? (up - down) / (2 * step) : (up - 2 * fx0 + down) / (step * step);
  };
  if (!Number.isFinite(fx0)) throw new DerivativeError(`${WHERE}: f returned ${fx0} at x = ${x}`);

  let first = difference(h);
  for (let cut = 0; !Number.isFinite(first) && cut < 8; cut++) {
    h /= 10;
    first = difference(h);
  }
  if (!Number.isFinite(first)) {
    throw new DerivativeError(
      `${WHERE}: f is not finite near x = ${x} (tried steps down to h = ${h}); f must be defined on both sides of x`,
    );
  }
  // Neville tableau, one row per stage; each row extrapolates the previous one by a factor SHRINK^2.
  let prev: number[] = [first];
  let best = first;
  let error = Infinity;
  for (let i = 1; i < stages; i++) {
    poll();
    h /= SHRINK;
    const row: number[] = [difference(h)];
    if (!Number.isFinite(row[0]!)) break;
    let fac = SHRINK2;
    for (let j = 1; j <= i; j++) {
      row[j] = (row[j - 1]! * fac - prev[j - 1]!) / (fac - 1);
      fac *= SHRINK2;
      const errt = Math.max(Math.abs(row[j]! - row[j - 1]!), Math.abs(row[j]! - prev[j - 1]!));
      if (errt <= error) {
        error = errt;
        best = row[j]!;
      }
    }
    // Higher order made it worse: rounding now dominates, stop early.
    if (Math.abs(row[i]! - prev[i - 1]!) >= SAFE * error) break;
    prev = row;
  }
  return { value: best, error, evaluations };
}
