/**
 * FITS binary tables (BINTABLE extensions), read and written from the text of
 * the FITS Standard 4.0 (§3 file structure, §4 header cards, §7.3 binary
 * tables): 2880-byte blocks, 80-character header cards ending with `END`,
 * big-endian data, columns described by `TTYPEn`, `TFORMn`, `TUNITn`,
 * `TNULLn`, `TSCALn` and `TZEROn`.
 *
 * Supported column types: `L` (logical), `B` (unsigned byte), `I`, `J`, `K`
 * (16-, 32-, 64-bit signed integers), `E`, `D` (32-, 64-bit IEEE floats) with
 * repeat count 1, and `rA` (a character string of r bytes). Nulls: `TNULLn`
 * for integers, NaN for floats, byte 0 for logicals, an empty string for `A`.
 * Not supported yet (a FitsError names them): vector columns (repeat > 1 for
 * numbers), `X`, `C`, `M` and variable-length arrays (`P`, `Q`), and
 * streaming (the reader takes the whole file).
 *
 * @module
 */

/** Size of a FITS block in bytes (FITS Standard 4.0 §3.1). */
export const FITS_BLOCK = 2880;
const CARD = 80;

/** A malformed FITS file: the message names the byte offset of the problem. */
export class FitsError extends Error {
  /** Byte offset in the file where the problem was found. */
  readonly offset: number;
  constructor(offset: number, message: string) {
    super(`FITS byte ${offset}: ${message}`);
    this.name = "FitsError";
    this.offset = offset;
  }
}

/** Column types this module reads and writes. */
export type FitsType = "L" | "B" | "I" | "J" | "K" | "E" | "D" | "A";

/** One column of a binary table. */
export interface FitsColumn {
  readonly name: string;
  readonly type: FitsType;
  /** Bytes of an `A` column (its repeat count); 1 otherwise. */
  readonly width: number;
  readonly unit: string | null;
  /** Stored integer that means null (`TNULLn`), integer columns only. */
  readonly tnull?: number;
  /** Physical value = tzero + tscal × stored (`TSCALn`, `TZEROn`; defaults 1 and 0). */
  readonly tscal?: number;
  readonly tzero?: number;
}

/** A cell: a number, a string, a boolean, or null. */
export type FitsCell = number | string | boolean | null;

/** A binary table: its columns and rows. */
export interface FitsTable {
  readonly columns: readonly FitsColumn[];
  readonly rows: readonly (readonly FitsCell[])[];
}

const SIZE: Record<FitsType, number> = { L: 1, B: 1, I: 2, J: 4, K: 8, E: 4, D: 8, A: 1 };

// --- header cards --------------------------------------------------------------

type CardValue = string | number | boolean;

function formatValue(v: CardValue): string {
  if (typeof v === "boolean") return (v ? "T" : "F").padStart(20);
  if (typeof v === "number") {
    const t = Number.isInteger(v) && Math.abs(v) < 1e18 ? String(v) : v.toExponential().toUpperCase();
    return t.padStart(20);
  }
  // strings: quote, double inner quotes, at least 8 characters inside (§4.2.1)
  return `'${v.replace(/'/g, "''").padEnd(8)}'`;
}

function card(key: string, value?: CardValue, comment?: string): string {
  if (!/^[A-Z0-9_-]{1,8}$/.test(key)) throw new RangeError(`FITS keyword ${JSON.stringify(key)} must be 1-8 of A-Z 0-9 _ -`);
  let c = key.padEnd(8);
  if (value !== undefined) c += `= ${formatValue(value)}`;
  if (comment !== undefined) c += ` / ${comment}`;
  if (c.length > CARD) throw new RangeError(`FITS card for ${key} is longer than 80 characters`);
  if (!/^[\x20-\x7e]*$/.test(c)) throw new RangeError(`FITS card for ${key} must be printable ASCII`);
  return c.padEnd(CARD);
}

function headerBytes(cards: string[]): Uint8Array {
  const text = [...cards, "END".padEnd(CARD)].join("");
  const size = Math.ceil(text.length / FITS_BLOCK) * FITS_BLOCK;
  const out = new Uint8Array(size).fill(0x20);
  for (let i = 0; i < text.length; i++) out[i] = text.charCodeAt(i);
  return out;
}

interface Header {
  readonly start: number;
  readonly end: number; // first byte after the header (block aligned)
  readonly values: Map<string, { value: CardValue; offset: number }>;
}

