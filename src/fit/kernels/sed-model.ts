/**
 * SED models you can compose and extend: named parameters with units, bounds
 * and an internal transform; band means through response curves and spectra
 * on a grid, with analytic derivatives; a sum of components, each optionally
 * attenuated by extinction.
 *
 * ## Components
 * A component is amplitude × shape: f_λ(λᵢ) = A(a) · Sᵢ(q), where `a` is
 * its amplitude parameter (log transform, A = amplitudeConstant · e^(amplitudePower · ln a))
 * and Sᵢ its shape on the nodes. The component's evaluator writes Sᵢ and
 * ∂Sᵢ/∂qₐ (internal coordinates: ln q for a log parameter, q for a linear
 * one) for every shape parameter; the amplitude's derivative is
 * amplitudePower · f and is added by the model. Writing a new component is
 * this interface and nothing else (see docs/guides/fitting.md).
 *
 * Built in:
 * - {@link blackbodyComponentSI}: π(θ/2)² B_λ(λ, T) (a uniform disc of angular diameter θ);
 * - {@link modifiedBlackbodyComponentSI}: dust, Ω (λ₀/λ)^β B_λ(T) (optically thin)
 *   or Ω (1 − e^(−τ)) B_λ(T), τ = (λ₀/λ)^β (general), with (λ₀/λ) = (ν/ν₀).
 *
 * B_λ(λ, T) = (2hc²/λ⁵)/(e^x − 1), x = hc/(λkT) (Planck), evaluated in the
 * closed form with per-node constants (one expm1 per node); T ∂B/∂T = B x eˣ/(eˣ − 1).
 *
 * ## Attenuation
 * A multiplicative factor eᵢ = 10^(−0.4 A_V kᵢ) = exp(−0.4 ln10 A_V kᵢ) with
 * kᵢ = A_λ/A_V from CCM89 (Cardelli, Clayton & Mathis 1989, ApJ 345, 245;
 * photometry/kernels/extinction.ts) for a given R_V; it may apply to any
 * component, and one attenuation object shared by several components is one
 * parameter. ∂eᵢ/∂A_V = −0.4 ln10 kᵢ eᵢ.
 *
 * ## Band means
 * A band measures ⟨f_λ⟩ = Σ ŵᵢ f_λ(λᵢ) (bands.ts), so a model's band mean is
 * Σ_c A_c Σᵢ ŵᵢ e_cᵢ S_cᵢ, integrated through the band with the attenuation.
 *
 * @module
 */
import { C1L, C2 } from "../../values/constants";
import { requireFinite, requirePositive } from "../../internal/checks";
import { ccm89RatioSI, RV_DIFFUSE_ISM } from "../../photometry/kernels/extinction";

/** Internal coordinate of a parameter: "log" (ln p, for positive scales) or "linear" (p). */
export type ParameterTransform = "log" | "linear";

/** One named model parameter. */
export interface ModelParameterSI {
  /** Name, unit-suffixed in SI records (e.g. `temperatureK`). */
  readonly name: string;
  /** Unit in the parser's grammar (`"K"`, `"rad"`, `"sr"`, `"m"`, `""` for a pure number). */
  readonly unit: string;
  /** Internal coordinate used by the fit. */
  readonly transform: ParameterTransform;
  /** Lower bound in the parameter's unit (> 0 for "log"; may be −Infinity for "linear"). */
  readonly lower: number;
  /** Upper bound in the parameter's unit (may be Infinity). */
  readonly upper: number;
  /** Start value in the parameter's unit (used when no grid or profile sets it). */
  readonly start: number;
  /** Held at `start` unless freed by the fit's options (default false). */
  readonly fixed?: boolean;
  /** Number of log-spaced start-grid points over [lower, upper] (0 or absent: no grid). */
  readonly startGrid?: number;
}

