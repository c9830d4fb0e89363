import { readFileSync } from 'node:fs';
import normal from '@stdlib/random-base-normal';
import { inv, multiply, transpose } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { fitOls, newRowLeverage, type OlsFit } from './regression';

// NIST Statistical Reference Datasets (StRD), Information Technology Laboratory, Statistical
// Engineering Division: linear regression datasets with certified values. The CSVs are copied
// from xKDR/NISTTests.jl (MIT licence); see tests/reference/nist-strd/README.md.
function readNist(name: string): { x: number[][]; y: number[] } {
  const url = new URL(`../../../tests/reference/nist-strd/${name}`, import.meta.url);
  const rows = readFileSync(url, 'utf8')
    .trim()
    .split('\n')
    .slice(1)
    .map((line) => line.split(',').map(Number));
  return { x: rows.map((r) => r.slice(1)), y: rows.map((r) => r[0]!) };
}

const relative = (got: number, want: number) => Math.abs(got - want) / Math.abs(want);
const maxRelative = (got: readonly number[], want: readonly number[]) =>
  Math.max(...want.map((w, i) => relative(got[i]!, w)));

function fitted(x: number[][], y: number[]): OlsFit {
  const fit = fitOls(x, y);
  if (!fit.enough) throw new Error(fit.reason);
  return fit;
}

// Householder QR reaches about 2e-12 relative on Norris (the intercept, the weakest figure) and
// 3.4e-13 on Longley here; we assert 1e-11 on both, beyond the 1e-10 and 1e-8 a sound QR or SVD
// method is expected to reach.
const NIST_TOLERANCE = 1e-11;

describe('fitOls on NIST StRD Norris (certified values)', () => {
  const fit = fitted(readNist('norris.csv').x, readNist('norris.csv').y);
  it('matches the certified coefficients and standard deviations', () => {
    expect(fit.n).toBe(36);
    expect(maxRelative(fit.coefficients, [-0.262323073774029, 1.00211681802045])).toBeLessThan(NIST_TOLERANCE);
    expect(maxRelative(fit.standardErrors, [0.232818234301152, 4.29796848199937e-4])).toBeLessThan(NIST_TOLERANCE);
  });
  it('matches the certified residual standard deviation and R²', () => {
    expect(relative(fit.residualStandardError, 0.884796396144373)).toBeLessThan(NIST_TOLERANCE);
    expect(relative(fit.r2, 0.999993745883712)).toBeLessThan(NIST_TOLERANCE);
    expect(fit.df).toBe(34);
  });
});

describe('fitOls on NIST StRD Longley (certified values)', () => {
  const { x, y } = readNist('longley.csv');
  const fit = fitted(x, y);
  it('matches the certified coefficients and standard deviations', () => {
    const certified = [
      -3482258.63459582, 15.0618722713733, -0.35819179292591e-1, -2.02022980381683, -1.03322686717359,
      -0.511041056535807e-1, 1829.15146461355,
    ];
    const certifiedSd = [
      890420.383607373, 84.9149257747669, 0.334910077722432e-1, 0.488399681651699, 0.214274163161675, 0.22607320006937,
      455.478499142212,
    ];
    expect(maxRelative(fit.coefficients, certified)).toBeLessThan(NIST_TOLERANCE);
    expect(maxRelative(fit.standardErrors, certifiedSd)).toBeLessThan(NIST_TOLERANCE);
  });
  it('matches the certified residual standard deviation, R² and degrees of freedom', () => {
    expect(relative(fit.residualStandardError, 304.854073561965)).toBeLessThan(NIST_TOLERANCE);
    expect(relative(fit.r2, 0.995479004577296)).toBeLessThan(NIST_TOLERANCE);
    expect(fit.df).toBe(9);
  });
  it('is a check naive normal equations fail (so the tolerance has teeth)', () => {
    // Longley is of higher difficulty in the NIST StRD: forming and inverting X'X squares its
    // condition number. mathjs doing so reaches only about 6e-9 on the intercept here, hundreds
    // of times our tolerance.
    const X = x.map((row) => [1, ...row]);
    const Xt = transpose(X);
    const naive = multiply(multiply(inv(multiply(Xt, X)), Xt), y) as number[];
    expect(relative(naive[0]!, -3482258.63459582)).toBeGreaterThan(NIST_TOLERANCE);
  });
});

