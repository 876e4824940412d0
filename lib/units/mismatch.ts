/**
 * Messages for quantities of different dimensions meeting in a conversion (`to`/`in`), a sum or a
 * comparison. mathjs says only "Units do not match" or "Cannot compare units with different base";
 * these name both sides with their dimensions, and for the standard-volume gas units (amounts of
 * substance that look like volumes: Sm3, Nm3, scf ...) explain what they are and how to get a volume.
 */
import type { Unit } from "mathjs";
import { ADDED_UNITS } from "./catalog.js";
import { describeValue } from "./convert.js";
import { UnitsError } from "./errors.js";

/** Standard-volume units (and their aliases) with their catalog help text. */
const STANDARD_VOLUMES: ReadonlyMap<string, string> = new Map(
  ADDED_UNITS.filter((u) => /^(Sm3|Nm3|scf|Mscf|MMscf|MMscfd|Mscfd)$/.test(u.name)).flatMap((u) => [u.name, ...(u.aliases ?? [])].map((n) => [n, u.name] as const)),
);

type UnitParts = { units?: { unit: { name: string }; prefix?: { name: string } }[] };

/** The standard-volume unit a quantity is written in, if any (its canonical name). */
function standardVolumeIn(x: unknown): string | undefined {
  const parts = (x as UnitParts | undefined)?.units;
  if (!Array.isArray(parts)) return undefined;
  for (const p of parts) {
    const canonical = STANDARD_VOLUMES.get(p.unit.name);
    if (canonical !== undefined) return canonical;
  }
  return undefined;
}

/** Why a standard-volume unit does not convert to a volume, and what to write instead. */
export function standardVolumeHint(name: string): string {
  const def = ADDED_UNITS.find((u) => u.name === name);
  const flow = /d$/.test(name);
  const what = flow ? "a molar flow (amount of substance per time)" : "an amount of substance";
  const conditions = def ? ` (${def.help})` : "";
  const per = flow ? "/s" : "";
  return `${name} is ${what}, not a volume${conditions}. A molar volume at T and P links the two: volume = n * R * T / P for an ideal gas, or n * volume(model, T, P) for a real gas (n = amount, e.g. 2 ${name}); ${name} to mol${per} gives the ${flow ? "molar flow" : "moles"}`;
}

function text(x: unknown): string {
  if (typeof x === "string") return x;
  return describeValue(x);
}

/** The error for converting `value` to `target` when their dimensions differ. */
export function conversionMismatch(value: Unit, target: string | Unit): UnitsError {
  const targetText = typeof target === "string" ? target : describeValue(target);
  const sv = standardVolumeIn(value) ?? (typeof target === "string" ? undefined : standardVolumeIn(target));
  const hint = sv ? `; ${standardVolumeHint(sv)}` : "";
  return new UnitsError("wrong_dimension", `cannot convert ${describeValue(value)} to ${targetText}: the dimensions differ${hint}`);
}

/** The error for `a op b` (op "+", "-" or a comparison) on quantities of different dimensions. */
export function operandMismatch(op: string, a: unknown, b: unknown): UnitsError {
  const sv = standardVolumeIn(a) ?? standardVolumeIn(b);
  const hint = sv ? `; ${standardVolumeHint(sv)}` : "";
  const verb = op === "+" ? "add" : op === "-" ? "subtract" : `compare (${op})`;
  const rule = op === "+" || op === "-" ? "both sides of + and - must have the same dimension" : "both sides of a comparison must have the same dimension";
  return new UnitsError("wrong_dimension", `cannot ${verb} ${text(a)} and ${text(b)}: ${rule}${hint}`);
}

/** True for mathjs's own dimension-mismatch errors. */
export function isMathjsMismatch(err: unknown): boolean {
  const m = (err as { message?: unknown } | null)?.message;
  return typeof m === "string" && /^(Units do not match|Cannot compare units with different base)/.test(m);
}

/** A value arithmetic cannot take: a record, a model or other opaque value, a function, nothing. */
export function isOpaque(x: unknown): boolean {
  if (x === undefined || x === null || typeof x === "function") return true;
  if (typeof x !== "object") return false;
  const o = x as Record<string, unknown>;
  if (Array.isArray(x) || o.isUnit === true || o.isMatrix === true || o.isComplex === true || o.isFraction === true || o.isBigNumber === true) return false;
  return true;
}

/** Words for an opaque operand: "a model (kind model)", "a record with fields T, P, ...". */
export function opaqueText(x: unknown): string {
  if (x === undefined || x === null) return "nothing (no value)";
  if (typeof x === "function") return "a function";
  const o = x as Record<string, unknown>;
  if (typeof o.kind === "string" && typeof o.toText === "function") return `a ${o.kind}`;
  const keys = Object.keys(o);
  return keys.length ? `a record (fields ${keys.slice(0, 6).join(", ")}${keys.length > 6 ? ", ..." : ""})` : "an empty record";
}

/** The error for an arithmetic or comparison operator given a record, model, function or nothing. */
export function opaqueOperand(op: string, a: unknown, b: unknown): UnitsError {
  const bad = isOpaque(a) ? a : b;
  const what = opaqueText(bad);
  const o = bad as Record<string, unknown> | null | undefined;
  let fix = "";
  if (typeof bad === "function") fix = "; call it with its argument, like f(2)";
  else if (o !== null && typeof o === "object" && typeof o.kind === "string") fix = `; pass the ${o.kind} to a built-in that takes one, or read one of its fields`;
  else if (o !== null && typeof o === "object" && Object.keys(o).length) fix = `; use one of its fields, like .${Object.keys(o)[0]}`;
  else if (bad === undefined || bad === null) fix = "; a function or field gave no value";
  return new UnitsError("not_a_quantity", `cannot use ${what} in ${op}: ${op} works on numbers, quantities and arrays${fix}`);
}