/** Evaluator of a component's shape on fixed nodes. */
export interface ComponentEvaluatorSI {
  /**
   * Write the shape Sᵢ into `shape[i]` and ∂Sᵢ/∂qₐ (internal coordinates) into
   * `d[i * np + a]` for every shape parameter a (np = the component's parameter
   * count; the amplitude column is ignored). `q` holds the internal values.
   */
  evaluate(q: ArrayLike<number>, shape: Float64Array, d: Float64Array): void;
  /**
   * Optional band-level fast path (used instead of `evaluate` when present):
   * for each channel c over nodes [offs[c], offs[c+1]) with effective weights
   * `we` (weights × attenuation), write S₀ = Σ weᵢSᵢ into `s0[c]`,
   * Σ weᵢ ∂Sᵢ/∂qₐ into `ds[c * np + a]` (shape parameters), and, when `k` is
   * given, Σ weᵢ kᵢ Sᵢ into `sk[c]`.
   */
  accumulate?(
    q: ArrayLike<number>,
    we: Float64Array,
    k: Float64Array | null,
    offs: Int32Array,
    s0: Float64Array,
    ds: Float64Array,
    sk: Float64Array,
  ): void;
}

/** A model component: parameters, amplitude, and a shape evaluator. */
export interface SedComponentSI {
  /** Short name (`"blackbody"`, `"modifiedBlackbody"`, …). */
  readonly kind: string;
  /** Parameters, amplitude included. */
  readonly parameters: readonly ModelParameterSI[];
  /** Index of the amplitude parameter (transform "log"). */
  readonly amplitudeIndex: number;
  /** f = amplitudeConstant · a^amplitudePower · S. */
  readonly amplitudeConstant: number;
  /** f = amplitudeConstant · a^amplitudePower · S. */
  readonly amplitudePower: number;
  /** Evaluator on the given nodes (m, > 0): precompute per-node constants here. */
  prepare(wavelengthsM: Float64Array): ComponentEvaluatorSI;
}

/** A multiplicative attenuation (extinction) factor. */
export interface AttenuationSI {
  /** Law name. */
  readonly law: "ccm89";
  /** R_V of the law. */
  readonly rV: number;
  /** Its parameter (A_V, mag, linear, ≥ 0). */
  readonly parameter: ModelParameterSI;
  /** k(λ) = A_λ/A_V at a node; RangeError outside the law's domain. */
  ratio(wavelengthM: number): number;
}

/** One term of a model: a component, optionally attenuated, with an optional label. */
export interface SedTermSI {
  /** The emitting component (its amplitude and shape). */
  readonly component: SedComponentSI;
  /** Attenuation applied to this term only (e.g. CCM 1989 extinction); omit for none. */
  readonly attenuation?: AttenuationSI;
  /** Prefix of its parameter names (`"dust"` → `dust.temperatureK`); omit for none. */
  readonly label?: string;
}

/** A model: a sum of terms; its parameters are the terms' (in order) then the attenuations'. */
export interface SedModelSI {
  /** The terms whose fluxes add up. */
  readonly terms: readonly SedTermSI[];
  /** Full parameter list, in the fit's order. */
  readonly parameters: readonly ModelParameterSI[];
  /** Parameter names (label-prefixed), in order. */
  readonly names: readonly string[];
}

/** Channel layout a model is prepared on (bands.ts `PreparedBandSI` fits). */
export interface ModelChannelSI {
  /** Integration nodes of the channel, m. */
  readonly wavelengthsM: ArrayLike<number>;
  /** Normalized weights of the nodes (Σ = 1). */
  readonly weights: ArrayLike<number>;
}

/** A model prepared on a fixed set of channels. */
export interface PreparedSedModelSI {
  /** The model prepared. */
  readonly model: SedModelSI;
  /** Number of channels it was prepared on. */
  readonly channels: number;
  /**
   * Band means ⟨f_λ⟩ (W m⁻³) into `means` and ∂⟨f_λ⟩/∂qₐ (internal
   * coordinates) into `d[c * np + a]`; `q` internal, length np.
   */
  evaluate(q: ArrayLike<number>, means: Float64Array, d: Float64Array): void;
  /** Band means of term `t` alone at unit amplitude (a^power = 1; its attenuation included) into `out`. */
  termShapeMeans(t: number, q: ArrayLike<number>, out: Float64Array): void;
}

const K04 = 0.4 * Math.LN10;

/** Internal value of a parameter from its natural value. */
export function toInternal(p: ModelParameterSI, v: number): number {
  return p.transform === "log" ? Math.log(v) : v;
}

/** Natural value of a parameter from its internal value. */
export function fromInternal(p: ModelParameterSI, q: number): number {
  return p.transform === "log" ? Math.exp(q) : q;
}

