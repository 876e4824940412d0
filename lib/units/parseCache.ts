/**
 * A per-instance cache in front of mathjs's unit-string parser. mathjs parses a unit string every
 * time one is needed: every unit symbol an expression evaluates (`bar` in `5 bar` builds
 * `new Unit(null, "bar")`), every `to("kPa")`, every `toNumber("J/mol")`. The parse scans the text
 * character by character (10-40 us for a compound unit); a clone of a parsed result costs well
 * under a microsecond. Callers of Unit.parse may change the unit they get back (Unit.to sets its
 * value), so the cache always hands out a clone, never the cached object.
 *
 * The cache lives in a closure over one instance's Unit class, so sessions never share it. It is
 * emptied whenever a unit is created or deleted on that instance (parsing depends on the unit table),
 * and bounded: a cell that builds unit strings in a loop cannot grow it without end.
 */
import type { MathJsInstance, Unit } from "mathjs";

/** Most distinct unit strings kept; past this the cache starts again empty (simple and bounded). */
export const PARSE_CACHE_LIMIT = 500;

interface UnitClass {
  parse(str: string, options?: unknown): Unit;
  createUnitSingle(...args: unknown[]): unknown;
  deleteUnit(...args: unknown[]): unknown;
}

const INSTALLED = Symbol.for("caloric.units.parseCache");

/** Cache key for a parse call, or undefined when the call must not be cached. */
function keyOf(str: unknown, options: unknown): string | undefined {
  if (typeof str !== "string") return undefined;
  if (options === undefined) return `-${str}`;
  if (typeof options !== "object" || options === null) return undefined;
  const keys = Object.keys(options);
  const allow = (options as { allowNoUnits?: unknown }).allowNoUnits;
  if (keys.length === 1 && keys[0] === "allowNoUnits" && typeof allow === "boolean") return `${allow ? "a" : "n"}${str}`;
  return undefined;
}

/**
 * Wrap `math.Unit.parse` with a bounded cache of parsed strings (clones handed out). Calls without
 * options, and with only `allowNoUnits` (what math.unit("J/mol") passes), are cached under keys
 * that tell them apart; any other options go straight to mathjs. Idempotent per instance.
 */
export function installParseCache(math: MathJsInstance): void {
  const Unit = (math as unknown as { Unit: UnitClass & { [INSTALLED]?: true } }).Unit;
  if (Unit[INSTALLED]) return;
  const parse = Unit.parse.bind(Unit);
  const cache = new Map<string, Unit>();
  Unit.parse = (str: string, options?: unknown): Unit => {
    const key = keyOf(str, options);
    if (key === undefined) return parse(str, options);
    let hit = cache.get(key);
    if (hit === undefined) {
      hit = parse(str, options); // throws for unknown units: errors are never cached
      if (cache.size >= PARSE_CACHE_LIMIT) cache.clear();
      cache.set(key, hit);
    }
    return hit.clone();
  };
  for (const name of ["createUnitSingle", "deleteUnit"] as const) {
    const original = Unit[name].bind(Unit);
    Unit[name] = (...args: unknown[]) => {
      cache.clear();
      return original(...args);
    };
  }
  Unit[INSTALLED] = true;
}
