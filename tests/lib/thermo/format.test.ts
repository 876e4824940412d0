import { describe, expect, it } from "vitest";
import { energyText, entropyText, kelvin, num, pressureText, volumeText } from "../../../lib/thermo/format.js";

// Unit factors by definition (SI): 1 bar = 1e5 Pa, 1 MPa = 1e6 Pa, 1 cm^3 = 1e-6 m^3, 1 L = 1e-3 m^3.
describe("num", () => {
  it("num rounds to 6 significant figures and drops float noise (QA issue 5, item 19)", () => {
    expect(num(16042999.999999998)).toBe("16043000");
    expect(num(0.1 + 0.2)).toBe("0.3");
    expect(num(-625.8123456)).toBe("-625.812");
    expect(num(1e-7)).toBe("1e-7");
    expect(num(Infinity)).toBe("Infinity");
    expect(num(0)).toBe("0");
  });
});

describe("pressureText", () => {
  it("pressureText picks Pa, kPa, bar or MPa by size", () => {
    expect(pressureText(8000000)).toBe("80 bar");
    expect(pressureText(611.657)).toBe("611.657 Pa");
    expect(pressureText(11696)).toBe("11.696 kPa");
    expect(pressureText(1e11)).toBe("100000 MPa");
  });
});

describe("volumeText, energyText, entropyText, kelvin", () => {
  it("volumeText uses cm^3/mol below 1 L/mol; energyText kJ/mol from 1 kJ/mol; kelvin and entropyText plain", () => {
    expect(volumeText(5.63e-5)).toBe("56.3 cm^3/mol");
    expect(volumeText(0.0224)).toBe("22.4 L/mol");
    expect(energyText(16042999.999999998)).toBe("16043 kJ/mol");
    expect(energyText(-250)).toBe("-250 J/mol");
    expect(kelvin(184.8512345)).toBe("184.851 K");
    expect(entropyText(-12.3456789)).toBe("-12.3457 J/(mol K)");
  });
});
