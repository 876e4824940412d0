/**
 * installUnits(math): the one call lib/language makes on a fresh mathjs instance, before locking it:
 * adds the practitioner's units (catalog.ts), the offset-unit policy (arithmetic.ts), conversion of
 * compound values into offset units (offsetTo.ts) and a cache of
 * parsed unit strings (parseCache.ts; evaluation and display parse the same few units over and over).
 */
import type { MathJsInstance } from "mathjs";
import { installOffsetPolicy } from "./arithmetic.js";
import { installOffsetConversion } from "./offsetTo.js";
import { ADDED_UNITS } from "./catalog.js";
import { installParseCache } from "./parseCache.js";

export function installUnits(math: MathJsInstance): void {
  for (const u of ADDED_UNITS) {
    const def: { definition: string; offset?: number; aliases?: string[]; prefixes?: "short" } = { definition: u.definition };
    if (u.offset !== undefined) def.offset = u.offset;
    if (u.aliases !== undefined) def.aliases = u.aliases;
    if (u.prefixes !== undefined) def.prefixes = u.prefixes;
    math.createUnit(u.name, def, { override: u.override === true });
  }
  installOffsetPolicy(math);
  installOffsetConversion(math);
  installParseCache(math);
}
