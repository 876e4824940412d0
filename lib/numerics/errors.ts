/**
 * Errors thrown by lib/numerics. Every message names the routine, what went wrong and where (the
 * argument, or the x at which the user's function misbehaved), because these messages reach notebook
 * users through the cell language unchanged.
 */

/** Base class: lets callers catch every numerics failure with one instanceof. */
export class NumericsError extends Error {
  override name = "NumericsError";
}

/** A bad argument or option: names it, says what was expected and what came. */
export class NumericsInputError extends NumericsError {
  override name = "NumericsInputError";
}

/** The integral could not be computed to the requested tolerance, or f misbehaved. */
export class IntegrationError extends NumericsError {
  override name = "IntegrationError";
  constructor(
    message: string,
    /** Best estimate so far (NaN when f returned a non-finite value). */
    readonly value: number,
    /** Estimated absolute error of `value`. */
    readonly error: number,
    readonly evaluations: number,
  ) {
    super(message);
  }
}

/** A root could not be bracketed or located. */
export class RootError extends NumericsError {
  override name = "RootError";
  constructor(
    message: string,
    /** Best x found so far (NaN when none). */
    readonly value: number,
    readonly evaluations: number,
  ) {
    super(message);
  }
}

/** A derivative could not be estimated (f non-finite around x). */
export class DerivativeError extends NumericsError {
  override name = "DerivativeError";
}

/**
 * Thrown from inside any numerics loop when the caller's `shouldStop()` returns true (a kernel
 * interrupt). Deliberately not a NumericsError: it is a request, not a failure.
 */
export class StopRequested extends Error {
  override name = "StopRequested";
  constructor(where: string) {
    super(`${where}: stopped on request (interrupt)`);
  }
}
