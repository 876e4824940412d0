/**
 * Shape of an IAPWS coefficient table: term i contributes n[i] * f(pi)^I[i] * g(tau)^J[i].
 * Tables with a single sum over one variable leave I empty.
 */
export interface Terms {
  readonly I: readonly number[];
  readonly J: readonly number[];
  readonly n: readonly number[];
}
