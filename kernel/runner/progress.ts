/**
 * Terminal progress: "cell n of N", the current cell's first line and the elapsed time. On a TTY one
 * line is rewritten in place; elsewhere (CI logs) a line per cell.
 */
export interface ProgressSink {
  write(text: string): void;
  isTTY: boolean;
}

export const firstLine = (code: string, width = 60): string => {
  const line = code.split("\n").map((l) => l.trim()).find((l) => l && !l.startsWith("#")) ?? code.split("\n")[0] ?? "";
  return line.length > width ? line.slice(0, width - 1) + "…" : line;
};

export const seconds = (ms: number): string => `${(ms / 1000).toFixed(1)} s`;

export class Progress {
  private readonly started = Date.now();
  constructor(
    private readonly sink: ProgressSink,
    private readonly label: string,
    private readonly quiet = false,
  ) {}

  cell(index: number, total: number, code: string): void {
    if (this.quiet) return;
    const text = `${this.label}: cell ${index} of ${total} [${seconds(Date.now() - this.started)}] ${firstLine(code)}`;
    this.sink.write(this.sink.isTTY ? `\r\x1b[2K${text}` : `${text}\n`);
  }

  done(summary: string): void {
    if (this.quiet) return;
    this.sink.write(`${this.sink.isTTY ? "\r\x1b[2K" : ""}${this.label}: ${summary} (${seconds(Date.now() - this.started)})\n`);
  }
}
