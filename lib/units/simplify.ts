/**
 * Cancel repeated units in a compound: mathjs leaves `8.314 J/(mol K) * 298.15 K` as "(J K)/(mol K)"
 * and `kJ/(kg K) * g/mol` as "(kJ g)/(kg K mol)". Components of the same kind of unit (mathjs base
 * key: MASS, ENERGY, ...) are merged into the first one written, powers summed, zero powers dropped.
 * Otherwise the user's own units are kept (never switched to base SI).
 */
import type { Unit } from "mathjs";

function prefixName(c: Unit["units"][number]): string {
  return typeof c.prefix === "string" ? c.prefix : ((c.prefix as { name?: string } | undefined)?.name ?? "");
}

export function cancelUnits(u: Unit): Unit | number {
  if (u.units.length < 2) return u;
  const groups = new Map<string, { name: string; power: number }>();
  for (const c of u.units) {
    const key = c.unit.base.key;
    const g = groups.get(key);
    if (g === undefined) groups.set(key, { name: prefixName(c) + c.unit.name, power: c.power });
    else g.power += c.power;
  }
  const kept = [...groups.values()].filter((g) => Math.abs(g.power) > 1e-12);
  if (kept.length === u.units.length) return u;
  // All powers cancel: the stored value is the pure number (toNumber("") would divide by kJ/J = 1000).
  if (kept.length === 0) return Number(u.value);
  const text = kept.map((g) => (g.power === 1 ? g.name : `${g.name}^${g.power}`)).join(" ");
  return u.to(text);
}
