/**
 * Test helpers for the command-line tool: in-memory streams and a runner
 * that calls `main(argv, io)` without spawning a process.
 *
 * @internal
 */
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import type { CliIO, OutStream } from "./context";
import { main } from "./main";

/** The repository root (two levels above src/cli). */
export const REPO_ROOT = join(dirname(fileURLToPath(import.meta.url)), "..", "..");

/** An in-memory output stream that keeps everything written (or only counts lines, for big runs). */
export class MemoryStream implements OutStream {
  readonly isTTY: boolean;
  private readonly parts: string[] = [];
  private readonly keep: boolean;
  /** Number of `\n` written. */
  lines = 0;
  /** Characters written. */
  chars = 0;
  constructor(options: { isTTY?: boolean; keep?: boolean } = {}) {
    this.isTTY = options.isTTY ?? false;
    this.keep = options.keep ?? true;
  }
  write(chunk: string): boolean {
    this.chars += chunk.length;
    for (let i = chunk.indexOf("\n"); i !== -1; i = chunk.indexOf("\n", i + 1)) this.lines++;
    if (this.keep) this.parts.push(chunk);
    return true;
  }
  once(): this {
    return this;
  }
  removeListener(): this {
    return this;
  }
  get text(): string {
    return this.parts.join("");
  }
}

/** What a run produced. */
export interface RunResult {
  readonly code: number;
  readonly stdout: string;
  readonly stderr: string;
}

/** Run the tool in memory. `stdin` text is fed in small chunks to exercise the streaming readers. */
export async function runCli(argv: readonly string[], options: { stdin?: string; cwd?: string; tty?: boolean } = {}): Promise<RunResult> {
  const stdout = new MemoryStream({ isTTY: options.tty ?? false });
  const stderr = new MemoryStream({ isTTY: false });
  const input = options.stdin;
  const io: CliIO = {
    stdout,
    stderr,
    cwd: options.cwd ?? REPO_ROOT,
    ...(input !== undefined
      ? {
          stdin: (async function* () {
            for (let i = 0; i < input.length; i += 37) yield input.slice(i, i + 37);
          })(),
        }
      : {}),
  };
  const code = await main(argv, io);
  return { code, stdout: stdout.text, stderr: stderr.text };
}

/** Parse CSV output of the tool (simple: the tool quotes only when needed; tests avoid embedded newlines). */
export function csvRows(text: string): string[][] {
  const rows: string[][] = [];
  for (const line of text.split("\n")) {
    if (line === "") continue;
    const cells: string[] = [];
    let cur = "";
    let q = false;
    for (let i = 0; i < line.length; i++) {
      const c = line[i] as string;
      if (q) {
        if (c === '"' && line[i + 1] === '"') {
          cur += '"';
          i++;
        } else if (c === '"') q = false;
        else cur += c;
      } else if (c === '"') q = true;
      else if (c === ",") {
        cells.push(cur);
        cur = "";
      } else cur += c;
    }
    cells.push(cur);
    rows.push(cells);
  }
  return rows;
}

/** CSV output as records keyed by header text. */
export function csvRecords(text: string): Record<string, string>[] {
  const [header, ...rows] = csvRows(text);
  return rows.map((r) => Object.fromEntries((header ?? []).map((h, i) => [h, r[i] ?? ""])));
}