/** Check a parameter definition (bounds ordered, log bounds > 0, start inside). */
export function checkParameterSI(p: ModelParameterSI): ModelParameterSI {
  if (!(p.upper > p.lower)) throw new RangeError(`${p.name} bounds must satisfy lower < upper; got [${p.lower}, ${p.upper}] ${p.unit}`);
  if (p.transform === "log" && !(p.lower > 0)) throw new RangeError(`${p.name} lower bound must be > 0 ${p.unit} (log transform); got ${p.lower}`);
  if (!(p.start >= p.lower && p.start <= p.upper) || !Number.isFinite(p.start)) {
    throw new RangeError(`${p.name} start must be a finite number in [${p.lower}, ${p.upper}] ${p.unit}; got ${String(p.start)}`);
  }
  return p;
}

/** Options of the built-in blackbody component. */
export interface BlackbodyComponentOptionsSI {
  /** Temperature range, K (default [300, 1e6]). */
  readonly temperatureRangeK?: readonly [number, number];
  /** Start-grid points in T (default 61). */
  readonly startGrid?: number;
}

/**
 * A uniform disc: f_λ = π(θ/2)² B_λ(λ, T). Parameters `temperatureK` (log,
 * [300, 1e6] K by default) and `angularDiameterRad` (log, the amplitude,
 * f ∝ θ²).
 *
 * @example
 * ```ts
 * const star = blackbodyComponentSI({ temperatureRangeK: [2000, 50000] });
 * star.parameters.map((p) => p.name); // ["temperatureK", "angularDiameterRad"]
 * ```
 */
export function blackbodyComponentSI(options: BlackbodyComponentOptionsSI = {}): SedComponentSI {
  const [tMin, tMax] = options.temperatureRangeK ?? [300, 1e6];
  requirePositive("temperatureRange[0]", tMin, "K");
  requirePositive("temperatureRange[1]", tMax, "K");
  if (!(tMax > tMin)) throw new RangeError(`temperatureRange[1] must exceed temperatureRange[0] (${tMin} K); got ${tMax} K`);
  return {
    kind: "blackbody",
    parameters: [
      { name: "temperatureK", unit: "K", transform: "log", lower: tMin, upper: tMax, start: Math.sqrt(tMin * tMax), startGrid: options.startGrid ?? 61 },
      { name: "angularDiameterRad", unit: "rad", transform: "log", lower: Number.MIN_VALUE, upper: Infinity, start: 1e-9 },
    ],
    amplitudeIndex: 1,
    amplitudeConstant: Math.PI / 4,
    amplitudePower: 2,
    prepare(wavelengthsM) {
      const n = wavelengthsM.length;
      const aC = new Float64Array(n);
      const cX = new Float64Array(n);
      for (let i = 0; i < n; i++) {
        const l = wavelengthsM[i] as number;
        const l2 = l * l;
        aC[i] = C1L / (l2 * l2 * l);
        cX[i] = C2 / l;
      }
      return {
        evaluate(q, shape, d) {
          const invT = Math.exp(-(q[0] as number));
          for (let i = 0; i < n; i++) {
            const x = (cX[i] as number) * invT;
            const em = Math.expm1(x);
            if (em === Infinity) {
              shape[i] = 0;
              d[2 * i] = 0;
              continue;
            }
            const b = (aC[i] as number) / em;
            shape[i] = b;
            d[2 * i] = (b * x * (em + 1)) / em;
          }
        },
        accumulate(q, we, k, offs, s0, ds, sk) {
          const invT = Math.exp(-(q[0] as number));
          const nCh = offs.length - 1;
          for (let c = 0; c < nCh; c++) {
            let a0 = 0;
            let a1 = 0;
            let a2 = 0;
            const end = offs[c + 1] as number;
            for (let i = offs[c] as number; i < end; i++) {
              // B = a/expm1(x); T ∂B/∂T = B x eˣ/(eˣ − 1) = B x (em + 1)/em
              const x = (cX[i] as number) * invT;
              const em = Math.expm1(x);
              if (em === Infinity) continue; // B underflows to 0
              const wb = ((we[i] as number) * (aC[i] as number)) / em;
              a0 += wb;
              a1 += (wb * x * (em + 1)) / em;
              if (k !== null) a2 += wb * (k[i] as number);
            }
            s0[c] = a0;
            ds[2 * c] = a1;
            sk[c] = a2;
          }
        },
      };
    },
  };
}

