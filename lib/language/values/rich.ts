/**
 * Opaque language values (models, substances, tables, charts, columns) display through one
 * convention: they implement RichValue. The session calls toBundle() for show(x) and for a cell's
 * visible values, toText() where only text fits (echo, tables of records), and reads fields() for
 * completion after `x.`. `kind` lets a built-in parameter ask for a particular opaque value
 * (a param of type "model" accepts only RichValues with kind "model").
 */
import type { MimeBundle } from "../../display/index.js";

export interface RichValue {
  readonly kind: string;
  toBundle(): MimeBundle;
  toText(): string;
  /** Field names offered by completion after `value.` (records use their own keys). */
  fields?(): string[];
  /**
   * Set when the built-in that made this value already showed it, as the display with this id
   * (progressive output of a long sweep). The session then leaves it out as the value of the
   * statement that produced it in that cell; later it shows like any other value (show(x), or x
   * as a cell's last line).
   */
  readonly displayId?: string;
}

export function isRichValue(x: unknown): x is RichValue {
  return (
    typeof x === "object" && x !== null &&
    typeof (x as RichValue).kind === "string" &&
    typeof (x as RichValue).toBundle === "function" &&
    typeof (x as RichValue).toText === "function"
  );
}
