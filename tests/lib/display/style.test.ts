import { describe, expect, it } from "vitest";
import { CHART_FONT, CHART_FONT_FAMILY, chartConfig, DASHES, PALETTE } from "../../../lib/display/style.js";

/** WCAG 2.x relative luminance and contrast ratio (W3C, Web Content Accessibility Guidelines 2.1, 1.4.11). */
function luminance(hex: string): number {
  const c = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((v) => (v <= 0.03928 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4));
  return 0.2126 * c[0]! + 0.7152 * c[1]! + 0.0722 * c[2]!;
}
const contrast = (a: string, b: string) => (Math.max(luminance(a), luminance(b)) + 0.05) / (Math.min(luminance(a), luminance(b)) + 0.05);

describe("chartConfig", () => {
  it("chartConfig names the shipped font first so SVG and PNG agree", () => {
    const c = chartConfig();
    expect(c.font).toBe(CHART_FONT);
    expect(CHART_FONT.split(",")[0]).toBe(CHART_FONT_FAMILY);
  });
  it("chartConfig series colours are distinct and stand out from the background", () => {
    const bg = chartConfig().background as string;
    expect(new Set(PALETTE).size).toBe(PALETTE.length);
    // WCAG 2.1 SC 1.4.11 asks 3:1 for graphical objects.
    for (const colour of PALETTE) expect(contrast(colour, bg)).toBeGreaterThanOrEqual(3);
    expect(new Set(DASHES.map((d) => d.join(","))).size).toBe(DASHES.length);
  });
});
