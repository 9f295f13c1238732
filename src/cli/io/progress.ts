/**
 * A one-line progress indicator for long command-line runs.
 *
 * It writes a carriage-return-updated status line (e.g.
 * `reading: 120,000 / 1,000,000 rows (12.0%)  48,000 rows/s`) to a terminal
 * stream, by default `process.stderr`, and only when that stream is a TTY —
 * piped or redirected output never receives control characters. Updates are
 * throttled (at most one every `intervalMs`, default 250 ms) so the cost per
 * call of {@link Progress.update} is one clock read. {@link Progress.done}
 * erases the line.
 *
 * @module
 */

/** The part of a Node `WriteStream` used for progress output. */
export interface ProgressStream {
  readonly isTTY?: boolean;
  write(text: string): unknown;
}

/** Options for {@link Progress}. */
export interface ProgressOptions {
  /** Destination (default `process.stderr`). Nothing is written unless `stream.isTTY` is true. */
  readonly stream?: ProgressStream;
  /** Minimum time between redraws, in milliseconds (default 250). */
  readonly intervalMs?: number;
  /** Text before the counts (default `"progress"`). */
  readonly label?: string;
  /** Expected total, to show `done / total (percent)`. */
  readonly total?: number;
  /** Name of the counted things (default `"rows"`). */
  readonly unit?: string;
  /** Clock in milliseconds (default `performance.now`); inject a fake one in tests. */
  readonly now?: () => number;
}

const group = (n: number): string => Math.round(n).toLocaleString("en-US");

/**
 * Throttled TTY progress line.
 *
 * @example
 * ```ts
 * const progress = new Progress({ label: "reading", total: 1e6 });
 * for (let i = 1; i <= 1e6; i++) progress.update(i);
 * progress.done();
 * ```
 */
export class Progress {
  private readonly stream: ProgressStream;
  private readonly active: boolean;
  private readonly interval: number;
  private readonly label: string;
  private readonly total: number | undefined;
  private readonly unit: string;
  private readonly now: () => number;
  private readonly start: number;
  private last = -Infinity;
  private shown = 0;

  /** @throws RangeError if `intervalMs` is negative or not finite, or `total` is not a finite number ≥ 0. */
  constructor(options: ProgressOptions = {}) {
    const interval = options.intervalMs ?? 250;
    if (!(interval >= 0) || interval === Infinity) {
      throw new RangeError(`intervalMs must be a finite number >= 0 ms; got ${String(interval)}`);
    }
    if (options.total !== undefined && !(options.total >= 0 && Number.isFinite(options.total))) {
      throw new RangeError(`total must be a finite number >= 0; got ${String(options.total)}`);
    }
    this.stream = options.stream ?? process.stderr;
    this.active = this.stream.isTTY === true;
    this.interval = interval;
    this.label = options.label ?? "progress";
    this.total = options.total;
    this.unit = options.unit ?? "rows";
    this.now = options.now ?? (() => performance.now());
    this.start = this.now();
  }

  /** Whether anything will be drawn (the stream is a TTY). */
  get enabled(): boolean {
    return this.active;
  }

  /**
   * Report that `done` items are finished, with optional extra text. Redraws
   * only when the stream is a TTY and `intervalMs` has passed since the last redraw.
   */
  update(done: number, extra?: string): void {
    if (!this.active) return;
    const t = this.now();
    if (t - this.last < this.interval) return;
    this.last = t;
    this.draw(this.format(done, t, extra));
  }

  /** Text of the status line for `done` items at clock time `t` (exposed for tests and custom drawing). */
  format(done: number, t: number = this.now(), extra?: string): string {
    let s = `${this.label}: ${group(done)}`;
    if (this.total !== undefined) {
      s += ` / ${group(this.total)} ${this.unit}`;
      if (this.total > 0) s += ` (${((100 * done) / this.total).toFixed(1)}%)`;
    } else {
      s += ` ${this.unit}`;
    }
    const seconds = (t - this.start) / 1000;
    if (seconds > 0) s += `  ${group(done / seconds)} ${this.unit}/s`;
    if (extra !== undefined && extra !== "") s += `  ${extra}`;
    return s;
  }

  /** Erase the status line (if one was drawn). Call once at the end of the run. */
  done(): void {
    if (!this.active || this.shown === 0) return;
    this.stream.write(`\r${" ".repeat(this.shown)}\r`);
    this.shown = 0;
  }

  private draw(text: string): void {
    // Pad with spaces to overwrite a longer previous line.
    const pad = this.shown > text.length ? " ".repeat(this.shown - text.length) : "";
    this.stream.write(`\r${text}${pad}`);
    this.shown = text.length;
  }
}
