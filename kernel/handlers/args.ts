/** Reading request fields with clear errors: a bad field becomes an error reply naming it. */
import type { Json } from "../protocol/index.js";

export class RequestError extends Error {
  override readonly name = "RequestError";
}

export function stringField(content: Json, name: string, fallback?: string): string {
  const v = content[name] ?? fallback;
  if (typeof v !== "string") throw new RequestError(`${name}: expected a string, got ${JSON.stringify(v)}`);
  return v;
}

export function boolField(content: Json, name: string, fallback: boolean): boolean {
  const v = content[name] ?? fallback;
  if (typeof v !== "boolean") throw new RequestError(`${name}: expected true or false, got ${JSON.stringify(v)}`);
  return v;
}

export function intField(content: Json, name: string, fallback?: number): number {
  const v = content[name] ?? fallback;
  if (typeof v !== "number" || !Number.isInteger(v)) throw new RequestError(`${name}: expected an integer, got ${JSON.stringify(v)}`);
  return v;
}

/** cursor_pos counts Unicode code points; missing means the end of the code. */
export function cursorField(content: Json, code: string): number {
  const length = [...code].length;
  const v = intField(content, "cursor_pos", length);
  if (v < 0 || v > length) throw new RequestError(`cursor_pos: expected 0..${length} (code points in code), got ${v}`);
  return v;
}
