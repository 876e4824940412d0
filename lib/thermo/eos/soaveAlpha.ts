/**
 * The Soave alpha function alpha(Tr) = [1 + m (1 - sqrt(Tr))]^2 shared by SRK and Peng-Robinson; only the
 * slope m(omega) differs between them. d alpha/d Tr = -m [1 + m (1 - sqrt(Tr))] / sqrt(Tr).
 */
export function soaveAlpha(Tr: number, m: number): number {
  const s = 1 + m * (1 - Math.sqrt(Tr));
  return s * s;
}

export function soaveAlphaDTr(Tr: number, m: number): number {
  const sq = Math.sqrt(Tr);
  return (-m * (1 + m * (1 - sq))) / sq;
}
