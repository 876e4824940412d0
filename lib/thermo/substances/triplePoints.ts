/**
 * Triple points (solid-liquid-vapour) of databank substances, for the one thing a cubic or corresponding-
 * states model cannot know: below Tt the stable condensed phase is a solid, so an equation-of-state
 * "liquid" there is an extrapolation and a vapour pressure over a liquid does not exist.
 *
 * Values are the triple points adopted by each fluid's reference equation of state, recalled rather than
 * read ("(from memory)"); Pt is given only where recalled with confidence (it may be left out: Tt alone is
 * enough for the liquid and psat checks; tsat then checks the temperature it finds). Substances without an
 * entry (helium has no triple point at its own vapour pressure; air is a mixture) get the fallback rule of
 * cautions.ts instead.
 */

export interface TriplePoint {
  /** K */
  Tt: number;
  /** Pa; absent where not recalled with confidence. */
  Pt?: number;
  source: string;
}

const REF_EOS = "triple point adopted by the fluid's reference equation of state";

/** Triple point by databank id. */
export const TRIPLE_POINTS: Readonly<Record<string, TriplePoint>> = {
  // IAPWS R6-95 (IAPWS-95), triple point of water: 273.16 K, 611.657 Pa.
  water: { Tt: 273.16, Pt: 611.657, source: "IAPWS-95 (IAPWS R6-95), triple point 273.16 K, 611.657 Pa" },
  // Span & Wagner, J. Phys. Chem. Ref. Data 25 (1996) 1509 (from memory).
  "carbon dioxide": { Tt: 216.592, Pt: 517.95e3, source: `${REF_EOS}: Span & Wagner (1996) (from memory)` },
  // Setzmann & Wagner, J. Phys. Chem. Ref. Data 20 (1991) 1061 (from memory).
  methane: { Tt: 90.694, Pt: 11.696e3, source: `${REF_EOS}: Setzmann & Wagner (1991) (from memory)` },
  // Buecker & Wagner, J. Phys. Chem. Ref. Data 35 (2006) 205 (from memory).
  ethane: { Tt: 90.368, Pt: 1.142, source: `${REF_EOS}: Buecker & Wagner (2006) (from memory)` },
  // Lemmon, McLinden & Wagner, J. Chem. Eng. Data 54 (2009) 3141 (from memory).
  propane: { Tt: 85.525, source: `${REF_EOS}: Lemmon, McLinden & Wagner (2009) (from memory)` },
  // Buecker & Wagner, J. Phys. Chem. Ref. Data 35 (2006) 929 (from memory).
  "n-butane": { Tt: 134.895, Pt: 0.653, source: `${REF_EOS}: Buecker & Wagner (2006) (from memory)` },
  isobutane: { Tt: 113.73, source: `${REF_EOS}: Buecker & Wagner (2006) (from memory)` },
  // Span & Wagner, Int. J. Thermophys. 24 (2003) 41 (from memory).
  "n-pentane": { Tt: 143.47, source: `${REF_EOS}: Span & Wagner (2003) (from memory)` },
  "n-hexane": { Tt: 177.83, source: `${REF_EOS}: Span & Wagner (2003) (from memory)` },
  "n-heptane": { Tt: 182.55, source: `${REF_EOS}: Span & Wagner (2003) (from memory)` },
  "n-octane": { Tt: 216.37, source: `${REF_EOS}: Span & Wagner (2003) (from memory)` },
  cyclohexane: { Tt: 279.86, source: `${REF_EOS}: Zhou et al. (2014) (from memory)` },
  // Span et al., J. Phys. Chem. Ref. Data 29 (2000) 1361 (from memory).
  nitrogen: { Tt: 63.151, Pt: 12.523e3, source: `${REF_EOS}: Span et al. (2000) (from memory)` },
  // Schmidt & Wagner, Fluid Phase Equilib. 19 (1985) 175 (from memory).
  oxygen: { Tt: 54.361, Pt: 146.28, source: `${REF_EOS}: Schmidt & Wagner (1985) (from memory)` },
  // Tegeler, Span & Wagner, J. Phys. Chem. Ref. Data 28 (1999) 779 (from memory).
  argon: { Tt: 83.8058, Pt: 68.891e3, source: `${REF_EOS}: Tegeler, Span & Wagner (1999) (from memory)` },
  // Leachman et al., J. Phys. Chem. Ref. Data 38 (2009) 721, normal hydrogen (from memory).
  hydrogen: { Tt: 13.957, Pt: 7.36e3, source: `${REF_EOS}: Leachman et al. (2009), normal hydrogen (from memory)` },
  neon: { Tt: 24.556, Pt: 43.37e3, source: "ITS-90 defining fixed point 24.5561 K; Pt (from memory)" },
  "carbon monoxide": { Tt: 68.127, Pt: 15.45e3, source: `${REF_EOS}: Lemmon & Span (2006) (from memory)` },
  // Tillner-Roth, Harms-Watzenberg & Baehr, DKV-Tagungsbericht 20 (1993) 167 (from memory).
  ammonia: { Tt: 195.495, Pt: 6.091e3, source: `${REF_EOS}: Tillner-Roth et al. (1993) (from memory)` },
  "hydrogen sulfide": { Tt: 187.7, Pt: 23.3e3, source: `${REF_EOS}: Lemmon & Span (2006) (from memory)` },
  "sulfur dioxide": { Tt: 197.7, Pt: 1.67e3, source: `${REF_EOS}: Lemmon & Span (2006) (from memory)` },
  ethylene: { Tt: 103.986, Pt: 122.0, source: `${REF_EOS}: Smukala, Span & Wagner (2000) (from memory)` },
  propylene: { Tt: 87.953, source: `${REF_EOS}: Lemmon et al. (from memory)` },
  benzene: { Tt: 278.674, Pt: 4.785e3, source: `${REF_EOS}: Thol et al. (2012) (from memory)` },
  toluene: { Tt: 178.0, source: `${REF_EOS}: Lemmon & Span (2006) (from memory)` },
  methanol: { Tt: 175.61, source: `${REF_EOS}: de Reuck & Craven (1993) (from memory)` },
  ethanol: { Tt: 159.0, source: `${REF_EOS}: Schroeder et al. (2014) (from memory)` },
  acetone: { Tt: 178.5, source: `${REF_EOS}: Lemmon & Span (2006) (from memory)` },
  "r-134a": { Tt: 169.85, Pt: 389.6, source: `${REF_EOS}: Tillner-Roth & Baehr (1994) (from memory)` },
  "r-32": { Tt: 136.34, Pt: 48.0, source: `${REF_EOS}: Tillner-Roth & Yokozeki (1997) (from memory)` },
  "r-22": { Tt: 115.73, source: `${REF_EOS}: Kamei et al. (1995) (from memory)` },
  "r-125": { Tt: 172.52, Pt: 2.914e3, source: `${REF_EOS}: Lemmon & Jacobsen (2005) (from memory)` },
};
