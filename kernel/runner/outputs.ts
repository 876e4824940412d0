/**
 * Turns the IOPub messages of one execution into nbformat outputs, as a notebook front end would:
 * consecutive stream text of one name is merged, update_display_data replaces the output that carries
 * the same display_id (in any cell of the notebook), clear_output (with wait) empties the cell.
 */
import type { Output } from "./notebook.js";

export interface IopubEvent {
  msg_type: string;
  content: Record<string, unknown>;
}

type Data = Record<string, unknown>;

/** Shared across the cells of one notebook: display ids are notebook-wide. */
export class DisplayRegistry {
  private readonly byId = new Map<string, { data: Data; metadata: Record<string, unknown> }[]>();
  track(id: string, out: { data: Data; metadata: Record<string, unknown> }): void {
    const list = this.byId.get(id) ?? [];
    list.push(out);
    this.byId.set(id, list);
  }
  update(id: string, data: Data, metadata: Record<string, unknown>): void {
    for (const out of this.byId.get(id) ?? []) {
      out.data = data;
      out.metadata = metadata;
    }
  }
}

export class OutputCollector {
  readonly outputs: Output[] = [];
  private clearPending = false;

  constructor(private readonly displays: DisplayRegistry) {}

  private push(out: Output): void {
    if (this.clearPending) {
      this.outputs.length = 0;
      this.clearPending = false;
    }
    this.outputs.push(out);
  }

  handle(ev: IopubEvent): void {
    const c = ev.content;
    switch (ev.msg_type) {
      case "stream": {
        const name = c.name === "stderr" ? "stderr" : "stdout";
        const last = this.outputs.at(-1);
        if (!this.clearPending && last?.output_type === "stream" && last.name === name) {
          last.text = String(last.text) + String(c.text ?? "");
        } else this.push({ output_type: "stream", name, text: String(c.text ?? "") });
        return;
      }
      case "display_data":
      case "execute_result": {
        const out =
          ev.msg_type === "display_data"
            ? { output_type: "display_data" as const, data: (c.data as Data) ?? {}, metadata: (c.metadata as Record<string, unknown>) ?? {} }
            : { output_type: "execute_result" as const, data: (c.data as Data) ?? {}, metadata: (c.metadata as Record<string, unknown>) ?? {}, execution_count: (c.execution_count as number) ?? null };
        const id = (c.transient as { display_id?: string } | undefined)?.display_id;
        if (id) this.displays.track(id, out);
        this.push(out);
        return;
      }
      case "update_display_data": {
        const id = (c.transient as { display_id?: string } | undefined)?.display_id;
        if (id) this.displays.update(id, (c.data as Data) ?? {}, (c.metadata as Record<string, unknown>) ?? {});
        return;
      }
      case "clear_output":
        if (c.wait) this.clearPending = true;
        else this.outputs.length = 0;
        return;
      case "error":
        this.push({ output_type: "error", ename: String(c.ename ?? "Error"), evalue: String(c.evalue ?? ""), traceback: (c.traceback as string[]) ?? [] });
        return;
      default:
        return; // status, execute_input and comm traffic are not outputs
    }
  }
}
