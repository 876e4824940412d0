/**
 * Completion inside a string argument: substance names where a built-in's parameter takes one
 * (substance("me|"), pr("prop|"), mixture({"eth|"...})) and the phase words where the parameter is
 * `phase` (state(m, T, P, "liq|"), {phase: "v|"}). Which parameter takes what comes from the
 * registry record (its parameter name and doc), so a new built-in that takes a substance name gets
 * completion by documenting it that way.
 */
import type { BuiltinDef } from "./builtins/define.js";
import { listSubstances, normalizeName } from "../thermo/index.js";

export const PHASE_WORDS = ["stable", "liquid", "vapor"] as const;

/** A parameter doc that says it takes a substance name ("a substance name", "a name, alias or formula", "by substance name"). */
const TAKES_NAME = /substance name|a name, alias or formula/;

/** Where an open string starts before the cursor (offset of its quote), or undefined if none is open. */
export function openStringStart(before: string): number | undefined {
  let quote: string | null = null;
  let start = -1;
  for (let i = 0; i < before.length; i++) {
    const ch = before[i]!;
    if (quote) {
      if (ch === "\\") i++;
      else if (ch === quote || ch === "\n") quote = null;
    } else if (ch === "#") {
      while (i + 1 < before.length && before[i + 1] !== "\n") i++;
    } else if (ch === '"' || ch === "'") {
      quote = ch;
      start = i;
    }
  }
  return quote ? start : undefined;
}

/** The call whose argument list holds `offset`, and the index of that argument (strings masked). */
export function enclosingCall(code: string, offset: number): { name: string; index: number } | undefined {
  const text = code.slice(0, offset).replace(/"(?:[^"\\\n]|\\.)*"|'(?:[^'\\\n]|\\.)*'/g, (q) => " ".repeat(q.length));
  let depth = 0;
  let commas = 0;
  for (let i = text.length - 1; i >= 0; i--) {
    const ch = text[i]!;
    if (ch === ")" || ch === "]" || ch === "}") depth++;
    else if (ch === "(" || ch === "[" || ch === "{") {
      if (depth > 0) depth--;
      else if (ch === "(") {
        const name = /[A-Za-z_][A-Za-z_0-9]*$/.exec(text.slice(0, i))?.[0];
        return name ? { name, index: commas } : undefined;
      } else commas = 0; // inside a record or array of the argument: its commas are its own
    } else if (ch === "," && depth === 0) commas++;
  }
  return undefined;
}

/** Words to offer for the string being typed at `offset` in `code` (prefix: what is typed so far). */
/**
 * Words to offer for the string being typed at `offset` in `code`: undefined when the cursor is not
 * in a string; no matches inside other strings (names of variables or functions do not belong there).
 */
export function stringCompletions(code: string, offset: number, registry: ReadonlyMap<string, BuiltinDef>): { matches: string[]; start: number } | undefined {
  const before = code.slice(0, offset);
  const quote = openStringStart(before);
  if (quote === undefined) return undefined;
  const none = { matches: [], start: quote + 1 };
  const call = enclosingCall(code, quote);
  const params = (call && registry.get(call.name)?.params) || [];
  const param = call ? params[Math.min(call.index, params.length - 1)] : undefined;
  if (!param) return none;
  const typed = before.slice(quote + 1);
  let words: string[];
  if (param.name === "phase") words = [...PHASE_WORDS];
  else if (TAKES_NAME.test(param.doc)) words = substanceWords();
  else return none;
  // As typed (case aside) first; else ignoring spaces, hyphens and dots as the databank does (nbutane).
  const lower = typed.toLowerCase();
  const direct = words.filter((w) => w.toLowerCase().startsWith(lower));
  const key = normalizeName(typed);
  return { matches: direct.length ? direct : words.filter((w) => normalizeName(w).startsWith(key)), start: quote + 1 };
}

/** Each databank record's id, then its formula and aliases (those without spaces). */
function substanceWords(): string[] {
  const out: string[] = [];
  for (const s of listSubstances()) {
    out.push(s.id);
    for (const extra of [s.formula, ...s.aliases]) if (!/\s/.test(extra)) out.push(extra);
  }
  return [...new Set(out)];
}
