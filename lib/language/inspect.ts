/**
 * Inspect (shift-tab help): for a built-in, everything comes from its registry record: signature,
 * each argument with its dimension, method, source and examples. For a variable, its value.
 */
import { MIME } from "../display/index.js";
import type { InspectResult } from "./session.js";
import type { SessionInternals } from "./createSession.js";
import { signatureOf, type BuiltinDef } from "./builtins/define.js";
import { codePointToOffset } from "./statements.js";
import { CONSTANTS } from "./constants.js";

const escapeHtml = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;");

/** The name under the cursor, or else the function whose argument list holds the cursor. */
export function nameAt(code: string, offset: number): string | undefined {
  const word = /[A-Za-z_][A-Za-z_0-9]*$/.exec(code.slice(0, offset))?.[0] ?? "";
  const rest = /^[A-Za-z_0-9]*/.exec(code.slice(offset))![0];
  if (/^[A-Za-z_]/.test(word + rest)) return word + rest;
  let depth = 0;
  for (let i = offset - 1; i >= 0; i--) {
    const ch = code[i]!;
    if (ch === ")" || ch === "]" || ch === "}") depth++;
    else if (ch === "(" || ch === "[" || ch === "{") {
      if (depth === 0) return ch === "(" ? /[A-Za-z_][A-Za-z_0-9]*$/.exec(code.slice(0, i))?.[0] : undefined;
      depth--;
    }
  }
  return undefined;
}

export function builtinHelp(def: BuiltinDef, detail: 0 | 1): { text: string; html: string } {
  const lines = [signatureOf(def), "", def.doc, "", "Arguments:"];
  for (const p of def.params) {
    const kind = p.dim ? `quantity (${p.dim})` : p.type;
    lines.push(`  ${p.rest ? "..." : ""}${p.name}: ${kind}${p.optional ? ", optional" : ""} - ${p.doc}`);
  }
  lines.push(`Returns: ${def.returns}${def.fields ? ` (${Object.entries(def.fields).map(([k, d]) => `${k}: ${d}`).join(", ")})` : ""}`);
  if (def.method) lines.push("", `Method: ${def.method}`);
  if (def.source) lines.push(`Source: ${def.source}`);
  const examples = detail === 1 ? def.examples : def.examples.slice(0, 1);
  lines.push("", examples.length > 1 ? "Examples:" : "Example:", ...examples.map((e) => `  ${e}`));
  const text = lines.join("\n");
  return { text, html: `<pre>${escapeHtml(text)}</pre>` };
}

export function inspectAt(internals: SessionInternals, code: string, cursorPos: number, detail: 0 | 1): InspectResult {
  const name = nameAt(code, codePointToOffset(code, cursorPos));
  if (!name) return { found: false };
  if (internals.scope.has(name)) {
    const value = internals.scope.get(name);
    const shown = `${name} = ${internals.formatText(value)}`;
    const constant = CONSTANTS.find((c) => c.name === name);
    if (constant !== undefined && internals.predefined.get(name) === value) {
      const text = `${shown}\n\n${constant.doc}\nSource: ${constant.source}`;
      return { found: true, bundle: { [MIME.text]: text, [MIME.html]: `<pre>${escapeHtml(text)}</pre>` } };
    }
    return { found: true, bundle: { [MIME.text]: shown } };
  }
  const def = internals.registry.get(name);
  if (def) {
    const help = builtinHelp(def, detail);
    return { found: true, bundle: { [MIME.text]: help.text, [MIME.html]: help.html } };
  }
  if (internals.unitNames().includes(name)) {
    const u = internals.math.unit(1, name);
    const dim = internals.units.dimensionOf(u);
    const si = dim ? internals.units.siUnitOf(dim) : "";
    const size = si ? u.to(si) : u.toSI();
    const head = `${name}: unit${dim ? ` of ${dim.replace(/_/g, " ")}` : ""}, 1 ${name} = ${internals.formatText(size)}`;
    // literals.ts: the rule a user needs once a variable takes a unit's name.
    const rule = `Right after a number (2 ${name}, 2 ${name}^2, 2 ${name}/s) and after to/in, ${name} is always this unit, even when a variable is called ${name}; alone it is the variable, if one exists.`;
    return { found: true, bundle: { [MIME.text]: `${head}\n${rule}` } };
  }
  return { found: false };
}
