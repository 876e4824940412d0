/**
 * Input history of this kernel process for history_request: tail, range and glob search. One kernel
 * process is one history session (number 1); entries are numbered by execution count.
 */
export interface HistoryEntry {
  session: number;
  line: number;
  input: string;
  /** text/plain of the execute_result, if any (history_request with output=true). */
  output?: string;
}

export type HistoryRow = [number, number, string] | [number, number, [string, string | null]];

export const CURRENT_SESSION = 1;

/** Glob as in history search: * any run, ? one character, [abc] a set; the whole input must match. */
export function globToRegExp(pattern: string): RegExp {
  let re = "";
  for (let i = 0; i < pattern.length; i++) {
    const c = pattern[i]!;
    if (c === "*") re += "[\\s\\S]*";
    else if (c === "?") re += "[\\s\\S]";
    else if (c === "[") {
      const end = pattern.indexOf("]", i + 2);
      if (end < 0) re += "\\[";
      else {
        let set = pattern.slice(i + 1, end);
        if (set.startsWith("!")) set = "^" + set.slice(1);
        re += `[${set.replace(/\\/g, "\\\\")}]`;
        i = end;
      }
    } else re += c.replace(/[.+^${}()|\\\]]/g, "\\$&");
  }
  return new RegExp(`^${re}$`);
}

export class History {
  private readonly entries: HistoryEntry[] = [];

  add(line: number, input: string): void {
    this.entries.push({ session: CURRENT_SESSION, line, input });
  }

  setOutput(line: number, output: string): void {
    const e = this.entries.findLast((x) => x.line === line);
    if (e) e.output = output;
  }

  get size(): number {
    return this.entries.length;
  }

  /** The last n entries (all if n is missing; none for n = 0, as a tail of zero lines is empty). */
  tail(n?: number): HistoryEntry[] {
    return lastOf(this.entries, n);
  }

  /**
   * Lines start <= line < stop of a session. session 0 means the current one, negative counts back
   * (there are no earlier sessions in memory, so those give nothing); stop 0 or missing means to the end.
   */
  range(session: number, start: number, stop?: number): HistoryEntry[] {
    const s = session <= 0 ? CURRENT_SESSION + session : session;
    return this.entries.filter((e) => e.session === s && e.line >= start && (!stop || e.line < stop));
  }

  /** Entries whose whole input matches the glob; unique keeps the latest of equal inputs; n keeps the last n. */
  search(pattern: string, n?: number, unique = false): HistoryEntry[] {
    const re = globToRegExp(pattern);
    let hits = this.entries.filter((e) => re.test(e.input));
    if (unique) {
      const seen = new Set<string>();
      hits = hits.reverse().filter((e) => (seen.has(e.input) ? false : (seen.add(e.input), true))).reverse();
    }
    return lastOf(hits, n);
  }

  static rows(entries: HistoryEntry[], output: boolean): HistoryRow[] {
    return entries.map((e) => (output ? [e.session, e.line, [e.input, e.output ?? null]] : [e.session, e.line, e.input]));
  }
}

/** The last n items; all when n is missing. n = 0 gives none (slice(-0) would give all). */
function lastOf<T>(items: T[], n?: number): T[] {
  if (n === undefined) return [...items];
  return n > 0 ? items.slice(-n) : [];
}
