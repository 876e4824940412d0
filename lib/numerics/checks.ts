/**
 * Argument checks shared by the numerics routines. Each failure names the routine, the argument, what
 * was expected and what came, so a user can fix the call without reading the source.
 */
import { NumericsInputError, StopRequested } from "./errors.js";

/** Short printable form of whatever came in (numbers keep full precision). */
export function describe(value: unknown): string {
  if (typeof value === "number") return String(value);
  if (typeof value === "function") return "a function";
  if (value === null) return "null";
  if (Array.isArray(value)) return "an array";
  return typeof value === "object" ? "an object" : `${typeof value} ${JSON.stringify(value)}`;
}

export function requireFunction(where: string, name: string, value: unknown): void {
  if (typeof value !== "function") {
    throw new NumericsInputError(`${where}: argument '${name}' must be a function of one number; got ${describe(value)}`);
  }
}

/** A number that is not NaN; infinities allowed only when `allowInfinite`. */
export function requireNumber(where: string, name: string, value: unknown, allowInfinite = false): number {
  if (typeof value !== "number" || Number.isNaN(value) || (!allowInfinite && !Number.isFinite(value))) {
    const expected = allowInfinite ? "a number (Infinity allowed)" : "a finite number";
    throw new NumericsInputError(`${where}: argument '${name}' must be ${expected}; got ${describe(value)}`);
  }
  return value;
}

/** An optional option: undefined gives the fallback; otherwise a finite number >= min (> min if strict). */
export function optionNumber(
  where: string,
  name: string,
  value: unknown,
  fallback: number,
  min: number,
  strict = false,
): number {
  if (value === undefined) return fallback;
  const ok = typeof value === "number" && Number.isFinite(value) && (strict ? value > min : value >= min);
  if (!ok) {
    throw new NumericsInputError(
      `${where}: option '${name}' must be a finite number ${strict ? ">" : ">="} ${min}; got ${describe(value)}`,
    );
  }
  return value as number;
}

/** Optional positive integer option (iteration or evaluation limits). */
export function optionCount(where: string, name: string, value: unknown, fallback: number, min = 1): number {
  if (value === undefined) return fallback;
  if (typeof value !== "number" || !Number.isInteger(value) || value < min) {
    throw new NumericsInputError(`${where}: option '${name}' must be an integer >= ${min}; got ${describe(value)}`);
  }
  return value;
}

/** Returns a poll function that throws StopRequested once shouldStop() says so. */
export function stopper(where: string, shouldStop: unknown): () => void {
  if (shouldStop === undefined) return () => {};
  if (typeof shouldStop !== "function") {
    throw new NumericsInputError(`${where}: option 'shouldStop' must be a function returning a boolean; got ${describe(shouldStop)}`);
  }
  const poll = shouldStop as () => boolean;
  return () => {
    if (poll()) throw new StopRequested(where);
  };
}

/** Rejects option keys we do not know, so a typo ({rtol: ...} for {rel: ...}) is not silently ignored. */
export function requireKnownOptions(where: string, options: object | undefined, known: readonly string[]): void {
  if (options === undefined) return;
  if (typeof options !== "object" || options === null) {
    throw new NumericsInputError(`${where}: options must be a record; got ${describe(options)}`);
  }
  for (const key of Object.keys(options)) {
    if (!known.includes(key)) {
      throw new NumericsInputError(`${where}: unknown option '${key}'; valid options are ${known.join(", ")}`);
    }
  }
}