function parseValue(text: string, offset: number): CardValue {
  const t = text.trim();
  if (t.startsWith("'")) {
    let s = "";
    let i = 1;
    for (;;) {
      if (i >= t.length) throw new FitsError(offset, "string value without its closing quote");
      if (t[i] === "'") {
        if (t[i + 1] === "'") {
          s += "'";
          i += 2;
          continue;
        }
        break;
      }
      s += t[i];
      i++;
    }
    return s.replace(/ +$/, "");
  }
  const v = t.split("/")[0]?.trim() ?? "";
  if (v === "T") return true;
  if (v === "F") return false;
  const n = Number(v.replace(/D/g, "E"));
  if (v === "" || !Number.isFinite(n)) throw new FitsError(offset, `cannot read the value ${JSON.stringify(v)}`);
  return n;
}

function readHeader(bytes: Uint8Array, start: number): Header {
  const values = new Map<string, { value: CardValue; offset: number }>();
  let pos = start;
  for (;;) {
    if (pos + CARD > bytes.length) throw new FitsError(pos, "header without END (file ends inside the header)");
    let text = "";
    for (let i = 0; i < CARD; i++) {
      const b = bytes[pos + i] as number;
      if (b < 0x20 || b > 0x7e) throw new FitsError(pos + i, `header byte 0x${b.toString(16)} is not printable ASCII`);
      text += String.fromCharCode(b);
    }
    const key = text.slice(0, 8).trim();
    if (key === "END") break;
    if (text.slice(8, 10) === "= " && key !== "" && key !== "COMMENT" && key !== "HISTORY") {
      values.set(key, { value: parseValue(text.slice(10), pos + 10), offset: pos });
    }
    pos += CARD;
  }
  const end = Math.ceil((pos + CARD - start) / FITS_BLOCK) * FITS_BLOCK + start;
  return { start, end, values };
}

function intKey(h: Header, key: string, required = true): number | undefined {
  const e = h.values.get(key);
  if (e === undefined) {
    if (required) throw new FitsError(h.start, `header lacks the required keyword ${key}`);
    return undefined;
  }
  if (typeof e.value !== "number" || !Number.isInteger(e.value)) throw new FitsError(e.offset, `${key} must be an integer; got ${String(e.value)}`);
  return e.value;
}

function strKey(h: Header, key: string): string | undefined {
  const e = h.values.get(key);
  if (e === undefined) return undefined;
  if (typeof e.value !== "string") throw new FitsError(e.offset, `${key} must be a string`);
  return e.value;
}

function dataSize(h: Header): number {
  const naxis = intKey(h, "NAXIS") as number;
  if (naxis === 0) return 0;
  let n = Math.abs(intKey(h, "BITPIX") as number) / 8;
  for (let i = 1; i <= naxis; i++) n *= intKey(h, `NAXIS${i}`) as number;
  const pcount = intKey(h, "PCOUNT", false) ?? 0;
  const gcount = intKey(h, "GCOUNT", false) ?? 1;
  return (n + pcount) * gcount;
}

// --- reading ---------------------------------------------------------------------

/**
 * Read the binary table of a FITS file: the `hdu`-th BINTABLE extension
 * (1-based among the extensions; default the first BINTABLE).
 *
 * @throws FitsError naming the byte offset of a malformed file
 */
export function readFitsTable(bytes: Uint8Array, hdu?: number): FitsTable {
  if (bytes.length < FITS_BLOCK) throw new FitsError(bytes.length, `a FITS file is at least one ${FITS_BLOCK}-byte block; this one has ${bytes.length} bytes`);
  if (String.fromCharCode(...bytes.subarray(0, 9)) !== "SIMPLE  =") throw new FitsError(0, "the file does not start with SIMPLE = T");
  const primary = readHeader(bytes, 0);
  if (primary.values.get("SIMPLE")?.value !== true) throw new FitsError(0, "the file does not start with SIMPLE = T");
  let pos = primary.end + Math.ceil(dataSize(primary) / FITS_BLOCK) * FITS_BLOCK;
  let ext = 0;
  while (pos < bytes.length) {
    const h = readHeader(bytes, pos);
    ext++;
    const kind = strKey(h, "XTENSION");
    const size = dataSize(h);
    if (h.end + size > bytes.length) throw new FitsError(h.end, `data of extension ${ext} needs ${size} bytes; the file has ${bytes.length - h.end} left (truncated, or NAXIS2 too large)`);
    if (kind === "BINTABLE" && (hdu === undefined || hdu === ext)) return readBinTable(bytes, h);
    if (hdu === ext) throw new FitsError(pos, `extension ${ext} is ${kind ?? "not an extension"}, not a BINTABLE`);
    pos = h.end + Math.ceil(size / FITS_BLOCK) * FITS_BLOCK;
  }
  throw new FitsError(pos, hdu === undefined ? "no BINTABLE extension in the file" : `no extension ${hdu} (the file has ${ext})`);
}

