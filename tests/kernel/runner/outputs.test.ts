import { describe, expect, it } from "vitest";
import { DisplayRegistry, OutputCollector } from "../../../kernel/runner/outputs.js";

describe("OutputCollector", () => {
  it("OutputCollector merges consecutive stream text of one name", () => {
    const c = new OutputCollector(new DisplayRegistry());
    c.handle({ msg_type: "stream", content: { name: "stdout", text: "a\n" } });
    c.handle({ msg_type: "stream", content: { name: "stdout", text: "b\n" } });
    c.handle({ msg_type: "stream", content: { name: "stderr", text: "c\n" } });
    expect(c.outputs).toEqual([
      { output_type: "stream", name: "stdout", text: "a\nb\n" },
      { output_type: "stream", name: "stderr", text: "c\n" },
    ]);
  });
  it("OutputCollector applies update_display_data to the output with that display_id, across cells", () => {
    const reg = new DisplayRegistry();
    const first = new OutputCollector(reg);
    first.handle({ msg_type: "display_data", content: { data: { "text/plain": "10 points" }, metadata: {}, transient: { display_id: "sweep" } } });
    const second = new OutputCollector(reg);
    second.handle({ msg_type: "update_display_data", content: { data: { "text/plain": "1000 points" }, metadata: {}, transient: { display_id: "sweep" } } });
    expect(first.outputs[0]).toMatchObject({ output_type: "display_data", data: { "text/plain": "1000 points" } });
    expect(second.outputs).toEqual([]);
  });
  it("OutputCollector clear_output with wait clears when the next output arrives", () => {
    const c = new OutputCollector(new DisplayRegistry());
    c.handle({ msg_type: "stream", content: { name: "stdout", text: "old" } });
    c.handle({ msg_type: "clear_output", content: { wait: true } });
    expect(c.outputs).toHaveLength(1);
    c.handle({ msg_type: "execute_result", content: { data: { "text/plain": "new" }, metadata: {}, execution_count: 2 } });
    expect(c.outputs).toEqual([{ output_type: "execute_result", data: { "text/plain": "new" }, metadata: {}, execution_count: 2 }]);
    c.handle({ msg_type: "clear_output", content: { wait: false } });
    expect(c.outputs).toEqual([]);
  });
  it("OutputCollector records errors and ignores status and execute_input", () => {
    const c = new OutputCollector(new DisplayRegistry());
    c.handle({ msg_type: "status", content: { execution_state: "busy" } });
    c.handle({ msg_type: "execute_input", content: { code: "x" } });
    c.handle({ msg_type: "error", content: { ename: "UnitsError", evalue: "bad", traceback: ["l1", "l2"] } });
    expect(c.outputs).toEqual([{ output_type: "error", ename: "UnitsError", evalue: "bad", traceback: ["l1", "l2"] }]);
  });
});
