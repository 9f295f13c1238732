/**
 * A small command-line option parser: `--name value`, `--name=value`,
 * short aliases (`-T 5772`), boolean flags, repeatable options, positional
 * arguments, and `--` to end the options. Unknown options, missing values
 * and values outside a fixed set of choices are usage errors naming the
 * option.
 *
 * @module
 */
import { UsageError } from "./context";

/** How an option takes its value. */
export type OptionKind = "flag" | "value" | "list";

/** One option of a command. */
export interface OptionSpec {
  /** Long name without the dashes, e.g. `"input-format"`. */
  readonly name: string;
  /** One-letter alias without the dash, e.g. `"T"`. */
  readonly short?: string;
  /** `flag`: no value; `value`: one value (the last one given wins); `list`: may be repeated. */
  readonly kind: OptionKind;
  /** Placeholder in the help text, e.g. `FILE`. */
  readonly valueName?: string;
  /** Allowed values (checked). */
  readonly choices?: readonly string[];
  /** One-line description for the help text. */
  readonly help: string;
  /** Default shown in the help text (not applied by the parser). */
  readonly defaultText?: string;
}

/** Parsed arguments. */
export interface ParsedArgs {
  /** Values by long name: `true` for flags, a string for values, an array for lists. */
  readonly options: ReadonlyMap<string, string | true | readonly string[]>;
  readonly positionals: readonly string[];
}

/**
 * Parse `argv` (without the command name) against the option specs.
 *
 * @throws UsageError for an unknown option, a missing value, a value given
 *   to a flag, or a value outside the option's choices
 */
export function parseArgs(argv: readonly string[], specs: readonly OptionSpec[], command: string): ParsedArgs {
  const byName = new Map<string, OptionSpec>();
  const byShort = new Map<string, OptionSpec>();
  for (const s of specs) {
    byName.set(s.name, s);
    if (s.short !== undefined) byShort.set(s.short, s);
  }
  const options = new Map<string, string | true | string[]>();
  const positionals: string[] = [];
  const where = command === "" ? "" : ` for '${command}'`;
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i] as string;
    if (arg === "--") {
      positionals.push(...argv.slice(i + 1));
      break;
    }
    let spec: OptionSpec | undefined;
    let inline: string | undefined;
    let shown = arg;
    if (arg.startsWith("--")) {
      const eq = arg.indexOf("=");
      const name = eq === -1 ? arg.slice(2) : arg.slice(2, eq);
      if (eq !== -1) inline = arg.slice(eq + 1);
      shown = `--${name}`;
      spec = byName.get(name);
    } else if (arg.startsWith("-") && arg.length >= 2 && !/^-[0-9.]/.test(arg)) {
      shown = arg.slice(0, 2);
      spec = byShort.get(arg.slice(1, 2));
      if (arg.length > 2) inline = arg.slice(2).replace(/^=/, "");
    } else {
      positionals.push(arg);
      continue;
    }
    if (spec === undefined) {
      const known = specs.map((s) => `--${s.name}`).join(", ");
      throw new UsageError(`unknown option ${shown}${where} (options: ${known})`);
    }
    if (spec.kind === "flag") {
      if (inline !== undefined) throw new UsageError(`option --${spec.name} takes no value; got '${inline}'`);
      options.set(spec.name, true);
      continue;
    }
    let value = inline;
    if (value === undefined) {
      if (i + 1 >= argv.length) throw new UsageError(`option --${spec.name} needs a value (${spec.valueName ?? "VALUE"})`);
      value = argv[++i] as string;
    }
    if (spec.choices !== undefined && !spec.choices.includes(value)) {
      throw new UsageError(`option --${spec.name} must be one of ${spec.choices.join(", ")}; got '${value}'`);
    }
    if (spec.kind === "list") {
      const prev = options.get(spec.name);
      const list = Array.isArray(prev) ? prev : [];
      list.push(value);
      options.set(spec.name, list);
    } else {
      options.set(spec.name, value);
    }
  }
  return { options, positionals };
}

/** The string value of an option, or undefined. */
export function optString(args: ParsedArgs, name: string): string | undefined {
  const v = args.options.get(name);
  return typeof v === "string" ? v : undefined;
}

/** Whether a flag was given. */
export function optFlag(args: ParsedArgs, name: string): boolean {
  return args.options.get(name) === true;
}

/** The values of a repeatable option (empty when absent). */
export function optList(args: ParsedArgs, name: string): readonly string[] {
  const v = args.options.get(name);
  return Array.isArray(v) ? (v as readonly string[]) : typeof v === "string" ? [v] : [];
}

/** A positive integer option, or the default. */
export function optInteger(args: ParsedArgs, name: string, fallback: number, min = 1, max = Number.MAX_SAFE_INTEGER): number {
  const v = optString(args, name);
  if (v === undefined) return fallback;
  const n = Number(v);
  if (!/^\s*[0-9]+\s*$/.test(v) || !Number.isSafeInteger(n) || n < min || n > max) {
    throw new UsageError(`option --${name} must be an integer from ${min} to ${max}; got '${v}'`);
  }
  return n;
}

/** A finite number option, or the default. */
export function optNumber(args: ParsedArgs, name: string, fallback: number, check?: (x: number) => boolean, what = "a finite number"): number {
  const v = optString(args, name);
  if (v === undefined) return fallback;
  const n = Number(v);
  if (v.trim() === "" || !Number.isFinite(n) || (check !== undefined && !check(n))) {
    throw new UsageError(`option --${name} must be ${what}; got '${v}'`);
  }
  return n;
}

/** Help-text lines for a list of options, aligned. */
export function formatOptions(specs: readonly OptionSpec[]): string {
  const left = specs.map((s) => {
    const short = s.short !== undefined ? `-${s.short}, ` : "    ";
    const value = s.kind === "flag" ? "" : ` ${s.valueName ?? "VALUE"}`;
    return `  ${short}--${s.name}${value}`;
  });
  const width = Math.max(...left.map((l) => l.length)) + 2;
  return specs
    .map((s, i) => {
      let text = s.help;
      if (s.choices !== undefined) text += ` (${s.choices.join(" | ")})`;
      if (s.defaultText !== undefined) text += ` [default: ${s.defaultText}]`;
      return (left[i] as string).padEnd(width) + text;
    })
    .join("\n");
}
