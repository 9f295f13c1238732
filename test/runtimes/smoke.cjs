// The same smoke test through require() (the CommonJS build), for Node.
const { CGS, SI, constants, kinds, planckRadianceWavelength, units } = require("starlume");

const T = SI.of(5772, units.K);
const out = {
  runtime: "node-cjs",
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