function readBinTable(bytes: Uint8Array, h: Header): FitsTable {
  const rowBytes = intKey(h, "NAXIS1") as number;
  const nrows = intKey(h, "NAXIS2") as number;
  const n = intKey(h, "TFIELDS") as number;
  const columns: FitsColumn[] = [];
  const offsets: number[] = [];
  let off = 0;
  for (let i = 1; i <= n; i++) {
    const tform = strKey(h, `TFORM${i}`);
    const at = h.values.get(`TFORM${i}`)?.offset ?? h.start;
    if (tform === undefined) throw new FitsError(h.start, `header lacks TFORM${i}`);
    const m = /^\s*([0-9]*)([LXBIJKAEDCMPQ])/.exec(tform);
    if (m === null) throw new FitsError(at, `TFORM${i} = '${tform}' is not a binary-table format`);
    const r = m[1] === "" ? 1 : Number(m[1]);
    const t = m[2] as string;
    if (!"LBIJKEDA".includes(t)) throw new FitsError(at, `TFORM${i} = '${tform}': type ${t} is not supported yet`);
    if (t !== "A" && r !== 1) throw new FitsError(at, `TFORM${i} = '${tform}': vector columns (repeat ${r}) are not supported yet`);
    const type = t as FitsType;
    const tnull = intKey(h, `TNULL${i}`, false);
    const tscal = h.values.get(`TSCAL${i}`)?.value;
    const tzero = h.values.get(`TZERO${i}`)?.value;
    columns.push({
      name: strKey(h, `TTYPE${i}`) ?? `col${i}`,
      type,
      width: type === "A" ? r : 1,
      unit: strKey(h, `TUNIT${i}`) ?? null,
      ...(tnull !== undefined ? { tnull } : {}),
      ...(typeof tscal === "number" ? { tscal } : {}),
      ...(typeof tzero === "number" ? { tzero } : {}),
    });
    offsets.push(off);
    off += SIZE[type] * (type === "A" ? r : 1);
  }
  if (off !== rowBytes) throw new FitsError(h.values.get("NAXIS1")?.offset ?? h.start, `NAXIS1 = ${rowBytes}, but the TFORMs add up to ${off} bytes per row`);
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const rows: FitsCell[][] = [];
  for (let r = 0; r < nrows; r++) {
    const base = h.end + r * rowBytes;
    rows.push(columns.map((c, j) => readCell(view, base + (offsets[j] as number), c)));
  }
  return { columns, rows };
}

function readCell(v: DataView, p: number, c: FitsColumn): FitsCell {
  let raw: number;
  switch (c.type) {
    case "L": {
      const b = v.getUint8(p);
      return b === 0 ? null : b === 0x54;
    }
    case "A": {
      let s = "";
      for (let i = 0; i < c.width; i++) {
        const b = v.getUint8(p + i);
        if (b === 0) break;
        s += String.fromCharCode(b);
      }
      s = s.replace(/ +$/, "");
      return s === "" ? null : s;
    }
    case "B":
      raw = v.getUint8(p);
      break;
    case "I":
      raw = v.getInt16(p);
      break;
    case "J":
      raw = v.getInt32(p);
      break;
    case "K": {
      const big = v.getBigInt64(p);
      if (c.tnull !== undefined && big === BigInt(c.tnull)) return null;
      raw = Number(big);
      break;
    }
    case "E":
      raw = v.getFloat32(p);
      break;
    case "D":
      raw = v.getFloat64(p);
      break;
  }
  if (c.type !== "K" && c.tnull !== undefined && raw === c.tnull && c.type !== "E" && c.type !== "D") return null;
  if (Number.isNaN(raw)) return null;
  return (c.tzero ?? 0) + (c.tscal ?? 1) * raw;
}

// --- writing ---------------------------------------------------------------------

