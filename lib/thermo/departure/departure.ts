/**
 * departure(model, T, P, {phase, route}): residual (departure) properties at T, P on the chosen root.
 * route "closed" (default) uses the model's closed forms; route "integrate" uses the generic numerical
 * Maxwell route (maxwell.ts) on the same root, so the two can be compared by anyone.
 * Residual = property - ideal-gas property at the same T and P. Units SI (J/mol, J/(mol K)).
 */
import { ThermoError } from "../errors.js";
import { checkPhase, selectRoot, type PhaseLabel, type PhaseRequest, type StateFlags } from "../eos/phase.js";
import type { EosModel, Residual } from "../eos/types.js";
import { maxwellResidual } from "./maxwell.js";

export type DepartureRoute = "closed" | "integrate";

export interface DepartureOptions {
  phase?: PhaseRequest;
  route?: DepartureRoute;
  /** Quadrature relative tolerance of the "integrate" route (default 1e-10). */
  rel?: number;
  shouldStop?: () => boolean;
}

export interface DepartureResult extends Residual {
  T: number;
  P: number;
  V: number;
  phase: PhaseLabel;
  flags: StateFlags;
  route: DepartureRoute;
}

export function departure(model: EosModel, T: number, P: number, options: DepartureOptions = {}): DepartureResult {
  const route = options.route ?? "closed";
  if (route !== "closed" && route !== "integrate") {
    throw new ThermoError("route", `route must be "closed" or "integrate"; got ${JSON.stringify(route)}`);
  }
  const choice = selectRoot(model, T, P, checkPhase(options.phase));
  const base = { T, P, V: choice.V, phase: choice.phase, flags: choice.flags, route };
  if (route === "closed") return { ...choice.residual, ...base };
  const m = maxwellResidual(model, T, choice.V, { rel: options.rel, shouldStop: options.shouldStop });
  const { Z, HR, SR, UR, GR, AR, lnphi, lnphiComponents } = m;
  return { Z, HR, SR, UR, GR, AR, lnphi, lnphiComponents, ...base };
}
