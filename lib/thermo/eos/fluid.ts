/**
 * validateFluid: checks a Fluid (components, mole fractions, k_ij) before a model is built, so a bad
 * mixture is reported once, naming the field, instead of surfacing later as NaN.
 */
import { ThermoError } from "../errors.js";
import type { Fluid } from "./types.js";

/** Throws ThermoError naming the field unless the fluid is usable: x >= 0 summing to 1 (1e-9), k_ij square symmetric. */
export function validateFluid(fluid: Fluid): void {
  const n = fluid.components.length;
  if (n === 0) throw new ThermoError("fluid", "a fluid needs at least one component; got none");
  if (fluid.x.length !== n) {
    throw new ThermoError("x", `expected ${n} mole fractions (one per component); got ${fluid.x.length}`);
  }
  let sum = 0;
  fluid.x.forEach((xi, i) => {
    if (!Number.isFinite(xi) || xi < 0) throw new ThermoError("x", `mole fraction x[${i + 1}] (${fluid.components[i]?.name ?? "?"}) must be >= 0; got ${xi}`);
    sum += xi;
  });
  if (Math.abs(sum - 1) > 1e-9) throw new ThermoError("x", `mole fractions must sum to 1; got ${Number(sum.toPrecision(6))}`);
  fluid.components.forEach((c, i) => {
    for (const [key, value] of [["Tc", c.Tc], ["Pc", c.Pc]] as const) {
      if (!Number.isFinite(value) || value <= 0) {
        throw new ThermoError(key, `component ${i} (${c.name}): ${key} must be > 0; got ${value}`);
      }
    }
    if (!Number.isFinite(c.omega)) throw new ThermoError("omega", `component ${i} (${c.name}): omega must be finite; got ${c.omega}`);
  });
  if (fluid.kij) {
    const k = fluid.kij;
    if (k.length !== n || k.some((row) => row.length !== n)) {
      throw new ThermoError("kij", `k_ij must be a ${n} x ${n} matrix`);
    }
    for (let i = 0; i < n; i++) {
      if (k[i]![i] !== 0) throw new ThermoError("kij", `k_ij diagonal must be 0; k[${i + 1}, ${i + 1}] (${fluid.components[i]!.name}) = ${k[i]![i]}`);
      for (let j = 0; j < n; j++) {
        if (!Number.isFinite(k[i]![j]!) || k[i]![j] !== k[j]![i]) {
          throw new ThermoError("kij", `k_ij must be finite and symmetric; k[${i + 1}, ${j + 1}] = ${k[i]![j]} but k[${j + 1}, ${i + 1}] = ${k[j]![i]} (${fluid.components[i]!.name}/${fluid.components[j]!.name}; indices 1-based)`);
        }
      }
    }
  }
}

/** A pure fluid: one component, x = [1]. */
export function pureFluid(component: Fluid["components"][number]): Fluid {
  return { components: [component], x: [1] };
}