/** Options of the modified blackbody. */
export interface ModifiedBlackbodyOptionsSI {
  /** "thin": Ω (λ₀/λ)^β B_λ; "general": Ω (1 − e^(−(λ₀/λ)^β)) B_λ (default "thin"). */
  readonly opacity?: "thin" | "general";
  /** Temperature range, K (default [5, 3000]). */
  readonly temperatureRangeK?: readonly [number, number];
  /** Start (or held) β (default 1.8); bounds [0, 5]. */
  readonly beta?: number;
  /** Fit β (default true). */
  readonly fitBeta?: boolean;
  /** Reference wavelength λ₀ = c/ν₀, m (default 100 µm; held unless fitReferenceWavelength). */
  readonly referenceWavelengthM?: number;
  /** Fit λ₀ (default false; only meaningful for "general": in the thin case it is degenerate with Ω). */
  readonly fitReferenceWavelength?: boolean;
  /** Start-grid points in T (default 61). */
  readonly startGrid?: number;
}

/**
 * Dust: the modified blackbody. Optically thin f_λ = Ω (λ₀/λ)^β B_λ(T) or
 * general f_λ = Ω (1 − e^(−τ)) B_λ(T), τ = (λ₀/λ)^β = (ν/ν₀)^β; Ω (sr) is the
 * solid angle of the emitter. Parameters `temperatureK` (log), `beta`
 * (linear, [0, 5]), `referenceWavelengthM` (log, held by default) and
 * `solidAngleSr` (log, the amplitude).
 *
 * Derivatives (u = λ₀/λ): thin ∂f/∂β = f ln u, ∂f/∂ln λ₀ = β f;
 * general ∂f/∂β = Ω e^(−τ) τ ln u B, ∂f/∂ln λ₀ = Ω e^(−τ) τ β B; ∂f/∂ln T = Ω g(u) T∂B/∂T.
 * Degeneracies: T and β are strongly anti-correlated when the bands do not
 * reach the Wien side of the peak; in the thin case λ₀ only rescales Ω.
 *
 * @example
 * ```ts
 * const dust = modifiedBlackbodyComponentSI({ opacity: "general", beta: 1.5 });
 * dust.parameters.map((p) => p.name); // ["temperatureK", "beta", "referenceWavelengthM", "solidAngleSr"]
 * ```
 */
export function modifiedBlackbodyComponentSI(options: ModifiedBlackbodyOptionsSI = {}): SedComponentSI {
  const general = (options.opacity ?? "thin") === "general";
  if (options.opacity !== undefined && options.opacity !== "thin" && options.opacity !== "general") {
    throw new RangeError(`opacity must be "thin" or "general"; got ${String(options.opacity)}`);
  }
  const [tMin, tMax] = options.temperatureRangeK ?? [5, 3000];
  requirePositive("temperatureRange[0]", tMin, "K");
  requirePositive("temperatureRange[1]", tMax, "K");
  if (!(tMax > tMin)) throw new RangeError(`temperatureRange[1] must exceed temperatureRange[0] (${tMin} K); got ${tMax} K`);
  const beta = requireFinite("beta", options.beta ?? 1.8, "(dimensionless)");
  const l0 = requirePositive("referenceWavelength", options.referenceWavelengthM ?? 100e-6, "m");
  return {
    kind: general ? "modifiedBlackbodyGeneral" : "modifiedBlackbodyThin",
    parameters: [
      checkParameterSI({ name: "temperatureK", unit: "K", transform: "log", lower: tMin, upper: tMax, start: Math.sqrt(tMin * tMax), startGrid: options.startGrid ?? 61 }),
      checkParameterSI({ name: "beta", unit: "", transform: "linear", lower: 0, upper: 5, start: beta, fixed: options.fitBeta === false }),
      checkParameterSI({
        name: "referenceWavelengthM",
        unit: "m",
        transform: "log",
        lower: 1e-7,
        upper: 1e-1,
        start: l0,
        fixed: options.fitReferenceWavelength !== true,
      }),
      { name: "solidAngleSr", unit: "sr", transform: "log", lower: Number.MIN_VALUE, upper: Infinity, start: 1e-12 },
    ],
    amplitudeIndex: 3,
    amplitudeConstant: 1,
    amplitudePower: 1,
    prepare(wavelengthsM) {
      const n = wavelengthsM.length;
      const aC = new Float64Array(n);
      const cX = new Float64Array(n);
      const lnInvL = new Float64Array(n);
      for (let i = 0; i < n; i++) {
        const l = wavelengthsM[i] as number;
        const l2 = l * l;
        aC[i] = C1L / (l2 * l2 * l);
        cX[i] = C2 / l;
        lnInvL[i] = -Math.log(l);
      }
      return {
        evaluate(q, shape, d) {
          const invT = Math.exp(-(q[0] as number));
          const bt = q[1] as number;
          const lnL0 = q[2] as number;
          for (let i = 0; i < n; i++) {
            const o = 4 * i;
            const x = (cX[i] as number) * invT;
            const em = Math.expm1(x);
            const lnU = lnL0 + (lnInvL[i] as number);
            const tau = Math.exp(bt * lnU);
            if (em === Infinity) {
              shape[i] = 0;
              d[o] = 0;
              d[o + 1] = 0;
              d[o + 2] = 0;
              continue;
            }
            const b = (aC[i] as number) / em;
            const tb = (b * x * (em + 1)) / em;
            if (general) {
              const g = -Math.expm1(-tau);
              const dg = Math.exp(-tau) * tau; // ∂g/∂(β ln u)
              shape[i] = g * b;
              d[o] = g * tb;
              d[o + 1] = dg * lnU * b;
              d[o + 2] = dg * bt * b;
            } else {
              const s = tau * b;
              shape[i] = s;
              d[o] = tau * tb;
              d[o + 1] = s * lnU;
              d[o + 2] = s * bt;
            }
          }
        },
      };
    },
  };
}

