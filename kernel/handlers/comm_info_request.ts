/** comm_info_request: Caloric opens no comms, so the list is always empty (filtered by target_name or not). */
import type { Handler } from "./context.js";

export const comm_info_request: Handler = (ctx) => ctx.reply({ status: "ok", comms: {} });
