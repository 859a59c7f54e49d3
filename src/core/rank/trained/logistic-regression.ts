/**
 * L2-regularised (binary) logistic regression, the two-class maximum-entropy model: for a sentence
 * with feature vector x, P(summary | x) = σ(b + w·x), σ(z) = 1 / (1 + e^(−z)). Training minimises
 * the penalised negative log-likelihood
 *     J(w, b) = −Σ_i [ y_i z_i − log(1 + e^(z_i)) ] + (λ/2) ‖w‖²,    z_i = b + w·x_i,
 * whose gradient is Σ_i (σ(z_i) − y_i) x_i + λ w and Hessian Σ_i σ(z_i)(1 − σ(z_i)) x_i x_iᵀ + λ I
 * (the bias b is not penalised). The L2 penalty is a Gaussian prior on the weights, which Osborne
 * (2002) found necessary for maximum-entropy sentence extraction; it also makes J strictly convex
 * when one-hot groups and the bias are collinear.
 *
 * J is minimised by Newton's method with a backtracking line search (common practice, no source):
 * with about a hundred weights the Hessian is small and a handful of steps reach the optimum.
 * Rows are sparse: the indices of their non-zero features, with values (1 when omitted).
 */

export interface SparseRow {
  readonly indices: readonly number[] | Int32Array;
  /** Feature values; all 1 (indicators) when absent. */
  readonly values?: readonly number[] | Float64Array;
}

export interface LogisticProblem {
  readonly rows: readonly SparseRow[];
  /** 1 positive, 0 negative, one per row. */
  readonly labels: ArrayLike<number>;
  /** Number of weights (columns); the bias comes in addition. */
  readonly dimension: number;
  /** λ of the L2 penalty (≥ 0). */
  readonly lambda: number;
}

export interface LogisticFit {
  readonly weights: Float64Array;
  readonly bias: number;
  /** J at the solution. */
  readonly objective: number;
  readonly iterations: number;
  /** Largest absolute gradient entry at the solution. */
  readonly gradientNorm: number;
  readonly converged: boolean;
}

export const LOGISTIC_DEFAULTS = { maxIterations: 50, tolerance: 1e-8 } as const;

function linear(row: SparseRow, weights: ArrayLike<number>, bias: number): number {
  let z = bias;
  const { indices, values } = row;
  for (let k = 0; k < indices.length; k++) z += weights[indices[k]!]! * (values ? values[k]! : 1);
  return z;
}

/** log(1 + e^z) without overflow. */
function softplus(z: number): number {
  return z > 0 ? z + Math.log1p(Math.exp(-z)) : Math.log1p(Math.exp(z));
}

export function sigmoid(z: number): number {
  return z >= 0 ? 1 / (1 + Math.exp(-z)) : Math.exp(z) / (1 + Math.exp(z));
}

/** J(w, b): the penalised negative log-likelihood. */
export function objective(problem: LogisticProblem, weights: ArrayLike<number>, bias: number): number {
  let total = 0;
  problem.rows.forEach((row, i) => {
    const z = linear(row, weights, bias);
    total += softplus(z) - problem.labels[i]! * z;
  });
  let squares = 0;
  for (let j = 0; j < problem.dimension; j++) squares += weights[j]! ** 2;
  return total + (problem.lambda / 2) * squares;
}

/** ∂J/∂w (entries 0..dimension-1) and ∂J/∂b (the last entry). */
export function gradient(problem: LogisticProblem, weights: ArrayLike<number>, bias: number): Float64Array {
  const d = problem.dimension;
  const g = new Float64Array(d + 1);
  problem.rows.forEach((row, i) => {
    const residual = sigmoid(linear(row, weights, bias)) - problem.labels[i]!;
    const { indices, values } = row;
    for (let k = 0; k < indices.length; k++) g[indices[k]!]! += residual * (values ? values[k]! : 1);
    g[d]! += residual;
  });
  for (let j = 0; j < d; j++) g[j]! += problem.lambda * weights[j]!;
  return g;
}

