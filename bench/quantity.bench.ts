/**
 * The typed quantity core against plain numbers: typed arithmetic should
 * compile to the same machine code (brands exist only in the types), and
 * unit conversion through `SI.of` / `SI.valueIn` should cost no more than the
 * multiplication written by hand.
 */
import { SI, CGS } from "../src/quantity/system";
import { units } from "../src/quantity/units";
import { add, div, mul, pow, scale } from "../src/quantity/arithmetic";
import type { Length, Power, Temperature } from "../src/quantity/aliases";
import { constants } from "../src/constants/index";
import { kinds } from "../src/quantity/aliases";
import type { BenchCase } from "./case";

const N = 1_000_000;
let lengths = new Float64Array(0);
let temps = new Float64Array(0);

function setup(): void {
  if (lengths.length === N) return;
  lengths = new Float64Array(N);
  temps = new Float64Array(N);
  for (let i = 0; i < N; i++) {
    lengths[i] = 1e8 + i * 1e3;
    temps[i] = 3000 + (i % 7000);
  }
}

const sigma = constants.sigma.si as number;
const sigmaTyped = constants.sigma.si;

export const cases: BenchCase[] = [
  {
    name: "typed arithmetic: L = 4πR²σT⁴ over 10⁶ stars (mul, pow, scale)",
    items: N,
    setup,
    baseline: () => {
      let s = 0;
      for (let i = 0; i < N; i++) {
        const r = lengths[i] as number;
        const t = temps[i] as number;
        const t2 = t * t;
        s += r * r * (sigma * (t2 * t2)) * (4 * Math.PI); // the typed expression's order of operations
      }
      return s;
    },
    subject: () => {
      let s = 0;
      for (let i = 0; i < N; i++) {
        const r = lengths[i] as Length<"SI">;
        const t = temps[i] as Temperature;
        const l = scale(mul(mul(r, r), mul(sigmaTyped, pow(t, 4))), 4 * Math.PI);
        s += l;
      }
      return s;
    },
  },
  {
    name: "typed add/div chain over 10⁶ values",
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
    name: "unit conversion: SI.of(x, nm) then SI.valueIn(q, Å) over 10⁶ values",
    items: N,
    setup,
    baseline: () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += ((lengths[i] as number) / 1e9) * 1e10;
      return s;
    },
    subject: () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += SI.valueIn(SI.of(lengths[i] as number, units.nm), units.angstrom);
      return s;
    },
  },
  {
    name: "system conversion: CGS.from(SI power) over 10⁶ values",
    items: N,
    setup,
    baseline: () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += (lengths[i] as number) * 1e7;
      return s;
    },
    subject: () => {
      let s = 0;
      const kind = { dimension: units.W.dimension };
      for (let i = 0; i < N; i++) s += CGS.from(SI.of(lengths[i] as number, units.W), kind);
      return s;
    },
  },
  {
    name: "unit conversion out of the loop: SI.converter(nm), SI.reader(Å) over 10⁶ values",
    items: N,
    setup,
    baseline: () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += ((lengths[i] as number) / 1e9) * 1e10;
      return s;
    },
    subject: () => {
      const fromNm = SI.converter(units.nm);
      const inAngstrom = SI.reader(units.angstrom);
      let s = 0;
      for (let i = 0; i < N; i++) s += inAngstrom(fromNm(lengths[i] as number));
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
    name: "arrays: SI.arrayOf(nm) then SI.arrayIn(Å), 10⁶ values",
    items: N,
    setup,
    baseline: () => {
      const a = new Float64Array(N);
      for (let i = 0; i < N; i++) a[i] = (lengths[i] as number) / 1e9;
      const b = new Float64Array(N);
      for (let i = 0; i < N; i++) b[i] = (a[i] as number) * 1e10;
      return (b[0] as number) + (b[N - 1] as number);
    },
    subject: () => {
      const b = SI.arrayIn(SI.arrayOf(lengths, units.nm), units.angstrom);
      return (b[0] as number) + (b[N - 1] as number);
    },
  },
];
