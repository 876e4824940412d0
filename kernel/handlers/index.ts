/**
 * THE list of message types the kernel handles: one handler file per msg_type, named as on the wire.
 * Adding a message type = one file + one line here.
 */
import { comm_close } from "./comm_close.js";
import { comm_info_request } from "./comm_info_request.js";
import { comm_msg } from "./comm_msg.js";
import { comm_open } from "./comm_open.js";
import { complete_request } from "./complete_request.js";
import type { Handler } from "./context.js";
import { execute_request } from "./execute_request.js";
import { history_request } from "./history_request.js";
import { inspect_request } from "./inspect_request.js";
import { interrupt_request } from "./interrupt_request.js";
import { is_complete_request } from "./is_complete_request.js";
import { kernel_info_request } from "./kernel_info_request.js";
import { shutdown_request } from "./shutdown_request.js";

export const HANDLERS: Readonly<Record<string, Handler>> = Object.freeze({
  execute_request,
  kernel_info_request,
  complete_request,
  inspect_request,
  is_complete_request,
  history_request,
  comm_info_request,
  comm_open,
  comm_msg,
  comm_close,
  shutdown_request,
  interrupt_request,
});

export { Dispatcher, type DispatcherOptions } from "./dispatcher.js";
export type { Handler, HandlerContext, KernelServices } from "./context.js";
export { RequestError } from "./args.js";