/**
 * Write a FITS file: an empty primary HDU and one BINTABLE extension holding
 * `table`, with `TUNITn` for columns that have a unit. Nulls are written as
 * `TNULLn` (integer columns, which then need `tnull`), NaN (floats), byte 0
 * (logicals) or an empty string.
 *
 * @throws RangeError for a value that its column cannot hold
 */
export function writeFitsTable(table: FitsTable, extname?: string): Uint8Array {
  const { columns, rows } = table;
  const rowBytes = columns.reduce((s, c) => s + SIZE[c.type] * (c.type === "A" ? c.width : 1), 0);
  const primary = headerBytes([card("SIMPLE", true, "conforms to FITS Standard 4.0"), card("BITPIX", 8), card("NAXIS", 0), card("EXTEND", true)]);
  const cards = [
    card("XTENSION", "BINTABLE", "binary table extension"),
    card("BITPIX", 8),
    card("NAXIS", 2),
    card("NAXIS1", rowBytes, "bytes per row"),
    card("NAXIS2", rows.length, "rows"),
    card("PCOUNT", 0),
    card("GCOUNT", 1),
    card("TFIELDS", columns.length),
  ];
  columns.forEach((c, k) => {
    const i = k + 1;
    cards.push(card(`TTYPE${i}`, c.name), card(`TFORM${i}`, c.type === "A" ? `${c.width}A` : `1${c.type}`));
    if (c.unit !== null) cards.push(card(`TUNIT${i}`, c.unit));
    if (c.tnull !== undefined) cards.push(card(`TNULL${i}`, c.tnull));
    if (c.tscal !== undefined) cards.push(card(`TSCAL${i}`, c.tscal));
    if (c.tzero !== undefined) cards.push(card(`TZERO${i}`, c.tzero));
  });
  if (extname !== undefined) cards.push(card("EXTNAME", extname));
  const header = headerBytes(cards);
  const dataLen = Math.ceil((rowBytes * rows.length) / FITS_BLOCK) * FITS_BLOCK;
  const out = new Uint8Array(primary.length + header.length + dataLen);
  out.set(primary, 0);
  out.set(header, primary.length);
  const view = new DataView(out.buffer);
  let p = primary.length + header.length;
  for (const row of rows) {
    columns.forEach((c, j) => {
      writeCell(view, p, c, row[j] ?? null);
      p += SIZE[c.type] * (c.type === "A" ? c.width : 1);
    });
  }
  return out;
}

function writeCell(v: DataView, p: number, c: FitsColumn, x: FitsCell): void {
  if (c.type === "L") {
    v.setUint8(p, x === null ? 0 : x === true ? 0x54 : 0x46);
    return;
  }
  if (c.type === "A") {
    const s = x === null ? "" : String(x);
    if (s.length > c.width || !/^[\x20-\x7e]*$/.test(s)) throw new RangeError(`column ${c.name}: ${JSON.stringify(s)} is not printable ASCII of at most ${c.width} characters`);
    for (let i = 0; i < c.width; i++) v.setUint8(p + i, i < s.length ? s.charCodeAt(i) : 0x20);
    return;
  }
  if (x !== null && typeof x !== "number") throw new RangeError(`column ${c.name}: ${JSON.stringify(x)} is not a number`);
  if (c.type === "E" || c.type === "D") {
    const stored = x === null ? NaN : (x - (c.tzero ?? 0)) / (c.tscal ?? 1);
    if (c.type === "E") v.setFloat32(p, stored);
    else v.setFloat64(p, stored);
    return;
  }
  let stored: number;
  if (x === null) {
    if (c.tnull === undefined) throw new RangeError(`column ${c.name}: a null needs TNULL (tnull) on an integer column`);
    stored = c.tnull;
  } else {
    stored = Math.round((x - (c.tzero ?? 0)) / (c.tscal ?? 1));
  }
  const range: Record<string, [number, number]> = { B: [0, 255], I: [-32768, 32767], J: [-2147483648, 2147483647], K: [-(2 ** 63), 2 ** 63 - 1] };
  const [lo, hi] = range[c.type] as [number, number];
  if (!Number.isFinite(stored) || stored < lo || stored > hi) throw new RangeError(`column ${c.name}: ${String(x)} does not fit type ${c.type}`);
  if (c.type === "B") v.setUint8(p, stored);
  else if (c.type === "I") v.setInt16(p, stored);
  else if (c.type === "J") v.setInt32(p, stored);
  else v.setBigInt64(p, BigInt(stored));
}
