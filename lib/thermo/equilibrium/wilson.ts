/**
 * Wilson's vapour-pressure estimate ln(Psat/Pc) = 5.373 (1 + omega)(1 - Tc/T), the usual starting point
 * for equal-fugacity iterations (G. M. Wilson, "A modified Redlich-Kwong equation of state...", 1968;
 * it reproduces the acentric-factor definition at Tr = 0.7 and Psat = Pc at Tc). Accuracy: a few % to
 * tens of % away from Tr 0.7-1; used only as an initial guess. Units: K, Pa.
 */
export function wilsonPsat(c: { Tc: number; Pc: number; omega: number }, T: number): number {
  return c.Pc * Math.exp(5.373 * (1 + c.omega) * (1 - c.Tc / T));
}

/** Inverse of wilsonPsat: the temperature (K) at which the estimate equals P (Pa). */
export function wilsonTsat(c: { Tc: number; Pc: number; omega: number }, P: number): number {
  return c.Tc / (1 - Math.log(P / c.Pc) / (5.373 * (1 + c.omega)));
}
