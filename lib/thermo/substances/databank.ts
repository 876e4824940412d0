/**
 * The databank: every built-in substance record, and lookup by name, alias or formula.
 *
 * Matching ignores case, spaces, hyphens, underscores and commas, so "R134a", "r-134a", "n-butane",
 * "N butane" and "nC4" resolve alike. Unknown names throw a ThermoError listing the nearest known names
 * (Levenshtein edit distance).
 */
import { ThermoError } from "../errors.js";
import { ALKANES } from "./alkanes.js";
import { GASES } from "./gases.js";
import { POLAR } from "./polar.js";
import { REFRIGERANTS } from "./refrigerants.js";
import { TRIPLE_POINTS } from "./triplePoints.js";
import type { Substance } from "./types.js";
import { UNSATURATED } from "./unsaturated.js";

/** A record with its triple point (triplePoints.ts) where one is known. */
function withTriple(s: Substance): Substance {
  const t = TRIPLE_POINTS[s.id];
  if (!t) return s;
  return { ...s, Tt: t.Tt, ...(t.Pt !== undefined ? { Pt: t.Pt } : {}), tripleSource: t.source };
}

/** Every built-in record, grouped by family in the order listed. */
export const SUBSTANCES: readonly Substance[] = Object.freeze([
  ...ALKANES,
  ...UNSATURATED,
  ...GASES,
  ...POLAR,
  ...REFRIGERANTS,
].map(withTriple));

/** The matching key of a name: lower case without spaces, hyphens, underscores, commas or dots. */
export function normalizeName(name: string): string {
  return name.toLowerCase().replace(/[\s\-_,.]/g, "");
}

function buildIndex(records: readonly Substance[]): ReadonlyMap<string, Substance> {
  const index = new Map<string, Substance>();
  for (const s of records) {
    const keys = new Set([s.id, s.name, s.formula, ...s.aliases].map(normalizeName));
    for (const key of keys) {
      const other = index.get(key);
      if (other !== undefined && other !== s) {
        // A programming error in the data files: fail at load rather than resolve ambiguously.
        throw new Error(`databank: name "${key}" is used by both ${other.id} and ${s.id}`);
      }
      index.set(key, s);
    }
  }
  return index;
}

/** Immutable after construction: name key -> record. */
const INDEX: ReadonlyMap<string, Substance> = buildIndex(SUBSTANCES);

/** Levenshtein edit distance (insertions, deletions, substitutions each cost 1). */
export function editDistance(a: string, b: string): number {
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const cur = [i];
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      cur.push(Math.min(prev[j]! + 1, cur[j - 1]! + 1, prev[j - 1]! + cost));
    }
    prev = cur;
  }
  return prev[b.length]!;
}

/** Up to `limit` known names closest to `name`, best first (only reasonably close ones). */
export function suggestSubstances(name: string, limit = 3): string[] {
  const key = normalizeName(name);
  const scored: { label: string; d: number }[] = [];
  const seen = new Set<string>();
  for (const s of SUBSTANCES) {
    let best = Infinity;
    let label = s.id;
    for (const candidate of [s.id, s.formula, ...s.aliases]) {
      const ck = normalizeName(candidate);
      // A prefix match ("prop" -> propane) counts as close as a 1-letter typo.
      const d = ck.startsWith(key) && key.length >= 3 ? 1 : editDistance(key, ck);
      if (d < best) {
        best = d;
        label = candidate === s.id ? s.id : `${candidate} (${s.id})`;
      }
    }
    const allowed = Math.max(2, Math.floor(key.length / 3));
    if (best <= allowed && !seen.has(s.id)) {
      seen.add(s.id);
      scored.push({ label, d: best });
    }
  }
  scored.sort((p, q) => p.d - q.d || p.label.localeCompare(q.label));
  return scored.slice(0, limit).map((s) => s.label);
}

/**
 * The databank record for a name, alias or formula (case-insensitive): "CH4", "methane", "n-butane",
 * "butane", "nC4", "iC4", "R134a", "R-744", "carbon dioxide". Throws ThermoError (argument "name")
 * with suggestions when unknown.
 */
export function getSubstance(name: string): Substance {
  if (typeof name !== "string" || name.trim() === "") {
    throw new ThermoError("name", `substance name must be a non-empty string; got ${JSON.stringify(name)}`);
  }
  const found = INDEX.get(normalizeName(name));
  if (found !== undefined) return found;
  const hints = suggestSubstances(name);
  const hint = hints.length > 0 ? ` Did you mean: ${hints.join(", ")}?` : "";
  throw new ThermoError(
    "name",
    `unknown substance "${name}".${hint} (${SUBSTANCES.length} substances are built in; listSubstances() names them all, or define your own with a pseudo-component {name, Tc, Pc, omega, M})`,
  );
}

/** All built-in records (id order as in the data files). */
export function listSubstances(): readonly Substance[] {
  return SUBSTANCES;
}
