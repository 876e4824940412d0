import { describe, expect, it } from "vitest";
import { loadMathjs } from "../../../../lib/language/mathjs.js";
import { installUnits } from "../../../../lib/units/index.js";
import { bindBuiltin } from "../../../../lib/language/builtins/bind.js";
import { defineBuiltin, type BuiltinContext } from "../../../../lib/language/builtins/define.js";
import { createUnitsBridge } from "../../../../lib/language/unitsBridge.js";
import { createColumnFactory, isQuantityColumn } from "../../../../lib/language/values/column.js";
import { MIME } from "../../../../lib/display/index.js";

const lib = loadMathjs();
const math = lib.create(lib.all, {});
installUnits(math);
const units = createUnitsBridge(math);
const column = createColumnFactory(math);
let stops = false;
const ctx: BuiltinContext = {
  shouldStop: () => stops, interrupted: () => new Error("stopped"), stdout() {}, display() {},
  bundleOf: (v) => ({ [MIME.text]: String(v) }), textOf: (v) => (math.isUnit(v) ? v.toString() : String(v)), warn() {},
  units, column: (si, d, u) => column(si, units.siUnitOf(d), u ?? units.displayUnitFor(si, d)), call: (f, ...a) => (f as (...x: unknown[]) => unknown)(...a),
};

// Ideal-gas pressure P = R T / V with R = 8.314462618 J/(mol K) (CODATA 2018, exact).
const R = 8.314462618;
const idealP = bindBuiltin(defineBuiltin({
  name: "pig", group: "test", returns: "pressure", doc: "ideal-gas pressure", examples: ["pig(300 K, 1 L/mol)"], vectorize: true,
  params: [
    { name: "T", type: "quantity", dim: "temperature", doc: "temperature" },
    { name: "V", type: "quantity", dim: "molar_volume", doc: "molar volume" },
  ],
  impl: ({ T, V }) => (R * T) / V,
}), math, () => ctx);

const rec = bindBuiltin(defineBuiltin({
  name: "rec", group: "test", returns: "record", fields: { T: "temperature", P: "pressure" }, doc: "record", examples: ["rec(1 K)"], vectorize: true,
  params: [{ name: "T", type: "quantity", dim: "temperature", doc: "t" }],
  impl: ({ T }) => ({ T, P: 2 * T, phase: "gas" }),
}), math, () => ctx);

const opaque = bindBuiltin(defineBuiltin({
  name: "needsModel", group: "test", returns: "any", doc: "x", examples: ["x"],
  params: [{ name: "m", type: "model", doc: "model" }, { name: "mode", type: "string", choices: ["a", "b"], optional: true, doc: "mode" }],
  impl: ({ mode }) => mode ?? "none",
}), math, () => ctx);

describe("bindBuiltin", () => {
  it("bindBuiltin converts quantities to SI once and wraps the SI result (300 K, 1 L/mol -> R*300/0.001 Pa)", () => {
    const p = idealP(math.unit(300, "K"), math.unit(1, "L/mol")) as ReturnType<typeof math.unit>;
    // R T / V = 8.314462618 * 300 / 1e-3 = 2494338.7854 Pa (arithmetic on the CODATA value).
    expect(p.toNumber("Pa")).toBeCloseTo(2494338.7854, 3);
  });
  it("bindBuiltin uses absolute temperature for offset units (25 degC = 298.15 K, SI Brochure 9th ed. 2.3.1)", () => {
    const p = idealP(math.unit(25, "degC"), math.unit(1, "m^3/mol")) as ReturnType<typeof math.unit>;
    expect(p.toNumber("Pa")).toBeCloseTo(R * 298.15, 9);
  });
  it("bindBuiltin names argument, function, expected and got on a wrong dimension", () => {
    expect(() => idealP(math.unit(3, "bar"), math.unit(1, "L/mol"))).toThrow(/argument T of pig\(\) needs a temperature.*got 3 bar \(a pressure\)/);
    expect(() => idealP(300, math.unit(1, "L/mol"))).toThrow(/argument T of pig\(\).*plain number/);
  });
  it("bindBuiltin reports missing and extra arguments with the signature", () => {
    expect(() => idealP(math.unit(300, "K"))).toThrow(/pig\(\) is missing argument V \(molar_volume\)/);
    expect(() => idealP(math.unit(300, "K"), math.unit(1, "L/mol"), 3)).toThrow(/at most 2 arguments, got 3/);
  });
  it("bindBuiltin vectorises an array argument into one column of SI results", () => {
    const Ts = column(Float64Array.from([300, 400]), "K", "K");
    const out = idealP(Ts, math.unit(1, "m^3/mol"));
    expect(isQuantityColumn(out)).toBe(true);
    if (!isQuantityColumn(out)) return;
    expect(Array.from(out.si)).toEqual([R * 300, R * 400]);
    expect(out.siUnit).toBe("Pa");
  });
  it("bindBuiltin vectorises plain arrays of quantities and checks equal lengths", () => {
    const out = idealP([math.unit(300, "K"), math.unit(27, "degC")], math.unit(1, "m^3/mol"));
    expect(isQuantityColumn(out) && Array.from(out.si)).toEqual([R * 300, R * 300.15]);
    expect(() => idealP([math.unit(1, "K"), math.unit(2, "K")], [math.unit(1, "m^3/mol")])).toThrow(/same length; T has 2, V has 1/);
  });
  it("bindBuiltin polls shouldStop in vectorised loops", () => {
    stops = true;
    try {
      expect(() => idealP(column(new Float64Array(1000).fill(300), "K", "K"), math.unit(1, "m^3/mol"))).toThrow(/stopped/);
    } finally {
      stops = false;
    }
  });
  it("bindBuiltin wraps record fields and builds a record of columns when vectorised", () => {
    const one = rec(math.unit(10, "K")) as Record<string, unknown>;
    expect(math.isUnit(one.T) && (one.T as ReturnType<typeof math.unit>).toNumber("K")).toBe(10);
    expect(one.phase).toBe("gas");
    const many = rec([math.unit(1, "K"), math.unit(2, "K")]) as Record<string, unknown>;
    expect(isQuantityColumn(many.P) && Array.from((many.P as { si: Float64Array }).si)).toEqual([2, 4]);
    expect(math.isMatrix(many.phase)).toBe(true);
  });
  it("bindBuiltin checks opaque kinds and string choices", () => {
    const model = { kind: "model", toBundle: () => ({ [MIME.text]: "m" }), toText: () => "m" };
    expect(opaque(model)).toBe("none");
    expect(opaque(model, "b")).toBe("b");
    expect(() => opaque(model, "c")).toThrow(/argument mode of needsModel\(\) must be one of "a", "b", got "c"/);
    expect(() => opaque(3)).toThrow(/argument m of needsModel\(\) needs a model/);
  });
});
