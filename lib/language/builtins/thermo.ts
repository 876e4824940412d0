/**
 * Thermodynamics built-ins, part 1: substances, mixtures, models and the molar/mass basis pair.
 * States and properties are in thermoState.ts and thermoProps.ts; water (if97) in water.ts.
 * The algorithms all live in lib/thermo; these records only convert at the edge and display.
 */
import { per_mass, per_mole } from "../../units/index.js";
import { defineBuiltin, type BuiltinDef } from "./define.js";
import { fluidOf } from "./thermoArgs.js";
import { mixtureValue, resolveSubstance } from "./thermoFluids.js";
import { MODEL_IDS, modelValue, type ModelId } from "./thermoModels.js";
import { thermoProps } from "./thermoProps.js";
import { thermoState } from "./thermoState.js";

type UnitLike = { formatUnits(): string; to(u: string): unknown };
const isUnitLike = (v: unknown): v is UnitLike =>
  typeof v === "object" && v !== null && (v as { isUnit?: boolean }).isUnit === true;

/**
 * per_mass's result in the units engineers read: the per-mole quantity's own units with the amount
 * (mol, kmol; lbmol -> lb) replaced by the matching mass (kJ/mol -> kJ/kg, J/(mol K) -> J/(kg K)), where
 * that conversion exists; otherwise the result as simplified.
 */
function perKilogram(result: unknown, x: unknown): unknown {
  if (!isUnitLike(result) || !isUnitLike(x)) return result;
  const units = x.formatUnits();
  if (!/\b(k?mol)\b|\blbmol\b/.test(units)) return result;
  const target = units.replace(/\blbmol\b/g, "lb").replace(/\bk?mol\b/g, "kg");
  try {
    return result.to(target);
  } catch {
    return result;
  }
}

const MODEL_DOCS: Record<ModelId, { doc: string; method: string; example: string }> = {
  idealgas: { doc: "Ideal-gas model (Z = 1, no departures): the baseline every real-gas result is compared with.", method: "P V = R T.", example: 'idealgas("nitrogen")' },
  vdw: { doc: "van der Waals cubic equation of state (1873): qualitative; Zc = 3/8.", method: "P = RT/(V - b) - a/V^2 with a, b from Tc and Pc; van der Waals one-fluid mixing with kij.", example: 'vdw("carbon dioxide")' },
  rk: { doc: "Redlich-Kwong cubic equation of state (1949): gases, Zc = 1/3.", method: "P = RT/(V - b) - a(T)/(V (V + b)), a ~ Tr^-0.5.", example: 'rk("methane")' },
  srk: { doc: "Soave-Redlich-Kwong cubic (1972): hydrocarbons, vapour pressures via the acentric factor.", method: "RK form with Soave's alpha(Tr, omega).", example: 'srk("propane")' },
  pr: { doc: "Peng-Robinson cubic (1976; 1978 kappa for omega > 0.49): the workhorse for gases and light hydrocarbons, Zc = 0.3074.", method: "P = RT/(V - b) - a(T)/(V^2 + 2bV - b^2); van der Waals one-fluid mixing with kij.", example: 'pr("propane")' },
  virial: { doc: "Truncated virial equation Z = 1 + BP/RT with a generalized B (Pitzer/Abbott, or Tsonopoulos via {correlation: \"tsonopoulos\"}): gases at low to moderate density, no liquid.", method: "B from Tr and omega; mixture B = sum x_i x_j B_ij.", example: 'virial("ethane", {correlation: "tsonopoulos"})' },
  lk: { doc: "Lee-Kesler generalized correlation (1975): corresponding states with a simple and a reference fluid; mixtures by Ploecker rules (or {mixing: \"kay\"}).", method: "X = X0 + (omega/omega_r)(X_r - X0) from two modified BWR equations.", example: 'lk("n-butane")' },
};

const modelDefs: BuiltinDef[] = MODEL_IDS.map((id) =>
  defineBuiltin({
    name: id,
    group: "thermo",
    params: [
      { name: "x", type: "any", doc: 'the fluid: a substance name ("methane"), a substance(...) or a mixture(...)' },
      { name: "options", type: "record", optional: true, doc: `{reference: {T, P, H, S}} for the ideal-gas reference state${id === "virial" ? ', {correlation: "abbott" | "tsonopoulos"}' : id === "lk" ? ', {mixing: "ploecker" | "kay"}' : ""}` },
    ],
    returns: "model",
    doc: `${MODEL_DOCS[id].doc} Pass the model to state(), departure(), volume(), psat() and the other property built-ins.`,
    method: MODEL_DOCS[id].method,
    source: "lib/thermo (each model names its published source in its display)",
    examples: [MODEL_DOCS[id].example],
    impl: ({ x, options }, ctx) => modelValue(id, fluidOf(x, id, ctx, (v) => resolveSubstance(v, id, ctx)), options, ctx),
  }),
);

