/** history_request: tail, range or glob search over this kernel's inputs. */
import { History } from "../execution/index.js";
import { RequestError, boolField, intField, stringField } from "./args.js";
import type { Handler } from "./context.js";

export const history_request: Handler = async (ctx) => {
  const c = ctx.request.content;
  const history = ctx.services.execution.history;
  const output = boolField(c, "output", false);
  const type = stringField(c, "hist_access_type", "tail");
  const optionalN = c.n === undefined || c.n === null ? undefined : intField(c, "n");
  if (optionalN !== undefined && optionalN < 0) throw new RequestError(`n: expected a count of 0 or more, got ${optionalN}`);
  let entries;
  if (type === "tail") entries = history.tail(optionalN ?? 10);
  else if (type === "range") entries = history.range(intField(c, "session", 0), intField(c, "start", 1), c.stop === undefined || c.stop === null ? undefined : intField(c, "stop"));
  else if (type === "search") entries = history.search(stringField(c, "pattern", "*"), optionalN, boolField(c, "unique", false));
  else throw new RequestError(`hist_access_type: expected "tail", "range" or "search", got ${JSON.stringify(type)}`);
  await ctx.reply({ status: "ok", history: History.rows(entries, output) });
};
