/**
 * execute_request: execute_input, the cell's outputs (stream, display_data, update_display_data,
 * clear_output), execute_result or error, user_expressions, then the reply. stop_on_error makes
 * requests that arrived before this reply come back "aborted". A help query's answer (a run result
 * marked help) goes to the pager payload, or to stderr when it is the no-help note, not to execute_result.
 */
import type { EngineOutput, RunResult } from "../engine/index.js";
import type { Json } from "../protocol/index.js";
import { RequestError, boolField, stringField } from "./args.js";
import type { Handler, HandlerContext } from "./context.js";

export const execute_request: Handler = async (ctx) => {
  const c = ctx.request.content;
  const { execution } = ctx.services;
  let fields;
  try {
    fields = readFields(c);
  } catch (e) {
    if (!(e instanceof RequestError)) throw e;
    // Checked before anything runs: a malformed request executes nothing and gets the full reply shape.
    const { name: ename, message: evalue } = e;
    await ctx.reply({ status: "error", execution_count: execution.executionCount, ename, evalue, traceback: [`${ename}: ${evalue}`], user_expressions: {}, payload: [] });
    return;
  }
  const { code, silent, storeHistory, stopOnError, expressions } = fields;

  if (execution.abort.shouldAbort(ctx.arrival)) {
    await ctx.reply({ status: "aborted", execution_count: execution.executionCount });
    return;
  }

  const count = execution.begin(code, storeHistory);
  if (!silent) void ctx.publish("execute_input", { code, execution_count: count });

  const payload: Json[] = [];
  // Publishing enqueues at once on the iopub queue, which keeps the cell's order; not awaiting each
  // send keeps the round trip short (clients wait for both the reply and idle anyway).
  const result: RunResult = await ctx.services.engine.execute(code, (o) => void publishOutput(ctx, o));
  // A help query (`?name`, answered by the language): the help goes to the pager, as front ends
  // expect; "no help for that name" is a note on stderr. Neither is an execute_result.
  const help = result.ok && result.result !== undefined ? result.help : undefined;
  if (result.ok && result.result !== undefined && help === "page") payload.push({ source: "page", data: result.result as unknown as Json, start: 0 });
  if (result.ok && result.result !== undefined && help === "note") void ctx.publish("stream", { name: "stderr", text: `${result.result["text/plain"]}\n` });

  if (!result.ok) {
    const { ename, evalue, traceback } = result.error;
    void ctx.publish("error", { ename, evalue, traceback });
    if (stopOnError) execution.abort.fail();
    await ctx.reply({ status: "error", execution_count: count, ename, evalue, traceback, user_expressions: {}, payload: [] });
    return;
  }
  if (result.result && !silent && help === undefined) {
    void ctx.publish("execute_result", { execution_count: count, data: result.result, metadata: {} });
    if (storeHistory) execution.history.setOutput(count, result.result["text/plain"]);
  }
  const userExpressions: Json = {};
  for (const [key, expr] of Object.entries(expressions)) {
    userExpressions[key] = expressionResult(typeof expr === "string" ? await ctx.services.engine.evaluate(expr) : badExpression(key));
  }
  await ctx.reply({ status: "ok", execution_count: count, user_expressions: userExpressions, payload });
};

function publishOutput(ctx: HandlerContext, o: EngineOutput): Promise<void> {
  switch (o.kind) {
    case "stdout":
      return ctx.publish("stream", { name: "stdout", text: o.text });
    case "clear":
      return ctx.publish("clear_output", { wait: o.wait });
    case "display": {
      const transient = o.displayId === undefined ? {} : { display_id: o.displayId };
      return ctx.publish(o.update && o.displayId !== undefined ? "update_display_data" : "display_data", { data: o.bundle, metadata: {}, transient });
    }
  }
}

function expressionResult(r: RunResult): Json {
  if (r.ok) return { status: "ok", data: r.result ?? { "text/plain": "" }, metadata: {} };
  return { status: "error", ename: r.error.ename, evalue: r.error.evalue, traceback: r.error.traceback };
}

function badExpression(key: string): RunResult {
  const evalue = `user_expressions.${key}: expected a string expression`;
  return { ok: false, error: { ename: "RequestError", evalue, traceback: [evalue] } };
}

function readFields(c: Json) {
  const code = stringField(c, "code");
  const silent = boolField(c, "silent", false);
  const storeHistory = silent ? false : boolField(c, "store_history", true);
  const stopOnError = boolField(c, "stop_on_error", true);
  const expressions = c.user_expressions ?? {};
  if (typeof expressions !== "object" || Array.isArray(expressions)) {
    throw new RequestError(`user_expressions: expected an object of name: expression strings, got ${JSON.stringify(expressions)}`);
  }
  return { code, silent, storeHistory, stopOnError, expressions: expressions as Json };
}
