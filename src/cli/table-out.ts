/**
 * Writing a command's result table: CSV, JSON (one array), JSON Lines or an
 * aligned text table, row by row with back-pressure (the aligned table
 * measures its first rows, see io/write.ts). Output goes to stdout or to
 * `--output FILE`.
 *
 * @module
 */
import { createWriteStream, unlinkSync } from "node:fs";
import { rename, rm, stat } from "node:fs/promises";
import { once } from "node:events";
import { basename, dirname, join, resolve } from "node:path";
import { UsageError, type CliIO } from "./context";
import { formatColumnHeader, type ColumnSpec } from "./io/header";
import { AlignedTableWriter, CsvWriter, JsonWriter, TextOut, type CellValue, type TextSink } from "./io/write";

/** Output formats. */
export type OutputFormat = "csv" | "json" | "jsonl" | "table";

/** The output format choices, for option specs. */
export const OUTPUT_FORMATS: readonly OutputFormat[] = ["csv", "json", "jsonl", "table"];

/** A column of a result table. */
export type OutColumn = Pick<ColumnSpec, "name" | "unit"> & Partial<Pick<ColumnSpec, "uncertaintyOf" | "uncertaintySide">>;

/** Value column plus its `sigma(x)` column, in the same unit. */
export function withSigma(name: string, unit: string): OutColumn[] {
  return [
    { name, unit },
    { name: `sigma(${name})`, unit, uncertaintyOf: name, uncertaintySide: "both" },
  ];
}

/** A row-by-row table writer. */
export interface TableWriter {
  writeRow(cells: readonly CellValue[]): Promise<void> | void;
  end(): Promise<void>;
}

/** Options for {@link openTableWriter}. */
export interface TableWriterOptions {
  readonly format: OutputFormat;
  /** Significant digits of plain numbers in the aligned table (CSV/JSON always write full precision). */
  readonly digits?: number;
}

/** Temporary files of outputs being written (removed on a signal by {@link removeTemporaryOutputs}). */
const temporaryOutputs = new Set<string>();

/** Remove the temporary files of unfinished outputs (synchronous: for signal handlers). */
export function removeTemporaryOutputs(): void {
  for (const t of temporaryOutputs) {
    try {
      unlinkSync(t);
    } catch {
      /* already gone */
    }
  }
  temporaryOutputs.clear();
}

/**
 * Where results go: `--output FILE` or stdout. A regular file (new or
 * existing) is written to a temporary file beside it, renamed over FILE by
 * `close` once everything is written, so an interrupted run leaves no
 * half-written FILE (`abort` removes the temporary file); other paths
 * (`/dev/stdout`, a named pipe) are written directly. `close` never ends stdout.
 */
export async function openOutput(path: string | undefined, io: CliIO): Promise<{ sink: TextSink; close: () => Promise<void>; abort: () => Promise<void> }> {
  if (path === undefined || path === "-") return { sink: io.stdout, close: async () => {}, abort: async () => {} };
  const full = resolve(io.cwd ?? process.cwd(), path);
  let regular = true;
  try {
    regular = (await stat(full)).isFile();
  } catch {
    /* does not exist yet: a new regular file */
  }
  const target = regular ? join(dirname(full), `.${basename(full)}.${process.pid}.${Date.now().toString(36)}.tmp`) : full;
  const ws = createWriteStream(target, { encoding: "utf8" });
  try {
    await once(ws, "open");
  } catch (e) {
    throw new UsageError(`cannot write output file '${path}' (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`);
  }
  if (regular) temporaryOutputs.add(target);
  let failure: Error | undefined;
  ws.on("error", (e) => {
    failure ??= e;
  });
  const finish = async (): Promise<void> => {
    if (!ws.closed) {
      ws.end();
      await new Promise<void>((res) => {
        ws.once("close", () => res());
      });
    }
  };
  return {
    sink: ws,
    close: async () => {
      await finish();
      if (failure !== undefined) throw failure;
      if (regular) {
        await rename(target, full);
        temporaryOutputs.delete(target);
      }
    },
    abort: async () => {
      await finish();
      if (regular) {
        await rm(target, { force: true });
        temporaryOutputs.delete(target);
      }
    },
  };
}

/**
 * A writer of the given format over a sink. JSON records use the header
 * text `name [unit]` as keys (the JSON Lines input convention), so output
 * can be read back.
 */
export function openTableWriter(sink: TextSink, columns: readonly OutColumn[], options: TableWriterOptions): TableWriter {
  const out = new TextOut(sink);
  const headers = columns.map((c) => formatColumnHeader({ name: c.name, unit: c.unit ?? null }));
  switch (options.format) {
    case "csv": {
      const w = new CsvWriter(out);
      let started = false;
      return {
        writeRow(cells) {
          if (!started) {
            started = true;
            const p = w.writeRow(headers);
            if (p !== undefined) return p.then(() => w.writeRow(cells));
          }
          return w.writeRow(cells);
        },
        async end() {
          if (!started) await w.writeRow(headers);
          await w.end();
        },
      };
    }
    case "json":
    case "jsonl": {
      const w = new JsonWriter(out, { mode: options.format === "json" ? "array" : "lines" });
      return {
        writeRow(cells) {
          const rec: Record<string, unknown> = {};
          headers.forEach((h, i) => {
            const v = cells[i];
            rec[h] = v === undefined || v === "" ? null : v;
          });
          return w.writeRecord(rec);
        },
        end: () => w.end(),
      };
    }
    case "table": {
      const w = new AlignedTableWriter(
        out,
        columns.map((c) => ({ name: c.name, unit: c.unit ?? null, uncertaintyOf: c.uncertaintyOf ?? null, uncertaintySide: c.uncertaintySide ?? null })),
        { plusMinus: true, ...(options.digits !== undefined ? { digits: options.digits } : {}) },
      );
      // Integers (line numbers, counts) print as they are, not to `digits` significant digits.
      const plain = (cells: readonly CellValue[]): CellValue[] => cells.map((v) => (typeof v === "number" && Number.isInteger(v) && Math.abs(v) < 1e15 ? String(v) : v));
      return { writeRow: (cells) => w.writeRow(plain(cells)), end: () => w.end() };
    }
  }
}

/** The default output format: an aligned table on a terminal, CSV otherwise. */
export function defaultFormat(explicit: string | undefined, outputPath: string | undefined, io: CliIO): OutputFormat {
  if (explicit !== undefined) return explicit as OutputFormat;
  if (outputPath !== undefined && outputPath !== "-") {
    if (/\.jsonl$|\.ndjson$/i.test(outputPath)) return "jsonl";
    if (/\.json$/i.test(outputPath)) return "json";
    if (/\.txt$/i.test(outputPath)) return "table";
    return "csv";
  }
  return io.stdout.isTTY === true ? "table" : "csv";
}