describe('fitOls against mathjs on seeded random data', () => {
  // A second, independent general-purpose library: mathjs solves the normal equations
  // β = (X'X)⁻¹ X'y, which is accurate on well-conditioned random data.
  const z = normal.factory(0, 1, { seed: 20_261 });
  const x = Array.from({ length: 200 }, () => [10 + 3 * z(), 5 * z(), 100 + 20 * z()]);
  const y = x.map(([a, b, c]) => 7 + 2 * a! - 0.5 * b! + 0.03 * c! + z());
  const fit = fitted(x, y);
  const X = x.map((row) => [1, ...row]);
  const Xt = transpose(X);
  const xtxInverse = inv(multiply(Xt, X)) as number[][];
  const beta = multiply(multiply(xtxInverse, Xt), y) as number[];

  it('agrees on the coefficients and their standard errors', () => {
    expect(maxRelative(fit.coefficients, beta)).toBeLessThan(1e-9);
    const residuals = y.map((v, i) => v - (multiply(X[i]!, beta) as number));
    const s2 = residuals.reduce((sum, e) => sum + e * e, 0) / (200 - 4);
    expect(
      maxRelative(
        fit.standardErrors,
        xtxInverse.map((row, j) => Math.sqrt(s2 * row[j]!)),
      ),
    ).toBeLessThan(1e-9);
    expect(relative(fit.residualStandardError, Math.sqrt(s2))).toBeLessThan(1e-9);
  });

  it("agrees on x0' (X'X)⁻¹ x0 for a new row and on the leverages", () => {
    const x0 = [11, -2, 90];
    const want = multiply(multiply([1, ...x0], xtxInverse), [1, ...x0]) as number;
    expect(relative(newRowLeverage(fit, x0), want)).toBeLessThan(1e-9);
    expect(relative(fit.leverages[3]!, multiply(multiply(X[3]!, xtxInverse), X[3]!) as number)).toBeLessThan(1e-9);
    // Arithmetic: the leverages add up to the number of coefficients (the trace of the hat matrix).
    expect(fit.leverages.reduce((a, b) => a + b, 0)).toBeCloseTo(4, 10);
  });
});

describe('fitOls with too little or degenerate data', () => {
  it('says how many observations it needs', () => {
    expect(fitOls([[1], [2]], [1, 2])).toEqual({
      enough: false,
      reason: expect.stringContaining('at least 3'),
      needed: 3,
    });
    expect(fitOls([], [])).toMatchObject({ enough: false, needed: 2 });
  });
  it('refuses a constant or collinear predictor', () => {
    expect(fitOls([[5], [5], [5], [5]], [1, 2, 3, 4])).toMatchObject({
      enough: false,
      reason: expect.stringContaining('degenerate'),
    });
    expect(
      fitOls(
        [
          [1, 2],
          [2, 4],
          [3, 6],
          [4, 8],
          [5, 10],
        ],
        [1, 3, 2, 5, 4],
      ),
    ).toMatchObject({ enough: false, reason: expect.stringContaining('predictor 2') });
  });
  it('refuses malformed input with a clear error', () => {
    expect(() => fitOls([[1], [2]], [1])).toThrow(/2 rows of predictors for 1 responses/);
    expect(() => fitOls([[1], [2, 3], [4]], [1, 2, 3])).toThrow(/Row 1 has 2 predictors/);
    expect(() => fitOls([[1], [Number.NaN], [4]], [1, 2, 3])).toThrow(/not a finite number/);
    expect(() => fitOls([[1], [2], [4]], [1, Infinity, 3])).toThrow(/response is not a finite number/);
    const fit = fitted([[1], [2], [4]], [1, 2, 3]);
    expect(() => newRowLeverage(fit, [1, 2])).toThrow(/Expected 1 predictors/);
  });
  it('gives R² = 1 for an exact fit', () => {
    const fit = fitted([[1], [2], [3], [4]], [3, 5, 7, 9]);
    expect(fit.r2).toBe(1);
    expect(fit.coefficients[1]).toBeCloseTo(2, 12);
  });
});
