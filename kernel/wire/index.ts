/** kernel/wire: the only importer of zeromq. Frames, signatures, replay, send queues, heartbeat, a client. */
export { readConnectionFile, parseConnectionInfo, endpoint, type ConnectionInfo, type ChannelName } from "./connection.js";
export { freePort, loopbackConnection } from "./loopback.js";
export { createSigner, type Signer } from "./signer.js";
export { ReplayGuard } from "./replay.js";
export { encode, decode, DELIMITER, type WireMessage, type Json, type DecodeResult } from "./codec.js";
export { SendQueue, type SendFn } from "./sendQueue.js";
export { KernelSockets, type RequestChannel, type OutChannel, type KernelSocketsOptions } from "./kernelSockets.js";
export { KernelClient, type Received, type Collected, type ClientChannel } from "./client.js";
