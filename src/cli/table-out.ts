/**
 * Writing a command's result table: CSV, JSON (one array), JSON Lines or an
 * aligned text table, row by row with back-pressure (the aligned table
 * measures its first rows, see io/write.ts). Output goes to stdout or to
 * `--output FILE`.
 *
 * @module
 */
import { createWriteStream } from "node:fs";
import { once } from "node:events";
import { resolve } from "node:path";
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

/**
 * Where results go: `--output FILE` (created or truncated) or stdout. The
 * returned `close` ends the file stream (never stdout).
 */
export async function openOutput(path: string | undefined, io: CliIO): Promise<{ sink: TextSink; close: () => Promise<void> }> {
  if (path === undefined || path === "-") return { sink: io.stdout, close: async () => {} };
  const full = resolve(io.cwd ?? process.cwd(), path);
  const ws = createWriteStream(full, { encoding: "utf8" });
  try {
    await once(ws, "open");
  } catch (e) {
    throw new UsageError(`cannot write output file '${path}' (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`);
  }
  return {
    sink: ws,
    close: async () => {
      if (ws.closed) return;
      ws.end();
      await once(ws, "close");
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
