/**
 * THE list of built-ins: one line per group file. Completion, inspect, suggestions and the
 * executed-examples test read this list; nothing else registers built-ins.
 */
import type { BuiltinDef } from "./define.js";
import { ranges } from "./ranges.js";
import { cell } from "./cell.js";
import { display } from "./display.js";
import { numerics } from "./numerics.js";
import { thermo } from "./thermo.js";
import { water } from "./water.js";
import { charts } from "./charts.js";

export const BUILTINS: readonly BuiltinDef[] = [
  ...ranges,
  ...cell,
  ...display,
  ...numerics,
  ...thermo,
  ...water,
  ...charts,
];

export { defineBuiltin, signatureOf, type BuiltinDef, type BuiltinContext, type BuiltinArgs, type ParamSpec, type ParamType } from "./define.js";
export { ArgumentError } from "./bind.js";
