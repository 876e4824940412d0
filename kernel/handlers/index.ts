/**
 * THE list of message types the kernel handles: one handler file per msg_type, named as on the wire.
 * Adding a message type = one file + one line here. kernel_info is loaded with the kernel; the others
 * load on their first request (lazy.ts), which keeps the cold start short.
 */
import type { Handler } from "./context.js";
import { kernel_info_request } from "./kernel_info_request.js";
import { lazyHandler } from "./lazy.js";

export const HANDLERS: Readonly<Record<string, Handler>> = Object.freeze({
  kernel_info_request,
  execute_request: lazyHandler(() => import("./execute_request.js"), "execute_request"),
  complete_request: lazyHandler(() => import("./complete_request.js"), "complete_request"),
  inspect_request: lazyHandler(() => import("./inspect_request.js"), "inspect_request"),
  is_complete_request: lazyHandler(() => import("./is_complete_request.js"), "is_complete_request"),
  history_request: lazyHandler(() => import("./history_request.js"), "history_request"),
  comm_info_request: lazyHandler(() => import("./comm_info_request.js"), "comm_info_request"),
  comm_open: lazyHandler(() => import("./comm_open.js"), "comm_open"),
  comm_msg: lazyHandler(() => import("./comm_msg.js"), "comm_msg"),
  comm_close: lazyHandler(() => import("./comm_close.js"), "comm_close"),
  shutdown_request: lazyHandler(() => import("./shutdown_request.js"), "shutdown_request"),
  interrupt_request: lazyHandler(() => import("./interrupt_request.js"), "interrupt_request"),
});

export { Dispatcher, type DispatcherOptions } from "./dispatcher.js";
export type { Handler, HandlerContext, KernelServices } from "./context.js";
export { RequestError } from "./args.js";
