/**
 * What every command receives: the streams it may use (injected, so commands
 * run in tests without spawning a process), the working directory, the exit
 * codes and the error type for usage mistakes.
 *
 * @module
 */
import type { ProgressStream } from "./io/progress";
import type { TextSink } from "./io/write";

/** An output stream: what `process.stdout` / `process.stderr` and the test doubles provide. */
export interface OutStream extends TextSink {
  readonly isTTY?: boolean;
}

// An OutStream is also what the progress line writes to.
const _progressCompatible = (s: OutStream): ProgressStream => s;
void _progressCompatible;

/** The process surroundings of one run of the tool. */
export interface CliIO {
  /** Results (tables, converted values). */
  readonly stdout: OutStream;
  /** Messages: rejected rows with their line numbers, notes, the progress line (TTY only). */
  readonly stderr: OutStream;
  /** Standard input, read when the input file is `-`. */
  readonly stdin?: AsyncIterable<string | Uint8Array>;
  /** Directory that relative paths are resolved against (default `process.cwd()`). */
  readonly cwd?: string;
}

/** Exit codes of the tool (documented in `--help` and docs/guides/command-line.md). */
export const EXIT = {
  /** Every row was processed. */
  OK: 0,
  /** The run finished, but some rows were rejected (each kept in the output with its reason). */
  ROWS_REJECTED: 1,
  /** The command could not run: unknown command or option, bad option value, unreadable file or header. */
  USAGE: 2,
  /** A bug: an unexpected exception (reported on stderr with its stack). */
  INTERNAL: 3,
  /** The output could not be written (disk full, no permission, I/O error): one line on stderr, no stack. */
  OUTPUT_FAILED: 4,
} as const;

/** A mistake in how the tool was called; reported on stderr with exit code 2. */
export class UsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "UsageError";
  }
}

/**
 * The system error code of an I/O failure (`ENOSPC`, `EPIPE`, `EACCES`, …),
 * or undefined for any other exception.
 */
export function ioErrorCode(e: unknown): string | undefined {
  const code = (e as { code?: unknown } | null)?.code;
  return e instanceof Error && typeof code === "string" && /^E[A-Z0-9]+$/.test(code) ? code : undefined;
}

/** Bidirectional control characters (embeddings, overrides, isolates, marks; Unicode UAX #9). */
const BIDI_CONTROLS = /[\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/g;

/** Text for display (messages, report titles): bidirectional control characters removed, so a file name cannot reorder what is shown. */
export function displayText(text: string): string {
  return text.replace(BIDI_CONTROLS, "");
}

/** Write one line to a stream (without waiting: messages are small), stripped of bidirectional controls. */
export function say(stream: OutStream, text: string): void {
  const clean = displayText(text);
  stream.write(clean.endsWith("\n") ? clean : `${clean}\n`);
}