/**
 * CCM89 extinction as a multiplicative attenuation with parameter
 * `extinctionAV` (mag, linear, [0, ∞), start `aV`).
 *
 * @param rV - R_V (default 3.1, > 0)
 * @param aV - start (or held) A_V, mag (default 0, ≥ 0)
 * @param fitAV - fit A_V (default true)
 * @example
 * ```ts
 * const ism = ccm89AttenuationSI(3.1);
 * ism.ratio(0.55e-6); // ≈ 1 (V band)
 * ```
 */
export function ccm89AttenuationSI(rV: number = RV_DIFFUSE_ISM, aV = 0, fitAV = true): AttenuationSI {
  requirePositive("extinction.rV", rV, "(dimensionless)");
  if (!(aV >= 0) || aV === Infinity) throw new RangeError(`extinction.aV must be a finite number >= 0 mag; got ${String(aV)}`);
  return {
    law: "ccm89",
    rV,
    parameter: { name: "extinctionAV", unit: "mag", transform: "linear", lower: 0, upper: Infinity, start: aV, fixed: !fitAV },
    ratio: (l) => ccm89RatioSI(l, rV),
  };
}

/**
 * Compose a model from terms (a sum of components, each optionally
 * attenuated; an attenuation shared by several terms is one parameter).
 *
 * @throws RangeError when two parameters end up with the same name (label the terms)
 * @example
 * ```ts
 * const ism = ccm89AttenuationSI(3.1);
 * const model = sedModelSI([
 *   { component: blackbodyComponentSI(), attenuation: ism, label: "star" },
 *   { component: modifiedBlackbodyComponentSI(), label: "dust" },
 * ]);
 * model.names; // ["star.temperatureK", "star.angularDiameterRad", "dust.temperatureK", …, "extinctionAV"]
 * ```
 */
export function sedModelSI(terms: readonly SedTermSI[]): SedModelSI {
  if (terms.length < 1) throw new RangeError("terms must contain at least one component; got 0");
  const params: ModelParameterSI[] = [];
  const names: string[] = [];
  for (const t of terms) {
    for (const p of t.component.parameters) {
      params.push(p);
      names.push(t.label === undefined ? p.name : `${t.label}.${p.name}`);
    }
  }
  const atts: AttenuationSI[] = [];
  for (const t of terms) if (t.attenuation !== undefined && !atts.includes(t.attenuation)) atts.push(t.attenuation);
  for (const a of atts) {
    params.push(a.parameter);
    names.push(atts.length === 1 ? a.parameter.name : `${a.parameter.name}${atts.indexOf(a) + 1}`);
  }
  if (new Set(names).size !== names.length) throw new RangeError(`model parameter names must be unique (label the terms); got ${names.join(", ")}`);
  return { terms, parameters: params, names };
}

