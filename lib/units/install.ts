/**
 * installUnits(math): the one call lib/language makes on a fresh mathjs instance, before locking it:
 * adds the practitioner's units (catalog.ts) and the offset-unit policy (arithmetic.ts).
 */
import type { MathJsInstance } from "mathjs";
import { installOffsetPolicy } from "./arithmetic.js";
import { ADDED_UNITS } from "./catalog.js";

export function installUnits(math: MathJsInstance): void {
  for (const u of ADDED_UNITS) {
    const def: { definition: string; offset?: number; aliases?: string[]; prefixes?: "short" } = { definition: u.definition };
    if (u.offset !== undefined) def.offset = u.offset;
    if (u.aliases !== undefined) def.aliases = u.aliases;
    if (u.prefixes !== undefined) def.prefixes = u.prefixes;
    math.createUnit(u.name, def, { override: u.override === true });
  }
  installOffsetPolicy(math);
}