/** The Hessian of J, (d+1)×(d+1) row-major, bias last. */
export function hessian(problem: LogisticProblem, weights: ArrayLike<number>, bias: number): Float64Array {
  const d = problem.dimension;
  const size = d + 1;
  const h = new Float64Array(size * size);
  problem.rows.forEach((row) => {
    const p = sigmoid(linear(row, weights, bias));
    const s = p * (1 - p);
    if (s === 0) return;
    const { indices, values } = row;
    const n = indices.length;
    for (let a = 0; a <= n; a++) {
      const ia = a < n ? indices[a]! : d;
      const va = a < n ? (values ? values[a]! : 1) : 1;
      for (let b = 0; b <= n; b++) {
        const ib = b < n ? indices[b]! : d;
        const vb = b < n ? (values ? values[b]! : 1) : 1;
        h[ia * size + ib]! += s * va * vb;
      }
    }
  });
  for (let j = 0; j < d; j++) h[j * size + j]! += problem.lambda;
  return h;
}

/** Solves H x = g for a symmetric positive definite H by Cholesky decomposition; null when H is not positive definite. */
export function solveSymmetric(h: Float64Array, g: Float64Array): Float64Array | null {
  const n = g.length;
  const l = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let sum = h[i * n + j]!;
      for (let k = 0; k < j; k++) sum -= l[i * n + k]! * l[j * n + k]!;
      if (i === j) {
        if (!(sum > 0)) return null;
        l[i * n + i] = Math.sqrt(sum);
      } else l[i * n + j] = sum / l[j * n + j]!;
    }
  }
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let sum = g[i]!;
    for (let k = 0; k < i; k++) sum -= l[i * n + k]! * y[k]!;
    y[i] = sum / l[i * n + i]!;
  }
  const x = new Float64Array(n);
  for (let i = n - 1; i >= 0; i--) {
    let sum = y[i]!;
    for (let k = i + 1; k < n; k++) sum -= l[k * n + i]! * x[k]!;
    x[i] = sum / l[i * n + i]!;
  }
  return x;
}

const maxAbs = (values: Float64Array) => values.reduce((m, v) => Math.max(m, Math.abs(v)), 0);

/** Minimises J by damped Newton steps from w = 0, b = 0. */
export function fitLogistic(problem: LogisticProblem, settings: { maxIterations?: number; tolerance?: number } = {}): LogisticFit {
  if (problem.rows.length !== problem.labels.length) throw new RangeError('one label per row is needed');
  if (!(problem.lambda >= 0) || !Number.isFinite(problem.lambda)) throw new RangeError('λ must be a finite number of at least 0');
  const maxIterations = settings.maxIterations ?? LOGISTIC_DEFAULTS.maxIterations;
  const tolerance = settings.tolerance ?? LOGISTIC_DEFAULTS.tolerance;
  const d = problem.dimension;
  let weights: Float64Array = new Float64Array(d);
  let bias = 0;
  let current = objective(problem, weights, bias);
  let g = gradient(problem, weights, bias);
  let iterations = 0;
  // Scale the stopping rule by the number of rows, so it means the same for small and large corpora.
  const scale = Math.max(1, problem.rows.length);
  while (iterations < maxIterations && maxAbs(g) > tolerance * scale) {
    const step = solveSymmetric(hessian(problem, weights, bias), g);
    if (step === null) throw new RangeError('the Hessian is not positive definite: give λ > 0 when features are collinear');
    let t = 1;
    let next: Float64Array;
    let nextBias: number;
    let value: number;
    // Backtracking (Armijo) line search: halve the step until J decreases enough.
    const decrease = g.reduce((sum, gi, k) => sum + gi * step[k]!, 0);
    for (;;) {
      next = weights.map((w, j) => w - t * step[j]!);
      nextBias = bias - t * step[d]!;
      value = objective(problem, next, nextBias);
      if (value <= current - 1e-4 * t * decrease || t < 1e-10) break;
      t /= 2;
    }
    iterations++;
    const converged = current - value <= 1e-15 * Math.max(1, Math.abs(current));
    weights = next;
    bias = nextBias;
    current = value;
    g = gradient(problem, weights, bias);
    if (converged) break;
  }
  const gradientNorm = maxAbs(g);
  return { weights, bias, objective: current, iterations, gradientNorm, converged: gradientNorm <= tolerance * scale };
}
