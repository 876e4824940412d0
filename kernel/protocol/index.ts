/** kernel/protocol: message shapes, header/reply builders, kernel_info content, the Outbox port. */
export * from "./messages.js";
export { makeHeader, makeReply, makeBroadcast, replyTypeFor, type Identity } from "./header.js";
export { kernelInfoContent, IMPLEMENTATION_VERSION, LANGUAGE_NAME, FILE_EXTENSION, LANGUAGE_MIMETYPE, ENGINEERING_CAUTION } from "./kernelInfo.js";
export type { Outbox } from "./outbox.js";
