import { describe, expect, it } from "vitest";
import * as sources from "../../../../lib/thermo/substances/sources.js";

describe("sources", () => {
  it("sources: every citation names an edition or year and says whether recalled", () => {
    for (const [name, text] of Object.entries(sources)) {
      // REFRIG_CP_APPROX points at each fluid's own citation (which carries the year) instead.
      expect(text, name).toMatch(/\b(1[89]\d\d|20\d\d)\b|\d(st|nd|rd|th) ed\.|cited for the fluid/);
      expect(text, name).toMatch(/from memory/);
    }
  });
});
