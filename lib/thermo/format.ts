/**
 * Numbers in thermo error and caution texts: six significant figures in units an engineer reads at a
 * glance (bar rather than 8000000 Pa, kJ/mol rather than 16042999.999999998 J/mol), so a message can be
 * acted on without mental arithmetic. Only for texts; values themselves stay SI numbers.
 */

/** x to 6 significant figures without trailing zeros ("16043", "0.0563", "1e+06"); Infinity and NaN as words. */
export function num(x: number, digits = 6): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return "0";
  const a = Math.abs(x);
  if (a >= 1e-4 && a < 1e9) return String(Number(x.toPrecision(digits)));
  return x.toExponential(digits - 1).replace(/\.?0+e/, "e");
}

/** Temperature in K. */
export function kelvin(T: number): string {
  return `${num(T)} K`;
}

/** Pressure in Pa below 1 kPa, kPa below 1 bar, bar below 100 MPa, MPa above (SI input, Pa). */
export function pressureText(P: number): string {
  const a = Math.abs(P);
  if (!Number.isFinite(P)) return `${P} Pa`;
  if (a < 1e3) return `${num(P)} Pa`;
  if (a < 1e5) return `${num(P / 1e3)} kPa`;
  if (a < 1e8) return `${num(P / 1e5)} bar`;
  return `${num(P / 1e6)} MPa`;
}

/** Molar volume in cm^3/mol below 1 L/mol, else L/mol (SI input, m^3/mol). */
export function volumeText(V: number): string {
  if (!Number.isFinite(V)) return `${V} m^3/mol`;
  return Math.abs(V) < 1e-3 ? `${num(V * 1e6)} cm^3/mol` : `${num(V * 1e3)} L/mol`;
}

/** Molar energy in J/mol below 1 kJ/mol, else kJ/mol (SI input, J/mol). */
export function energyText(E: number): string {
  if (!Number.isFinite(E)) return `${E} J/mol`;
  return Math.abs(E) < 1e3 ? `${num(E)} J/mol` : `${num(E / 1e3)} kJ/mol`;
}

/** Molar entropy in J/(mol K) (SI input). */
export function entropyText(S: number): string {
  return `${num(S)} J/(mol K)`;
}