/**
 * Prepare a model on channels: per-node constants and extinction ratios are
 * computed here, once. Allocation-free evaluation afterwards.
 *
 * @throws RangeError naming the channel when a node is outside an attenuation law's domain
 * @example
 * ```ts
 * const model = sedModelSI([{ component: blackbodyComponentSI() }]);
 * const prepared = prepareSedModelSI(model, [{ wavelengthsM: [5.5e-7], weights: [1] }]);
 * const means = new Float64Array(1);
 * prepared.evaluate([Math.log(5800), Math.log(1e-9)], means, new Float64Array(2));
 * ```
 */
export function prepareSedModelSI(model: SedModelSI, channels: readonly ModelChannelSI[]): PreparedSedModelSI {
  const nCh = channels.length;
  const np = model.parameters.length;
  const offs = new Int32Array(nCh + 1);
  let total = 0;
  for (let c = 0; c < nCh; c++) {
    offs[c] = total;
    total += (channels[c] as ModelChannelSI).wavelengthsM.length;
  }
  offs[nCh] = total;
  const lam = new Float64Array(total);
  const w = new Float64Array(total);
  for (let c = 0; c < nCh; c++) {
    const ch = channels[c] as ModelChannelSI;
    for (let i = 0; i < ch.wavelengthsM.length; i++) {
      lam[(offs[c] as number) + i] = ch.wavelengthsM[i] as number;
      w[(offs[c] as number) + i] = ch.weights[i] as number;
    }
  }
  const atts: AttenuationSI[] = [];
  for (const t of model.terms) if (t.attenuation !== undefined && !atts.includes(t.attenuation)) atts.push(t.attenuation);
  const kTab = atts.map((a) => {
    const k = new Float64Array(total);
    for (let c = 0; c < nCh; c++) {
      for (let i = offs[c] as number; i < (offs[c + 1] as number); i++) {
        if (!((w[i] as number) > 0)) continue;
        try {
          k[i] = a.ratio(lam[i] as number);
        } catch (e) {
          throw new RangeError(
            `channels[${c}] has a node at ${lam[i]} m, outside the CCM89 extinction law's domain [1e-7, 3.333e-6] m; ` +
              `trim the band or fit without extinction (${(e as Error).message})`,
          );
        }
      }
    }
    return k;
  });
  const attParamIndex = atts.map((_, j) => np - atts.length + j);
  const terms = model.terms.map((t, ti) => {
    let first = 0;
    for (let u = 0; u < ti; u++) first += (model.terms[u] as SedTermSI).component.parameters.length;
    const ncp = t.component.parameters.length;
    const att = t.attenuation === undefined ? -1 : atts.indexOf(t.attenuation);
    return {
      comp: t.component,
      first,
      ncp,
      att,
      ev: t.component.prepare(lam),
      shape: new Float64Array(total),
      d: new Float64Array(total * ncp),
      q: new Float64Array(ncp),
      s0: new Float64Array(nCh),
      ds: new Float64Array(nCh * ncp),
      sk: new Float64Array(nCh),
      we: new Float64Array(total),
      cachedAV: NaN,
    };
  });

  function termSums(ti: number, q: ArrayLike<number>, nodes: boolean): void {
    const t = terms[ti] as (typeof terms)[number];
    for (let a = 0; a < t.ncp; a++) t.q[a] = q[t.first + a] as number;
    if (nodes) t.ev.evaluate(t.q, t.shape, t.d);
    if (t.att >= 0) {
      const aV = q[attParamIndex[t.att] as number] as number;
      if (aV !== t.cachedAV) {
        const k = kTab[t.att] as Float64Array;
        for (let i = 0; i < total; i++) t.we[i] = (w[i] as number) * Math.exp(-K04 * aV * (k[i] as number));
        t.cachedAV = aV;
      }
    } else if (t.cachedAV !== 0) {
      t.we.set(w);
      t.cachedAV = 0;
    }
  }

  function evaluate(q: ArrayLike<number>, means: Float64Array, d: Float64Array): void {
    means.fill(0, 0, nCh);
    d.fill(0, 0, nCh * np);
    for (let ti = 0; ti < terms.length; ti++) {
      const t = terms[ti] as (typeof terms)[number];
      const acc = t.ev.accumulate;
      termSums(ti, q, acc === undefined);
      const ai = t.comp.amplitudeIndex;
      const amp = t.comp.amplitudeConstant * Math.exp(t.comp.amplitudePower * (q[t.first + ai] as number));
      const k = t.att >= 0 ? (kTab[t.att] as Float64Array) : null;
      const ncp = t.ncp;
      if (acc !== undefined) {
        acc.call(t.ev, t.q, t.we, k, offs, t.s0, t.ds, t.sk);
        for (let c = 0; c < nCh; c++) {
          const row = c * np + t.first;
          const m = amp * (t.s0[c] as number);
          means[c] = (means[c] as number) + m;
          for (let a = 0; a < ncp; a++) if (a !== ai) d[row + a] = amp * (t.ds[c * ncp + a] as number);
          d[row + ai] = t.comp.amplitudePower * m;
          if (k !== null) {
            const ja = c * np + (attParamIndex[t.att] as number);
            d[ja] = (d[ja] as number) - K04 * amp * (t.sk[c] as number);
          }
        }
        continue;
      }
      for (let c = 0; c < nCh; c++) {
        let s0 = 0;
        let s2 = 0;
        const end = offs[c + 1] as number;
        const row = c * np + t.first;
        for (let i = offs[c] as number; i < end; i++) {
          const wi = t.we[i] as number;
          const ws = wi * (t.shape[i] as number);
          s0 += ws;
          if (k !== null) s2 += ws * (k[i] as number);
          for (let a = 0; a < ncp; a++) if (a !== ai) d[row + a] = (d[row + a] as number) + wi * (t.d[i * ncp + a] as number);
        }
        const m = amp * s0;
        means[c] = (means[c] as number) + m;
        for (let a = 0; a < ncp; a++) if (a !== ai) d[row + a] = amp * (d[row + a] as number);
        d[row + ai] = t.comp.amplitudePower * m;
        if (k !== null) {
          const ja = c * np + (attParamIndex[t.att] as number);
          d[ja] = (d[ja] as number) - K04 * amp * s2;
        }
      }
    }
  }

  function termShapeMeans(ti: number, q: ArrayLike<number>, out: Float64Array): void {
    const t = terms[ti] as (typeof terms)[number];
    const acc = t.ev.accumulate;
    termSums(ti, q, acc === undefined);
    if (acc !== undefined) {
      acc.call(t.ev, t.q, t.we, null, offs, t.s0, t.ds, t.sk);
      for (let c = 0; c < nCh; c++) out[c] = t.comp.amplitudeConstant * (t.s0[c] as number);
      return;
    }
    for (let c = 0; c < nCh; c++) {
      let s0 = 0;
      const end = offs[c + 1] as number;
      for (let i = offs[c] as number; i < end; i++) s0 += (t.we[i] as number) * (t.shape[i] as number);
      out[c] = t.comp.amplitudeConstant * s0;
    }
  }

  return { model, channels: nCh, evaluate, termShapeMeans };
}

/**
 * The model's f_λ (W m⁻³) at each wavelength (a spectrum on a grid), from
 * natural parameter values in model order; the same evaluation as the fit's.
 *
 * @example
 * ```ts
 * const model = sedModelSI([{ component: blackbodyComponentSI() }]);
 * const f = sedSpectrumSI(model, [5800, 1e-9], [4e-7, 5e-7, 6e-7]);
 * ```
 */
export function sedSpectrumSI(model: SedModelSI, values: ArrayLike<number>, wavelengthsM: ArrayLike<number>): Float64Array {
  const n = wavelengthsM.length;
  const channels: ModelChannelSI[] = [];
  for (let i = 0; i < n; i++) channels.push({ wavelengthsM: [wavelengthsM[i] as number], weights: [1] });
  const prepared = prepareSedModelSI(model, channels);
  const q = model.parameters.map((p, a) => toInternal(p, values[a] as number));
  const out = new Float64Array(n);
  prepared.evaluate(q, out, new Float64Array(n * model.parameters.length));
  return out;
}
