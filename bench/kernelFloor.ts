/**
 * The Node floor for bench:kernel: the least a Node kernel must do before its first kernel_info_reply
 * (start Node, load zeromq and node:crypto, bind five sockets, sign three messages) and nothing else.
 * Not a kernel anyone should use: it answers kernel_info only. Run by bench/kernel.ts as
 * `node dist/bench/kernelFloor.js CONNECTION_FILE` so caloric's cold start can be held against it.
 */
import { createHmac, randomUUID } from "node:crypto";
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import type * as Zmq from "zeromq";

const zmq = createRequire(import.meta.url)("zeromq") as typeof Zmq;
const cf = JSON.parse(readFileSync(process.argv[2]!, "utf8")) as Record<string, string | number>;
const ep = (port: string | number) => `${cf.transport}://${cf.ip}:${port}`;
const shell = new zmq.Router({ linger: 0 });
const iopub = new zmq.Publisher({ linger: 0 });
const others = [new zmq.Router({ linger: 0 }), new zmq.Router({ linger: 0 }), new zmq.Reply({ linger: 0 })];
await Promise.all([shell.bind(ep(cf.shell_port!)), iopub.bind(ep(cf.iopub_port!)), others[0]!.bind(ep(cf.control_port!)), others[1]!.bind(ep(cf.stdin_port!)), others[2]!.bind(ep(cf.hb_port!))]);

const sign = (parts: Buffer[]) => {
  const h = createHmac("sha256", String(cf.key));
  for (const p of parts) h.update(p);
  return h.digest("hex");
};
const message = (type: string, parent: unknown, content: unknown) => {
  const header = { msg_id: randomUUID(), session: "floor", username: "floor", date: new Date().toISOString(), msg_type: type, version: "5.3" };
  const parts = [header, parent, {}, content].map((x) => Buffer.from(JSON.stringify(x)));
  return [Buffer.from("<IDS|MSG>"), Buffer.from(sign(parts)), ...parts];
};
const info = { status: "ok", protocol_version: "5.3", implementation: "floor", implementation_version: "0", language_info: { name: "floor", version: "0", mimetype: "text/plain", file_extension: ".txt" }, banner: "", help_links: [] };

for await (const frames of shell) {
  const i = frames.findIndex((f) => f.toString() === "<IDS|MSG>");
  const parent = JSON.parse(frames[i + 2]!.toString()) as { msg_type: string };
  await iopub.send([Buffer.from("status"), ...message("status", parent, { execution_state: "busy" })]);
  if (parent.msg_type === "kernel_info_request") await shell.send([...frames.slice(0, i), ...message("kernel_info_reply", parent, info)]);
  if (parent.msg_type === "shutdown_request") {
    await shell.send([...frames.slice(0, i), ...message("shutdown_reply", parent, { status: "ok", restart: false })]);
    process.exit(0);
  }
  await iopub.send([Buffer.from("status"), ...message("status", parent, { execution_state: "idle" })]);
}
