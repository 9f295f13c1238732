/**
 * The one least-squares engine of the library: bounded Levenberg–Marquardt
 * on weighted residuals with an active set, the Cholesky solve it uses, the
 * covariance (JᵀJ)⁻¹ at the solution, and the χ² goodness of fit.
 *
 * ## Problem
 * Minimise χ²(p) = Σ rᵢ(p)², rᵢ = (yᵢ − mᵢ(p))/σᵢ, over p in a box
 * [lo, hi] (either end may be infinite). The caller's `evaluate` fills the
 * residuals rᵢ and the Jacobian Jᵢₐ = ∂mᵢ/∂pₐ / σᵢ (row-major, stride =
 * number of parameters) and returns χ² (Infinity when not finite).
 *
 * ## Step
 * Marquardt damping (Marquardt 1963, SIAM J. Appl. Math. 11, 431):
 * (H + λ diag H) δ = g with H = JᵀJ, g = Jᵀr (a zero diagonal gets λ), λ₀ =
 * 1e-3, ÷10 (floor 1e-12) on an accepted step, ×10 on a rejected one. A held
 * parameter (not fitted) never moves; a fitted parameter sitting on a bound
 * whose gradient points outward is held for that iteration (active set); the
 * trial point is projected onto the box.
 *
 * ## Stop
 * With |Δ| the largest change of any parameter in the trial step:
 * "step" when |Δ| ≤ stepTolerance (accepted, or rejected: no decrease
 * possible at the χ² floor of rounding); "chi2" when an accepted step lowered
 * χ² by ≤ chi2Tolerance × χ² while λ ≤ 1 (a near-Gauss–Newton step);
 * "exact" when χ² = 0; otherwise "maxIterations" or "stalled" (λ > 1e16).
 *
 * ## Linear algebra
 * Cholesky factorisation H = LLᵀ in place (Golub & Van Loan, Matrix
 * Computations, §4.2); a pivot within 64 ulp of the diagonal it came from is
 * rounding noise of a rank-deficient H and counts as singular. The
 * covariance of the fitted parameters is H⁻¹ column by column through the
 * same solve (not rescaled by χ²/dof).
 *
 * Allocation: a solver allocates its work arrays once for a maximum size;
 * an iteration allocates nothing.
 *
 * @module
 */

/** Why the iteration stopped. */
export type StopReason = "step" | "chi2" | "exact" | "maxIterations" | "stalled";

/** What the engine needs from a problem. */
export interface LeastSquaresProblem {
  /** Number of residuals. */
  readonly residuals: number;
  /** Number of parameters (held ones included). */
  readonly parameters: number;
  /**
   * Fill r (length `residuals`) and J (row-major, `residuals × parameters`) at p;
   * return χ² = Σ r² (Infinity when not finite).
   */
  evaluate(p: Float64Array, r: Float64Array, J: Float64Array): number;
}

/** Engine settings. */
export interface LeastSquaresSettings {
  /** Maximum trial steps (default 200). */
  readonly maxIterations?: number;
  /** Step threshold on max |Δpₐ| (default 1e-10). */
  readonly stepTolerance?: number;
  /** Relative χ² change threshold (default 1e-12). */
  readonly chi2Tolerance?: number;
}

/** The state after a solve; arrays are the solver's own (copy what you keep). */
export interface LeastSquaresOutcome {
  /** Parameters at the solution. */
  readonly p: Float64Array;
  /** Residuals at the solution. */
  readonly r: Float64Array;
  /** Jacobian at the solution (row-major). */
  readonly J: Float64Array;
  /** χ² at the solution. */
  readonly chi2: number;
  /** Trial steps taken. */
  readonly iterations: number;
  /** Why it stopped. */
  readonly stop: StopReason;
}

/** A reusable solver for problems up to a given size. */
export interface LeastSquaresSolver {
  /**
   * Minimise from p0 with `fitted[a]` = 1 for the free parameters; bounds in the
   * parameters' own (internal) coordinates.
   * @throws RangeError when χ² is not finite at p0
   */
  solve(
    problem: LeastSquaresProblem,
    p0: ArrayLike<number>,
    fitted: ArrayLike<number>,
    lower: ArrayLike<number>,
    upper: ArrayLike<number>,
  ): LeastSquaresOutcome;
  /**
   * (JᵀJ)⁻¹ over the fitted parameters (in their order) from the last solve's
   * Jacobian, as rows; null when not positive definite.
   */
  covariance(fitted: ArrayLike<number>): number[][] | null;
}

/**
 * Cholesky solve of the k×k symmetric system in `A` (row-major, stride
 * `stride`, overwritten by its lower factor) with right-hand side `b`; the
 * solution is written to `x`. Returns false when A is not positive definite
 * (a pivot ≤ 64 ulp of its diagonal).
 *
 * @example
 * ```ts
 * const A = new Float64Array([4, 2, 2, 3]);
 * const x = new Float64Array(2);
 * choleskySolveInPlace(A, 2, 2, new Float64Array([2, 1]), x); // x = [0.5, 0]
 * ```
 */
