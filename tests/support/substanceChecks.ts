/**
 * Checks shared by the databank tests (tests/lib/thermo/substances/*): each file keeps its own
 * reference values with their sources and hands them to these.
 */
import { expect } from "vitest";
import type { Substance } from "../../lib/thermo/substances/types.js";

/** The record with this id in a databank list (fails the test if it is missing). */
export function substanceIn(list: readonly Substance[], id: string): Substance {
  const s = list.find((x) => x.id === id);
  expect(s, `no substance "${id}"`).toBeDefined();
  return s!;
}

/**
 * Each [id, Tc K, Pc Pa] of `ref` matches the databank's Tc within 0.2 % and Pc within 1 % (the spread
 * between the tables' rounded constants and the reference equations' critical points; common practice).
 */
export function expectCriticalPointsNear(list: readonly Substance[], ref: readonly [string, number, number][]): void {
  for (const [id, Tc, Pc] of ref) {
    const s = substanceIn(list, id);
    expect(Math.abs(s.Tc / Tc - 1), id).toBeLessThan(0.002);
    expect(Math.abs(s.Pc / Pc - 1), id).toBeLessThan(0.01);
  }
}
