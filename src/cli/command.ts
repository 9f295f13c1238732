/**
 * The shape of a command and its help text.
 *
 * @module
 */
import { formatOptions, type OptionSpec, type ParsedArgs } from "./args";
import type { CliIO } from "./context";

/** One example in a command's help: the arguments after `starlume` and what it does. */
export interface Example {
  readonly args: readonly string[];
  readonly note: string;
}

/** One exit code a command can return, and what it means for that command. */
export interface ExitCode {
  readonly code: 0 | 1 | 2 | 3 | 4;
  /** Wrapped help text (no leading spaces; lines after the first are indented by the help). */
  readonly meaning: string;
}

/** Exit code 3, shared by every command. */
export const INTERNAL_EXIT: ExitCode = { code: 3, meaning: "internal error (a bug; please report it with the command line)" };

/** Exit code 4, which every command can return: its output could not be written. */
export const OUTPUT_EXIT: ExitCode = { code: 4, meaning: "the output could not be written (disk full, no permission, I/O error)" };

/** The exit-code paragraph of a command's help: only the codes it declares. */
export function exitCodesHelp(codes: readonly ExitCode[]): string {
  const lines = codes.map((c) => `  ${c.code}  ${c.meaning.split("\n").join("\n     ")}`);
  return ["Exit codes:", ...lines].join("\n");
}

/** A command of the tool. */
export interface Command {
  readonly name: string;
  /** One line for the tool's overview. */
  readonly summary: string;
  /** Usage line after `starlume <name>`, e.g. `[options] FILE`. */
  readonly usage: string;
  /** Paragraphs after the usage line. */
  readonly description: string;
  readonly options: readonly OptionSpec[];
  /** Examples shown in `--help`; the test suite runs each of them. */
  readonly examples: readonly Example[];
  /**
   * The exit codes this command can return, with what each means for it
   * (docs/naming.md §10). `--help` of the command lists exactly these.
   */
  readonly exitCodes: readonly ExitCode[];
  run(args: ParsedArgs, io: CliIO): Promise<number>;
}

/** Shell-quote an argument for display. */
export function shellQuote(arg: string): string {
  return /^[A-Za-z0-9_./:=,+@%^-]+$/.test(arg) ? arg : `'${arg.replace(/'/g, `'\\''`)}'`;
}

/** The general exit-code paragraph of `starlume --help` (each command's help lists only its own codes). */
export const EXIT_CODES_HELP = `Exit codes:
  0  success: every row processed
  1  some rows were rejected (each is kept in the output with status and reason,
     and reported on stderr with its line number)
  2  usage error: unknown command or option, bad option value, unreadable file or
     header, incompatible units
  3  internal error (a bug; please report it with the command line)
  4  the output could not be written (disk full, no permission, I/O error)
A closed standard output (e.g. '| head') ends the run quietly with code 0.`;

/** Full help text of a command. */
export function commandHelp(c: Command): string {
  const examples = c.examples.map((e) => `  # ${e.note}\n  starlume ${c.name} ${e.args.map(shellQuote).join(" ")}`).join("\n\n");
  const help = { name: "help", short: "h", kind: "flag", help: "show this help" } as const;
  return [
    `starlume ${c.name} — ${c.summary}`,
    "",
    `Usage: starlume ${c.name} ${c.usage}`,
    "",
    c.description.trim(),
    "",
    "Options:",
    formatOptions([...c.options, help]),
    "",
    "Examples:",
    examples,
    "",
    exitCodesHelp(c.exitCodes),
    "",
  ].join("\n");
}
