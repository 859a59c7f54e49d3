/**
 * L2-regularised logistic regression (src/core/rank/trained/logistic-regression.ts), checked
 * against its published definition and outside results:
 *  - a published fit: the Space Shuttle O-ring data (23 launches before the Challenger accident,
 *    S. R. Dalal, E. B. Fowlkes and B. Hoadley, "Risk Analysis of the Space Shuttle: Pre-Challenger
 *    Prediction of Failure", JASA 84(408), 1989), whose maximum-likelihood logistic fit of "any
 *    O-ring incident" on launch temperature is intercept 15.043, slope −0.2322 per °F (from memory;
 *    the same figures are printed in many textbooks' worked examples);
 *  - a closed form: for indicator features of one categorical variable, the maximum-likelihood fit
 *    reproduces each category's observed log-odds (the saturated logit model; A. Agresti,
 *    "Categorical Data Analysis", 2nd ed., 2002, ch. 5, from memory);
 *  - the gradient and Hessian against central finite differences of the objective as published
 *    (common practice, no source), and the L2 optimum's stationarity condition Σ (σ − y) x + λ w = 0.
 */
import assert from 'node:assert/strict';
import { fitLogistic, gradient, hessian, objective, sigmoid, solveSymmetric, type LogisticProblem } from '../../src/core/rank/trained/logistic-regression';

// Dalal et al. (1989), table 1: launch temperature (°F) and whether any O-ring incident occurred.
const TEMPERATURES = [66, 70, 69, 68, 67, 72, 73, 70, 57, 63, 70, 78, 67, 53, 67, 75, 70, 81, 76, 79, 75, 76, 58];
const INCIDENT = [0, 1, 0, 0, 0, 0, 0, 0, 1, 1, 1, 0, 0, 1, 0, 0, 0, 0, 0, 0, 1, 0, 1];

const oRing = (lambda: number): LogisticProblem => ({
  rows: TEMPERATURES.map((t) => ({ indices: [0], values: [t] })),
  labels: INCIDENT,
  dimension: 1,
  lambda,
});

describe('rank: logistic regression (the maximum-entropy model)', () => {
  it('reproduces the published maximum-likelihood fit of the O-ring data (Dalal, Fowlkes & Hoadley 1989)', () => {
    const fit = fitLogistic(oRing(0));
    assert.ok(fit.converged);
    assert.ok(Math.abs(fit.bias - 15.043) < 0.001, `intercept ${fit.bias}`);
    assert.ok(Math.abs(fit.weights[0]! - -0.2322) < 0.0001, `slope ${fit.weights[0]}`);
  });

  it('reproduces each category’s observed log-odds with indicator features (saturated model, Agresti 2002)', () => {
    // Three categories with 3/10, 1/8 and 6/9 positives; one indicator each, plus the bias.
    const cells = [
      { positive: 3, total: 10 },
      { positive: 1, total: 8 },
      { positive: 6, total: 9 },
    ];
    const rows: { indices: number[] }[] = [];
    const labels: number[] = [];
    cells.forEach((cell, c) => {
      for (let k = 0; k < cell.total; k++) {
        rows.push({ indices: [c] });
        labels.push(k < cell.positive ? 1 : 0);
      }
    });
    // λ tiny: the bias and the indicators are collinear, so only the fitted probabilities are unique.
    const fit = fitLogistic({ rows, labels, dimension: 3, lambda: 1e-9 }, { tolerance: 1e-12 });
    cells.forEach((cell, c) => {
      const logOdds = Math.log(cell.positive / (cell.total - cell.positive));
      assert.ok(Math.abs(fit.bias + fit.weights[c]! - logOdds) < 1e-5, `category ${c}: ${fit.bias + fit.weights[c]!} vs ${logOdds}`);
    });
  });

  it('meets the L2 optimum’s stationarity condition Σ (σ(z) − y) x + λ w = 0, and shrinks weights as λ grows', () => {
    const problem: LogisticProblem = {
      rows: [
        { indices: [0, 2] }, { indices: [0, 3] }, { indices: [1, 2] }, { indices: [1, 3] }, { indices: [0, 2] },
        { indices: [1, 3] }, { indices: [0, 3] }, { indices: [1, 2] },
      ],
      labels: [1, 0, 1, 0, 1, 1, 0, 0],
      dimension: 4,
      lambda: 0.5,
    };
    const fit = fitLogistic(problem);
    // The condition written out from the definition, independently of gradient().
    for (let j = 0; j < 4; j++) {
      let sum = problem.lambda * fit.weights[j]!;
      problem.rows.forEach((row, i) => {
        const indices = Array.from(row.indices);
        const z = fit.bias + indices.reduce((s, k) => s + fit.weights[k]!, 0);
        if (indices.includes(j)) sum += 1 / (1 + Math.exp(-z)) - problem.labels[i]!;
      });
      assert.ok(Math.abs(sum) < 1e-8, `∂J/∂w${j} = ${sum}`);
    }
    const strong = fitLogistic({ ...problem, lambda: 5 });
    const norm = (w: Float64Array) => Math.hypot(...w);
    assert.ok(norm(strong.weights) < norm(fit.weights));
  });

  it('has the gradient and Hessian of its objective (central finite differences)', () => {
    const problem = { ...oRing(0.3), rows: TEMPERATURES.map((t) => ({ indices: [0, 1], values: [t / 80, t % 2] })), dimension: 2 };
    const w = [0.4, -0.7];
    const b = 0.2;
    const h = 1e-6;
    const g = gradient(problem, w, b);
    const H = hessian(problem, w, b);
    const params = [...w, b];
    const at = (p: number[]) => objective(problem, p.slice(0, 2), p[2]!);
    const grad = (p: number[]) => gradient(problem, p.slice(0, 2), p[2]!);
    for (let k = 0; k < 3; k++) {
      const up = [...params];
      const down = [...params];
      up[k]! += h;
      down[k]! -= h;
      const numeric = (at(up) - at(down)) / (2 * h);
      assert.ok(Math.abs(numeric - g[k]!) < 1e-5, `gradient ${k}: ${numeric} vs ${g[k]}`);
      const gu = grad(up);
      const gd = grad(down);
      for (let m = 0; m < 3; m++) {
        const second = (gu[m]! - gd[m]!) / (2 * h);
        assert.ok(Math.abs(second - H[m * 3 + k]!) < 1e-4, `Hessian ${m},${k}: ${second} vs ${H[m * 3 + k]}`);
      }
    }
  });

  it('solves a symmetric positive definite system and refuses one that is not', () => {
    // [[4, 2], [2, 3]] x = [2, 1] → x = [0.5, 0] (by hand).
    const x = solveSymmetric(Float64Array.from([4, 2, 2, 3]), Float64Array.from([2, 1]))!;
    assert.ok(Math.abs(x[0]! - 0.5) < 1e-12 && Math.abs(x[1]!) < 1e-12);
    assert.equal(solveSymmetric(Float64Array.from([1, 2, 2, 1]), Float64Array.from([1, 1])), null);
  });

  it('keeps σ finite at extreme inputs and refuses a malformed problem', () => {
    assert.equal(sigmoid(-1000), 0);
    assert.equal(sigmoid(1000), 1);
    assert.ok(Number.isFinite(objective(oRing(0), [-50], 0)));
    assert.throws(() => fitLogistic({ rows: [{ indices: [0] }], labels: [1, 0], dimension: 1, lambda: 1 }), /one label per row/);
    assert.throws(() => fitLogistic({ rows: [{ indices: [0] }], labels: [1], dimension: 1, lambda: -1 }), /λ must be/);
  });
});
