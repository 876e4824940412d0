/**
 * The one error type lib/units throws. The language turns it into a LanguageError with a line,
 * column and caret; the message itself already says what was wrong and how to write it instead.
 */
export class UnitsError extends Error {
  override readonly name = "UnitsError";
  /** Short machine-readable reason, for tests and for the language's error translation. */
  readonly code: UnitsErrorCode;

  constructor(code: UnitsErrorCode, message: string) {
    super(message);
    this.code = code;
  }
}

export type UnitsErrorCode =
  | "wrong_dimension"
  | "ambiguous_offset"
  | "absolute_plus_absolute"
  | "not_a_quantity"
  | "bad_argument";
