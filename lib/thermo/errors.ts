/**
 * ThermoError: every input or state a thermo function cannot handle is reported with the argument it
 * concerns, so the language layer can point at the right argument of the user's call.
 */
export class ThermoError extends Error {
  /** The argument that was wrong, e.g. "T", "P", "phase", "x". */
  readonly argument: string;

  constructor(argument: string, message: string) {
    super(message);
    this.name = "ThermoError";
    this.argument = argument;
  }
}

/** Throws ThermoError unless `value` is a finite number greater than zero. `unit` is shown in the message. */
export function requirePositive(argument: string, value: number, unit: string): void {
  if (!Number.isFinite(value) || value <= 0) {
    throw new ThermoError(argument, `${argument} must be a finite number > 0 ${unit}; got ${Number.isFinite(value) ? Number(value.toPrecision(6)) : value}`);
  }
}
