/**
 * lib/thermo public API: SI numbers in, SI numbers out (K, Pa, m^3/mol, J/mol, J/(mol K)).
 * Other folders import thermo only through this file.
 *
 * Models: `vdw(fluid)`, `rk(fluid)`, `srk(fluid)`, `pr(fluid)`, `idealGas(fluid)` build an EosModel for a
 * Fluid {components: Substance[], x, kij?}; `pureFluid(substance)` makes the one-component fluid.
 * States: `state(model, T, P, {phase, idealGas})`, `stateFrom(model, {two of T,P,V,H,S,U}, {idealGas})`,
 * `change(s1, s2)`. Departures: `departure(model, T, P, {phase, route: "closed" | "integrate"})`,
 * `maxwellResidual(model, T, V)`, `internalPressure(model, T, V)`. Saturation: `psat(model, T)`,
 * `tsat(model, P)`. Cautions no model gives about itself (triple point, far-out pressures) and the
 * saturation range checks: cautions.ts. Errors: ThermoError {argument, message}, numbers in readable
 * units (format.ts).
 */
export { R, P_REF, T_REF, P_ATM } from "./constants.js";
export { ThermoError } from "./errors.js";
export type { EosModel, Fluid, Residual } from "./eos/types.js";
export { validateFluid, pureFluid } from "./eos/fluid.js";
export { cubicModel, type CubicModel, type CubicParameters } from "./eos/cubic.js";
export { criticalConstants } from "./eos/criticalConstants.js";
export { idealGas } from "./eos/idealgas.js";
export { vdw, VDW } from "./eos/vdw.js";
export { rk, RK } from "./eos/rk.js";
export { srk, SRK, srkSlope } from "./eos/srk.js";
export { pr, PR, prKappa } from "./eos/pr.js";
export { prStateFast } from "./eos/prFast.js";
export { physicalZRoots } from "./eos/cubicZ.js";
export { cubicStateColumns, isPureCubic, PHASE_LABELS, STATE_FLAG_BITS, type StateColumns, type ColumnOptions, type ColumnIdealGas } from "./stateColumns.js";
export {
  selectRoot, pseudoCritical, checkPhase,
  type PhaseRequest, type PhaseLabel, type StateFlags, type RootChoice,
} from "./eos/phase.js";
export { departure, type DepartureOptions, type DepartureResult, type DepartureRoute } from "./departure/departure.js";
export { maxwellResidual, type MaxwellOptions, type MaxwellResidual } from "./departure/maxwell.js";
export { internalPressure } from "./departure/internalPressure.js";
export { psat, tsat, type Saturation } from "./equilibrium/saturation.js";
export { wilsonPsat, wilsonTsat } from "./equilibrium/wilson.js";
export { state, change, twoPhase, type ThermoState, type StateOptions, type IdealGasFunctions, type Spec, type StateChange } from "./state.js";
export { stateFrom } from "./spec/stateFrom.js";
export { heatCapacity, type HeatCapacities } from "./departure/heatCapacity.js";
export { getSubstance, suggestSubstances, listSubstances, normalizeName } from "./substances/databank.js";
export { pseudoComponent, CP_FORM_UNAVAILABLE, type PseudoComponentInput } from "./substances/pseudo.js";
export type { Substance, CpCorrelation } from "./substances/types.js";
export { cp as idealGasCp, cpWarnings, cpRangeClass, cpRangeText, CP_MARGIN, CP_FAR_MARGIN } from "./idealGas/cp.js";
export {
  triplePointOf, stateCautions, cautionsFor, requireSaturationT, requireSaturationP, belowTripleText,
  FAR_PRESSURE_FACTOR, NO_TRIPLE_TR, type TripleInfo,
} from "./cautions.js";
export { num as formatNumber, kelvin as kelvinText, pressureText, volumeText, energyText } from "./format.js";
export { TRIPLE_POINTS, type TriplePoint } from "./substances/triplePoints.js";
export { mixtureCp, mixtureIdealGasTotals } from "./idealGas/mixture.js";
export { idealGasTotals, referenceState, DEFAULT_REFERENCE, type ReferenceState, type IdealGasTotals } from "./idealGas/reference.js";
export { leeKesler, type LeeKeslerModel, type LeeKeslerMixing } from "./eos/leekesler.js";
export { virial, type VirialModel } from "./eos/virial.js";
export type { VirialCorrelation } from "./eos/virialCorrelations.js";
export { enthalpyIntegral, entropyIntegral } from "./idealGas/cp.js";
export { idealMixingEntropy } from "./idealGas/mixture.js";
export { idealGasFunctions, type IdealGasClosures } from "./idealGas/functions.js";
export { lkPseudoCritical } from "./eos/leekesler.js";
export {
  if97State, if97Psat, if97Tsat, toMolar, M_WATER, T_CRIT as WATER_T_CRIT, P_CRIT_MPA as WATER_P_CRIT_MPA,
  VALIDITY_TEXT as WATER_VALIDITY, type WaterState, type WaterPhase, type IF97Input,
} from "./water/index.js";
export { waterResidual, type WaterResidual } from "./water/index.js";