export const thermo: BuiltinDef[] = [
  defineBuiltin({
    name: "substance",
    group: "thermo",
    params: [{ name: "x", type: "any", doc: 'a name, alias or formula ("methane", "CH4", "n-butane", "R134a"), or a record {name, Tc, Pc, omega, M} for a pseudo-component' }],
    returns: "substance",
    doc: "A pure substance: databank constants (M, Tc, Pc, Vc, Zc, omega, Tb, ideal-gas Cp) with their published source, or your own pseudo-component. Read fields as s.Tc, s.Pc, s.omega ...",
    method: "Databank lookup ignoring case, spaces and hyphens; unknown names get suggestions. A pseudo-component fills Zc (0.291 - 0.080 omega), Vc and Tb when not given and says so in its note.",
    source: "lib/thermo/substances (each record names its table and edition)",
    examples: ['substance("methane")', 'substance("CH4").Tc', 'substance({name: "C7+ cut", Tc: 540 K, Pc: 27 bar, omega: 0.35, M: 100 g/mol})'],
    impl: ({ x }, ctx) => resolveSubstance(x, "substance", ctx),
  }),
  defineBuiltin({
    name: "mixture",
    group: "thermo",
    params: [
      { name: "fractions", type: "any", doc: 'mole fractions by substance name, e.g. {methane: 0.9, ethane: 0.1}, or a list of [component, fraction] pairs whose components are names or substance(...) values (your own pseudo-components), e.g. [["methane", 0.8], [cut, 0.2]]' },
      { name: "kij", type: "any", optional: true, doc: 'binary interaction parameters: {"methane/ethane": 0.003} (pairs "a/b" by the names in the mixture), or a symmetric matrix with zero diagonal in the order given' },
    ],
    returns: "mixture",
    doc: "A mixture by mole fraction, for any model: databank substances by name, and user pseudo-components (a C7+ cut from substance({...})) in the pair-list form. Fractions that do not sum to 1 are normalised with a warning. kij is checked here (square, symmetric, zero diagonal; 1-based indices and names in errors).",
    method: "Cubic models: van der Waals one-fluid mixing, a_ij = sqrt(a_i a_j)(1 - k_ij); virial: B = sum x_i x_j B_ij; Lee-Kesler: pseudo-critical rules.",
    examples: [
      "mixture({methane: 0.9, ethane: 0.1})",
      'mixture({methane: 0.8, "carbon dioxide": 0.2}, {"methane/carbon dioxide": 0.09})',
      'mixture({methane: 0.5, CO2: 0.5}, [0, 0.1; 0.1, 0])',
      'cut = substance({name: "C7+", Tc: 540 K, Pc: 27 bar, omega: 0.35, M: 100 g/mol}); mixture([["methane", 0.8], [cut, 0.2]], {"methane/C7+": 0.04})',
    ],
    impl: ({ fractions, kij }, ctx) => mixtureValue(fractions, kij, ctx),
  }),
  ...modelDefs,
  defineBuiltin({
    name: "per_mass",
    group: "thermo",
    params: [
      { name: "x", type: "quantity", doc: "a per-mole quantity (J/mol, m^3/mol, J/(mol K))" },
      { name: "M", type: "quantity", doc: "molar mass, e.g. 44.097 g/mol or substance(\"propane\").M" },
    ],
    returns: "any",
    doc: "A molar quantity on a mass basis: x / M (J/mol -> J/g, m^3/mol -> m^3/kg).",
    method: "Division by the molar mass you give (never guessed); shown per kg with the numerator's units (10 kJ/mol / 44.097 g/mol = 226.773 kJ/kg, not 0.226773 kJ/g).",
    examples: ['per_mass(10 kJ/mol, 44.097 g/mol)', 'per_mass(1 kJ/mol, substance("methane").M)'],
    impl: ({ x, M }) => perKilogram(per_mass(x, M), x),
  }),
  defineBuiltin({
    name: "per_mole",
    group: "thermo",
    params: [
      { name: "x", type: "quantity", doc: "a per-mass quantity (J/kg, m^3/kg, J/(kg K))" },
      { name: "M", type: "quantity", doc: "molar mass, e.g. 18.015 g/mol" },
    ],
    returns: "any",
    doc: "A specific (per-mass) quantity on a molar basis: x M.",
    method: "Multiplication by the molar mass you give; units simplified.",
    examples: ["per_mole(2257 kJ/kg, 18.015 g/mol)"],
    impl: ({ x, M }) => per_mole(x, M),
  }),
  ...thermoState,
  ...thermoProps,
];
