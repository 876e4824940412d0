/**
 * The zeromq package, loaded with require. zeromq ships CommonJS; an ES `import` of it makes Node
 * first scan its source for export names (cjs-module-lexer), about 10 ms of CPU at every kernel
 * start. Types come from the ordinary type-only import.
 */
import { createRequire } from "node:module";
import type * as Zmq from "zeromq";

export const zmq = createRequire(import.meta.url)("zeromq") as typeof Zmq;
export type { Zmq };
