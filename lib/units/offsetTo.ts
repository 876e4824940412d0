/**
 * Conversion INTO an offset unit (degC, degF, barg, psig, kPag, MPag) from a compound unit.
 *
 * mathjs 15's Unit.prototype.to applies offsets only between two single units: a value whose unit is
 * compound (`(bar m^3 K) / J`, `N / m^2`, `K^1` from a product) is copied as is, so
 * `100 bar * 1 m^3 / (8.314462618 J/(mol K) * 3 kmol) to degC` read 400.908 degC where the absolute
 * temperature is 400.908 K = 127.758 degC, and `1e6 N / (1 m^2) to barg` read 10 barg instead of
 * 8.98675 barg. A compound value holds its absolute SI value (offset units inside compound units are
 * differences, offset.ts), so the fix is to convert via the base SI unit: take that SI value and
 * subtract the target unit's offset. Every path that converts (`to`, `in`, toNumber(unit), fromSI,
 * display units, verify) goes through Unit.prototype.to, so the fix is made there, once, on the
 * instance's own Unit class (each mathjs instance has its own; sessions never share it).
 */
import { conversionMismatch, isMathjsMismatch } from "./mismatch.js";
import type { MathJsInstance, Unit } from "mathjs";

interface UnitInternals {
  value: number | null;
  units: { unit: { offset: number; value: number }; power: number }[];
  _isDerived(): boolean;
}

type UnitProto = { to(this: Unit, target: string | Unit): Unit };

const INSTALLED = Symbol.for("caloric.units.offsetTo");

/** A single offset unit to the first power: the only target whose offset matters. */
function offsetTarget(u: UnitInternals): { offset: number; value: number } | undefined {
  if (u.units.length !== 1) return undefined;
  const c = u.units[0]!;
  return c.unit.offset !== 0 && Math.abs(c.power - 1) < 1e-15 ? c.unit : undefined;
}

/**
 * Patch `math.Unit.prototype.to` so a compound (or dimensionless-looking, powered) valued unit
 * converted into an offset unit gets the offset applied. Other conversions are mathjs's own.
 * Idempotent per instance.
 */
export function installOffsetConversion(math: MathJsInstance): void {
  const UnitClass = (math as unknown as { Unit: { prototype: UnitProto; parse(s: string): Unit } & { [INSTALLED]?: true } }).Unit;
  if (UnitClass[INSTALLED]) return;
  const original = UnitClass.prototype.to;
  UnitClass.prototype.to = function to(this: Unit, target: string | Unit): Unit {
    let result: Unit;
    try {
      result = original.call(this, target);
    } catch (err) {
      // mathjs: "Units do not match ('m^3' != '1 Sm3')"; say what each side is instead.
      if (isMathjsMismatch(err)) throw conversionMismatch(this, target);
      throw err;
    }
    const self = this as unknown as UnitInternals;
    // mathjs handled it: valueless, or a single (non-derived) unit, whose offset it applies itself.
    if (self.value === null || !(self._isDerived() || self.units.length === 0)) return result;
    const t = offsetTarget(result as unknown as UnitInternals);
    if (t === undefined) return result;
    // mathjs copied the absolute SI value; the stored value of an offset unit excludes its offset.
    const r = result as unknown as UnitInternals;
    r.value = (r.value as number) - t.value * t.offset;
    return result;
  };
  UnitClass[INSTALLED] = true;
}
