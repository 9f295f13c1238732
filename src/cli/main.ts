/**
 * The `starlume` command-line tool: `main(argv, io)` runs one invocation
 * with injected streams and resolves to the exit code, so it can be tested
 * without spawning a process (the bin shim, bin.ts, passes the real ones).
 *
 * @module
 */
import { parseArgs } from "./args";
import { commandHelp, EXIT_CODES_HELP, type Command } from "./command";
import { EXIT, UsageError, ioErrorCode, say, type CliIO } from "./context";
import { convertCommand } from "./commands/convert";
import { demoCommand } from "./commands/demo";
import { fitCommand } from "./commands/fit";
import { linesCommand } from "./commands/lines";
import { planckCommand } from "./commands/planck";
import { solveCommand } from "./commands/solve";
import { packageVersion } from "./paths";

export type { CliIO } from "./context";
export { EXIT } from "./context";

/** The commands, in the order of the overview. */
export const COMMANDS: readonly Command[] = [solveCommand, fitCommand, planckCommand, convertCommand, linesCommand, demoCommand];

/** The tool's overview (`starlume --help`). */
export function toolHelp(): string {
  const width = Math.max(...COMMANDS.map((c) => c.name.length)) + 2;
  return [
    `starlume ${packageVersion()} — stellar physics from the command line, with units checked`,
    "",
    "Usage: starlume COMMAND [options] [arguments]",
    "       starlume COMMAND --help",
    "",
    "Commands:",
    ...COMMANDS.map((c) => `  ${c.name.padEnd(width)}${c.summary}`),
    "",
    "Global options:",
    "  -h, --help     show this help (or a command's help after the command)",
    "  -V, --version  print the version",
    "",
    "Tables are read as CSV or JSON Lines with units in the header ('teff [K]',",
    "'parallax [mas]', 'sigma(parallax) [mas]'); see docs/guides/table-format.md.",
    "Results are written as CSV, JSON, JSON Lines or an aligned table (--format).",
    "",
    "Examples:",
    "  starlume demo",
    "  starlume solve examples/demo-survey/solve-input.csv --format table",
    "  starlume fit examples/demo-survey/photometry.csv --bands demo --report report",
    "  starlume convert '3.6e-13 erg s^-1 cm^-2 A^-1' 'W m^-2 nm^-1'",
    "",
    EXIT_CODES_HELP,
    "",
  ].join("\n");
}

/**
 * Run the tool.
 *
 * @param argv - the arguments after the program name (`process.argv.slice(2)`)
 * @param io - streams and working directory
 * @returns the exit code: 0 success, 1 some rows rejected, 2 usage error, 3 internal error, 4 output not written
 */
export async function main(argv: readonly string[], io: CliIO): Promise<number> {
  const [first, ...rest] = argv;
  if (first === undefined) {
    io.stderr.write(toolHelp());
    say(io.stderr, "error: no command given (try 'starlume demo')");
    return EXIT.USAGE;
  }
  if (first === "--help" || first === "-h" || first === "help") {
    const topic = first === "help" ? rest[0] : undefined;
    const cmd = COMMANDS.find((c) => c.name === topic);
    if (topic !== undefined && cmd === undefined) {
      say(io.stderr, `error: unknown command '${topic}' (commands: ${COMMANDS.map((c) => c.name).join(", ")})`);
      return EXIT.USAGE;
    }
    io.stdout.write(cmd !== undefined ? commandHelp(cmd) : toolHelp());
    return EXIT.OK;
  }
  if (first === "--version" || first === "-V" || first === "version") {
    say(io.stdout, `starlume ${packageVersion()}`);
    return EXIT.OK;
  }
  const cmd = COMMANDS.find((c) => c.name === first);
  if (cmd === undefined) {
    say(io.stderr, `error: unknown command '${first}' (commands: ${COMMANDS.map((c) => c.name).join(", ")}; see 'starlume --help')`);
    return EXIT.USAGE;
  }
  if (rest.includes("--help") || rest.includes("-h")) {
    io.stdout.write(commandHelp(cmd));
    return EXIT.OK;
  }
  try {
    const args = parseArgs(rest, cmd.options, cmd.name);
    return await cmd.run(args, io);
  } catch (e) {
    if (e instanceof UsageError) {
      say(io.stderr, `starlume ${cmd.name}: error: ${e.message}`);
      say(io.stderr, `(see 'starlume ${cmd.name} --help')`);
      return EXIT.USAGE;
    }
    const code = ioErrorCode(e);
    if (code === "EPIPE") return EXIT.OK; // the reader went away (`| head`): end quietly
    if (code !== undefined) {
      say(io.stderr, `starlume ${cmd.name}: error: cannot write the output (${code}${code === "ENOSPC" ? ": no space left on device" : ""})`);
      return EXIT.OUTPUT_FAILED;
    }
    say(io.stderr, `starlume ${cmd.name}: internal error (please report it): ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
    return EXIT.INTERNAL;
  }
}