export function choleskySolveInPlace(A: Float64Array, k: number, stride: number, b: ArrayLike<number>, x: Float64Array): boolean {
  for (let i = 0; i < k; i++) {
    for (let j = 0; j <= i; j++) {
      let sum = A[i * stride + j] as number;
      for (let m = 0; m < j; m++) sum -= (A[i * stride + m] as number) * (A[j * stride + m] as number);
      if (i === j) {
        if (!(sum > 64 * Number.EPSILON * (A[i * stride + i] as number)) || !Number.isFinite(sum)) return false;
        A[i * stride + i] = Math.sqrt(sum);
      } else {
        A[i * stride + j] = sum / (A[j * stride + j] as number);
      }
    }
  }
  for (let i = 0; i < k; i++) {
    let sum = b[i] as number;
    for (let m = 0; m < i; m++) sum -= (A[i * stride + m] as number) * (x[m] as number);
    x[i] = sum / (A[i * stride + i] as number);
  }
  for (let i = k - 1; i >= 0; i--) {
    let sum = x[i] as number;
    for (let m = i + 1; m < k; m++) sum -= (A[m * stride + i] as number) * (x[m] as number);
    x[i] = sum / (A[i * stride + i] as number);
  }
  return true;
}

/**
 * Inverse of a symmetric positive-definite n×n matrix (rows), column by
 * column through {@link choleskySolveInPlace}; null when not positive definite.
 *
 * @example
 * ```ts
 * symmetricInverse([[4, 2], [2, 3]]); // [[0.375, -0.25], [-0.25, 0.5]]
 * ```
 */
export function symmetricInverse(m: readonly (readonly number[])[]): number[][] | null {
  const n = m.length;
  const A = new Float64Array(n * n);
  const b = new Float64Array(n);
  const x = new Float64Array(n);
  const cols: number[][] = [];
  for (let col = 0; col < n; col++) {
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) A[i * n + j] = m[i]?.[j] as number;
    b.fill(0);
    b[col] = 1;
    if (!choleskySolveInPlace(A, n, n, b, x)) return null;
    cols.push(Array.from(x));
  }
  return cols.map((_, i) => cols.map((c) => c[i] as number));
}

/**
 * Build a solver for at most `maxResiduals` residuals and `maxParameters` parameters.
 *
 * @param maxResiduals - ≥ 1
 * @param maxParameters - ≥ 1
 * @param settings - iteration limits and tolerances
 * @throws RangeError naming a bad setting
 * @example
 * ```ts
 * // fit y = a·x to (1, 2), (2, 4.1)
 * const xs = [1, 2];
 * const ys = [2, 4.1];
 * const solver = createLeastSquaresSolver(2, 1);
 * const out = solver.solve(
 *   { residuals: 2, parameters: 1, evaluate(p, r, J) {
 *       let c = 0;
 *       for (let i = 0; i < 2; i++) { r[i] = ys[i]! - p[0]! * xs[i]!; J[i] = xs[i]!; c += r[i]! * r[i]!; }
 *       return c;
 *     } },
 *   [1], [1], [-Infinity], [Infinity],
 * );
 * out.p[0]; // 2.04
 * ```
 */
