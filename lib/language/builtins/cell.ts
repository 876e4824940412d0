/**
 * Output from the middle of a cell: echo writes text to stdout, show displays a value's rich output.
 */
import { defineBuiltin, type BuiltinDef } from "./define.js";

export const cell: BuiltinDef[] = [
  defineBuiltin({
    name: "echo",
    group: "output",
    params: [{ name: "values", type: "any", rest: true, doc: "values to print, separated by spaces" }],
    returns: "none",
    doc: "Prints its arguments as one line of text (stdout). Text in quotes prints as is; quantities with their units.",
    examples: ['echo("pressure:", 2.5 bar)'],
    impl: ({ values }, ctx) => {
      ctx.stdout((values as unknown[]).map((v) => (typeof v === "string" ? v : ctx.textOf(v))).join(" ") + "\n");
      return undefined;
    },
  }),
  defineBuiltin({
    name: "show",
    group: "output",
    params: [{ name: "x", type: "any", doc: "any value" }],
    returns: "none",
    doc: "Displays the rich output of x (tables, charts, formatted quantities) now, in the middle of the cell.",
    examples: ["show({T: 300 K, P: 1 bar})"],
    impl: ({ x }, ctx) => {
      ctx.display(ctx.bundleOf(x));
      return undefined;
    },
  }),
  defineBuiltin({
    name: "clear",
    group: "output",
    params: [{ name: "wait", type: "boolean", optional: true, doc: "true: clear when the next output arrives (no flicker)" }],
    returns: "none",
    doc: "Clears this cell's output so far (in a loop of show() calls, clear(true) replaces the previous display).",
    examples: ["clear(true)"],
    impl: ({ wait }, ctx) => {
      ctx.clear(wait === true);
      return undefined;
    },
  }),
];
