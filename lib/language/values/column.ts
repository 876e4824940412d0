/**
 * A column of quantities stored compactly: SI numbers in a Float64Array plus a display unit.
 * Vectorised built-ins return these so a 10,000-point result costs one typed array, not 10,000
 * mathjs Units. The column IS a mathjs DenseMatrix (a subclass whose `_data` is built lazily), so
 * indexing `c[3]`, `max(c)`, `c + 1 K`, `size(c)` and `to` work unchanged; mathjs Units are made
 * only when an expression actually needs them. Display code reads `si` and `unit` directly.
 */
import type { MathJsInstance, Matrix, Unit } from "mathjs";

export interface QuantityColumn extends Matrix {
  readonly isQuantityColumn: true;
  /** SI values (K, Pa, J/mol ...). Rebuilt from the matrix when an assignment changed it. */
  readonly si: Float64Array;
  /** Display unit string ("" for plain numbers). */
  readonly unit: string;
  /** SI unit string of `si`. */
  readonly siUnit: string;
}

export type ColumnFactory = (si: Float64Array, siUnit: string, displayUnit?: string) => QuantityColumn;

export function isQuantityColumn(x: unknown): x is QuantityColumn {
  return typeof x === "object" && x !== null && (x as QuantityColumn).isQuantityColumn === true;
}

/** One column class per mathjs instance (each instance has its own DenseMatrix class). */
export function createColumnFactory(math: MathJsInstance): ColumnFactory {
  const DenseMatrix = (math as unknown as { DenseMatrix: new (data: unknown[]) => object }).DenseMatrix;

  class Column extends (DenseMatrix as new (data: unknown[]) => { _size: number[] }) {
    readonly isQuantityColumn = true as const;
    // Plain fields, not #private: DenseMatrix's constructor calls the _data setter before
    // subclass private fields exist.
    private _si: Float64Array;
    private _items: unknown[] | undefined;
    /** True after a mutating matrix method ran: `si` must be read back from the items. */
    private _dirty = false;
    readonly siUnit: string;
    readonly unit: string;
    constructor(si: Float64Array, siUnit: string, displayUnit: string) {
      super([]);
      this._si = si;
      this._items = undefined;
      this.siUnit = siUnit;
      this.unit = displayUnit;
      this._size = [si.length];
    }
    get si(): Float64Array {
      // After an element assignment the matrix is the truth; read it back once.
      if (this._dirty && this._items) {
        const items = (this._items as unknown[]).flat(Infinity);
        this._si = Float64Array.from(items, (u) =>
          typeof u === "number" ? u : (u as Unit).toNumber(this.siUnit || ""));
        this._dirty = false;
      }
      return this._si;
    }
    get _data(): unknown[] {
      if (!this._items) {
        const si = this._si;
        if (!this.siUnit) this._items = Array.from(si);
        else {
          const proto = math.unit(1, this.siUnit);
          const same = this.unit === this.siUnit;
          this._items = Array.from(si, (x) => {
            const u = proto.clone();
            (u as unknown as { value: number }).value = x;
            return same ? u : u.to(this.unit);
          });
        }
      }
      return this._items;
    }
    set _data(items: unknown[]) {
      this._items = items;
      this._dirty = true;
    }
  }
  // The in-place mutators of DenseMatrix: after any of them the SI array is stale.
  for (const method of ["subset", "set", "resize", "reshape", "swapRows"]) {
    const base = (DenseMatrix.prototype as unknown as Record<string, (...a: unknown[]) => unknown>)[method];
    if (typeof base !== "function") continue;
    Object.defineProperty(Column.prototype, method, {
      value: function (this: { _dirty: boolean; _data: unknown[] }, ...args: unknown[]) {
        const mutates = method !== "subset" || args.length > 1;
        if (mutates) void this._data; // materialise before the base method edits it
        const out = base.apply(this, args);
        if (mutates) this._dirty = true;
        return out;
      },
      writable: true, configurable: true,
    });
  }
  return (si, siUnit, displayUnit) => new Column(si, siUnit, displayUnit ?? siUnit) as unknown as QuantityColumn;
}
