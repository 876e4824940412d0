/**
 * A handler whose file loads on its first request. Kernel start then loads only what kernel_info
 * needs (Node spends most of a cold start resolving and compiling module files, about 0.5 ms each);
 * the other handlers cost one short import on first use.
 */
import type { Handler } from "./context.js";

export function lazyHandler<K extends string>(load: () => Promise<{ [P in K]: Handler }>, name: K): Handler {
  let handler: Handler | undefined;
  return async (context) => {
    handler ??= (await load())[name];
    if (typeof handler !== "function") throw new Error(`handler module for ${name} does not export ${name}`);
    return handler(context);
  };
}
