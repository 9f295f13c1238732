/**
 * The typed quantity core against plain numbers: typed arithmetic should
 * compile to the same machine code (brands exist only in the types), and
 * unit conversion through `SI.of` / `SI.valueIn`, a converter taken out of the
 * loop, `CGS.from` and `SI.arrayOf` / `SI.arrayIn` should cost no more than
 * the multiplication an engineer writes by hand (nm → Å is × 10, nm → m is
 * × 1e-9, W → erg s⁻¹ is × 1e7).
 */
import { SI, CGS } from "../src/quantity/system";
import { units } from "../src/quantity/units";
import { add, div, mul, pow, scale } from "../src/quantity/arithmetic";
import { kinds, type Length, type LengthArray, type Power, type Temperature } from "../src/quantity/aliases";
import { assumeArray } from "../src/quantity/quantity";
import { constants } from "../src/constants/index";
import type { BenchCase } from "./case";

const N = 1_000_000;
let lengths = new Float64Array(0);
let temps = new Float64Array(0);
let lengthsM = assumeArray<LengthArray<"SI">>(new Float64Array(0));

function setup(): void {
  if (lengths.length === N) return;
  lengths = new Float64Array(N);
  temps = new Float64Array(N);
  for (let i = 0; i < N; i++) {
    lengths[i] = 1e2 + i * 1e-3; // read as nm (100 nm … 1.1 µm) or as W
    temps[i] = 3000 + (i % 7000);
  }
  lengthsM = assumeArray<LengthArray<"SI">>(Float64Array.from(lengths, (x) => x * 1e-9));
}

const sigma = constants.sigma.si as number;
const sigmaTyped = constants.sigma.si;


/** Strided checksum of an output array (the conversion, not the sum, is what is timed). */
function strided(a: Float64Array): number {
  let s = 0;
  for (let i = 0; i < a.length; i += 97) s += a[i] as number;
  return s;
}

export const cases: BenchCase[] = [
  {
    name: "typed arithmetic L = 4πR²σT⁴ (mul, pow, scale)",
    note: "typed mul/pow/scale over 1e6 (R, T) pairs vs the same expression on numbers, same order of operations",
    items: N,
    setup,
    baseline: () => {
      let s = 0;
      for (let i = 0; i < N; i++) {
        const r = lengths[i] as number;
        const t = temps[i] as number;
        const t2 = t * t;
        s += r * r * (sigma * (t2 * t2)) * (4 * Math.PI);
      }
      return s;
    },
    subject: () => {
      let s = 0;
      for (let i = 0; i < N; i++) {
        const r = lengths[i] as Length<"SI">;
        const t = temps[i] as Temperature;
        s += scale(mul(mul(r, r), mul(sigmaTyped, pow(t, 4))), 4 * Math.PI);
      }
      return s;
    },
  },
  {
    name: "typed add/div chain",
    note: "div(add(r, r), 2 s) over 1e6 values vs (r + r) / 2",
    items: N,
    setup,
    baseline: () => {
      let s = 0;
      for (let i = 0; i < N; i++) {
        const r = lengths[i] as number;
        s += (r + r) / 2;
      }
      return s;
    },
    subject: () => {
      let s = 0;
      const two = SI.of(2, units.s);
      for (let i = 0; i < N; i++) {
        const r = lengths[i] as Length<"SI">;
        s += div(add(r, r), two);
      }
      return s;
    },
  },
  {
    name: "SI.of(nm) + SI.valueIn(Å) per call",
    note: "SI.valueIn(SI.of(x, nm), Å) per value over 1e6 vs x * 10",
    items: N,
    setup,
    baseline: () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += (lengths[i] as number) * 10;
      return s;
    },
    subject: () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += SI.valueIn(SI.of(lengths[i] as number, units.nm), units.angstrom);
      return s;
    },
  },
  {
    name: "converter nm → SI taken out of the loop",
    note: "const toM = SI.converter(units.nm) before the loop, toM(x) per value over 1e6 vs x * 1e-9",
    items: N,
    setup,
    baseline: () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += (lengths[i] as number) * 1e-9;
      return s;
    },
    subject: () => {
      const toM = SI.converter(units.nm);
      let s = 0;
      for (let i = 0; i < N; i++) s += toM(lengths[i] as number);
      return s;
    },
  },
  {
    name: "CGS.from(SI power) per call",
    note: "CGS.from(SI.of(x, W), kinds.power) per value over 1e6 vs x * 1e7",
    items: N,
    setup,
    baseline: () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += (lengths[i] as number) * 1e7;
      return s;
    },
    subject: () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += CGS.from(SI.of(lengths[i] as number, units.W), kinds.power);
      return s;
    },
  },
  {
    name: "system conversion out of the loop: CGS.converterFrom(power) over 10⁶ values",
    items: N,
    setup,
    baseline: () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += (lengths[i] as number) * 1e7;
      return s;
    },
    subject: () => {
      const toErgPerS = CGS.converterFrom(kinds.power);
      let s = 0;
      for (let i = 0; i < N; i++) s += toErgPerS(lengths[i] as Power<"SI">);
      return s;
    },
  },
  {
    name: "SI.arrayOf(nm) over 1e6",
    note: "SI.arrayOf(values, nm) (new array) vs a hand loop into a new Float64Array, x * 1e-9; strided checksum",
    items: N,
    setup,
    baseline: () => {
      const out = new Float64Array(N);
      for (let i = 0; i < N; i++) out[i] = (lengths[i] as number) * 1e-9;
      return strided(out);
    },
    subject: () => strided(SI.arrayOf(lengths, units.nm)),
  },
  {
    name: "SI.arrayIn(nm) over 1e6",
    note: "SI.arrayIn(metres, nm) (new array) vs a hand loop into a new Float64Array, x * 1e9; strided checksum",
    items: N,
    setup,
    baseline: () => {
      const out = new Float64Array(N);
      for (let i = 0; i < N; i++) out[i] = (lengthsM[i] as number) * 1e9;
      return strided(out);
    },
    subject: () => strided(SI.arrayIn(lengthsM, units.nm)),
  },
];