export function createLeastSquaresSolver(maxResiduals: number, maxParameters: number, settings: LeastSquaresSettings = {}): LeastSquaresSolver {
  const maxIter = settings.maxIterations ?? 200;
  if (!Number.isInteger(maxIter) || maxIter < 1) throw new RangeError(`maxIterations must be an integer >= 1; got ${String(maxIter)}`);
  const xtol = settings.stepTolerance ?? 1e-10;
  if (!(xtol > 0) || xtol === Infinity) throw new RangeError(`stepTolerance must be a finite number > 0 (dimensionless); got ${String(xtol)}`);
  const ftol = settings.chi2Tolerance ?? 1e-12;
  if (!(ftol > 0) || ftol === Infinity) throw new RangeError(`chi2Tolerance must be a finite number > 0 (dimensionless); got ${String(ftol)}`);
  const nR = maxResiduals;
  const nP = maxParameters;
  let r = new Float64Array(nR);
  let rT = new Float64Array(nR);
  let J = new Float64Array(nR * nP);
  let JT = new Float64Array(nR * nP);
  const H = new Float64Array(nP * nP);
  const A = new Float64Array(nP * nP);
  const g = new Float64Array(nP);
  const b = new Float64Array(nP);
  const z = new Float64Array(nP);
  const delta = new Float64Array(nP);
  const p = new Float64Array(nP);
  const pt = new Float64Array(nP);
  const idx = new Int32Array(nP);
  let lastN = 0;
  let lastNp = 0;

  function normal(n: number, np: number): void {
    for (let a = 0; a < np; a++) {
      let ga = 0;
      for (let c = 0; c < n; c++) ga += (J[np * c + a] as number) * (r[c] as number);
      g[a] = ga;
      for (let bb = 0; bb <= a; bb++) {
        let h = 0;
        for (let c = 0; c < n; c++) h += (J[np * c + a] as number) * (J[np * c + bb] as number);
        H[a * np + bb] = h;
        H[bb * np + a] = h;
      }
    }
  }

  function solve(
    problem: LeastSquaresProblem,
    p0: ArrayLike<number>,
    fitted: ArrayLike<number>,
    lower: ArrayLike<number>,
    upper: ArrayLike<number>,
  ): LeastSquaresOutcome {
    const n = problem.residuals;
    const np = problem.parameters;
    if (n > nR || np > nP) throw new RangeError(`problem size ${n} × ${np} exceeds the solver's ${nR} × ${nP}`);
    lastN = n;
    lastNp = np;
    for (let a = 0; a < np; a++) p[a] = p0[a] as number;
    const pv = p.subarray(0, np);
    const ptv = pt.subarray(0, np);
    let chi2 = problem.evaluate(pv, r, J);
    if (chi2 === Infinity) throw new RangeError("observations: the model is not finite at the starting point");
    let lambda = 1e-3;
    let iterations = 0;
    let stop: StopReason = "maxIterations";
    if (chi2 === 0) stop = "exact";
    while (stop === "maxIterations" && iterations < maxIter) {
      normal(n, np);
      let k = 0;
      for (let a = 0; a < np; a++) {
        if (fitted[a] !== 1) continue;
        const pa = p[a] as number;
        const ga = g[a] as number;
        if ((pa <= (lower[a] as number) && ga <= 0) || (pa >= (upper[a] as number) && ga >= 0)) continue;
        idx[k++] = a;
      }
      for (let i = 0; i < k; i++) {
        const ai = idx[i] as number;
        b[i] = g[ai] as number;
        for (let j = 0; j < k; j++) {
          const h = H[ai * np + (idx[j] as number)] as number;
          A[i * k + j] = i === j ? h * (1 + lambda) + (h === 0 ? lambda : 0) : h;
        }
      }
      iterations++;
      if (!choleskySolveInPlace(A, k, k, b, z)) {
        lambda *= 10;
        if (lambda > 1e16) {
          stop = "stalled";
          break;
        }
        continue;
      }
      delta.fill(0);
      for (let i = 0; i < k; i++) delta[idx[i] as number] = z[i] as number;
      let step = 0;
      for (let a = 0; a < np; a++) {
        let t = (p[a] as number) + (delta[a] as number);
        if (t < (lower[a] as number)) t = lower[a] as number;
        if (t > (upper[a] as number)) t = upper[a] as number;
        pt[a] = t;
        const d = Math.abs(t - (p[a] as number));
        if (d > step) step = d;
      }
      const chiT = problem.evaluate(ptv, rT, JT);
      if (chiT < chi2) {
        const rel = (chi2 - chiT) / chiT;
        const usedLambda = lambda;
        for (let a = 0; a < np; a++) p[a] = pt[a] as number;
        chi2 = chiT;
        let t = r;
        r = rT;
        rT = t;
        t = J;
        J = JT;
        JT = t;
        if (chi2 === 0) stop = "exact";
        else if (step <= xtol) stop = "step";
        else if (rel <= ftol && usedLambda <= 1) stop = "chi2";
        lambda = Math.max(lambda / 10, 1e-12);
      } else {
        if (step <= xtol) {
          stop = "step";
          break;
        }
        lambda *= 10;
        if (lambda > 1e16) {
          stop = "stalled";
          break;
        }
      }
    }
    return { p: pv, r: r.subarray(0, n), J: J.subarray(0, n * np), chi2, iterations, stop };
  }

  function covariance(fitted: ArrayLike<number>): number[][] | null {
    const n = lastN;
    const np = lastNp;
    let k = 0;
    for (let a = 0; a < np; a++) if (fitted[a] === 1) idx[k++] = a;
    const cols: number[][] = [];
    for (let col = 0; col < k; col++) {
      for (let i = 0; i < k; i++) {
        const ai = idx[i] as number;
        for (let j = 0; j < k; j++) {
          const aj = idx[j] as number;
          let h = 0;
          for (let c = 0; c < n; c++) h += (J[np * c + ai] as number) * (J[np * c + aj] as number);
          A[i * k + j] = h;
        }
        b[i] = i === col ? 1 : 0;
      }
      if (!choleskySolveInPlace(A, k, k, b, z)) return null;
      cols.push(Array.from(z.subarray(0, k)));
    }
    return cols.map((_, i) => cols.map((c) => c[i] as number));
  }

  return { solve, covariance };
}
