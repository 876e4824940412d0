/** kernel_info_request: answered from constants on the main thread, never waiting for the engine. */
import { kernelInfoContent } from "../protocol/index.js";
import type { Handler } from "./context.js";

export const kernel_info_request: Handler = (ctx) => ctx.reply(kernelInfoContent(ctx.services.implementationVersion));
