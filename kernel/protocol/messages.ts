/**
 * Message shapes of the Jupyter messaging protocol 5.3, as the handlers see them. The header type is
 * checked against @jupyterlab/services so the two cannot drift apart.
 */
import type { KernelMessage } from "@jupyterlab/services";

export const PROTOCOL_VERSION = "5.3";

export type Json = Record<string, unknown>;
export type Channel = "shell" | "control" | "stdin" | "iopub";

export interface Header {
  msg_id: string;
  msg_type: string;
  session: string;
  username: string;
  date: string;
  version: string;
}

// Compile-time check: our header carries every field of the reference client's header type.
type _HeaderCompatible = Omit<KernelMessage.IHeader, "msg_type" | "subshell_id"> extends Omit<Header, "msg_type"> ? true : never;
export const HEADER_COMPATIBLE: _HeaderCompatible = true;

/** A message in the kernel: identities are opaque routing frames kept for the reply. */
export interface Message<C extends Json = Json> {
  identities: Buffer[];
  header: Header;
  parent_header: Partial<Header> | Json;
  metadata: Json;
  content: C;
  buffers: Buffer[];
}

export type ReplyStatus = "ok" | "error" | "aborted";

export interface ErrorContent extends Json {
  ename: string;
  evalue: string;
  traceback: string[];
}
