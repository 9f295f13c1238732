// Runtime smoke test of the installed package: plain ES module JavaScript,
// run unchanged by Node, Deno and Bun from a directory where the packed
// tarball is installed (see packed.test.ts). Prints one JSON line.
import { CGS, SI, constants, kinds, planckRadianceWavelength, units } from "starlume";

const T = SI.of(5772, units.K);
const out = {
  runtime:
    typeof globalThis.Deno !== "undefined" ? "deno" : typeof globalThis.Bun !== "undefined" ? "bun" : "node",
  planckSI: planckRadianceWavelength(SI, SI.of(500, units.nm), T),
  planckCGS: planckRadianceWavelength(CGS, CGS.of(500, units.nm), T),
  parsed: SI.valueIn(SI.parse("656.28 nm", kinds.length), units.angstrom),
  sigmaCGS: constants.sigma.cgs,
};
let rejected = "no error";
try {
  SI.parse("12.3 mas", kinds.length);
} catch (e) {
  rejected = e instanceof Error ? e.name : "non-Error";
}
out.rejected = rejected;
console.log(JSON.stringify(out));
