import { Matrix, QrDecomposition, inverse } from 'ml-matrix';
import type { NotEnough } from './notEnough';

/** An ordinary least-squares fit with an intercept. Index 0 of the coefficient arrays is the intercept. */
export interface OlsFit {
  enough: true;
  n: number;
  /** Residual degrees of freedom: n − number of coefficients. */
  df: number;
  coefficients: number[];
  standardErrors: number[];
  /** Residual standard error s = √(RSS / df), in the response's units. */
  residualStandardError: number;
  /** 1 − RSS / TSS; 1 when the fit is exact (also for a constant response). */
  r2: number;
  fitted: number[];
  residuals: number[];
  /** Diagonal of the hat matrix, h_ii = x_i' (X'X)⁻¹ x_i. */
  leverages: number[];
  /**
   * (X'X)⁻¹, intercept first. For a new row x0 = [1, …], s² (1 + x0' (X'X)⁻¹ x0) is the variance
   * of its prediction error, the base of a prediction interval.
   */
  unscaledCovariance: number[][];
}

// A predictor column whose part outside the span of the columns before it is below this share of
// its own length is taken as a linear combination of them (a singular design).
const RANK_TOLERANCE = 1e-10;

/**
 * Fits y = b0 + b1 x1 + … + bk xk by least squares through ml-matrix's Householder QR
 * decomposition (no normal equations, which lose digits on ill-conditioned data).
 * `predictors` has one row per observation, without the intercept column.
 */
export function fitOls(predictors: readonly (readonly number[])[], response: readonly number[]): OlsFit | NotEnough {
  const n = response.length;
  if (predictors.length !== n) throw new RangeError(`Got ${predictors.length} rows of predictors for ${n} responses`);
  const k = predictors[0]?.length ?? 0;
  const p = k + 1;
  const needed = p + 1; // at least one residual degree of freedom
  predictors.forEach((row, i) => {
    if (row.length !== k) throw new RangeError(`Row ${i} has ${row.length} predictors, row 0 has ${k}`);
    if (!row.every(Number.isFinite)) throw new RangeError(`Row ${i} has a predictor that is not a finite number`);
  });
  if (!response.every(Number.isFinite)) throw new RangeError('A response is not a finite number');
  if (n < needed)
    return {
      enough: false,
      reason: `${n} observations for ${p} coefficients; least squares needs at least ${needed}`,
      needed,
    };

  const X = new Matrix(predictors.map((row) => [1, ...row]));
  const qr = new QrDecomposition(X);
  const R = qr.upperTriangularMatrix;
  // |R_jj| is the length of column j's part outside the span of the columns before it; beside the
  // column's own length it says how far from collinear the column is, whatever its units.
  const sumOfSquares = (j: number) => predictors.reduce((sum, row) => sum + row[j]! ** 2, 0);
  const columnLengths = [Math.sqrt(n), ...Array.from({ length: k }, (_, j) => Math.sqrt(sumOfSquares(j)))];
  for (let j = 0; j < p; j++) {
    const columnLength = columnLengths[j]!;
    if (columnLength === 0 || Math.abs(R.get(j, j)) < RANK_TOLERANCE * columnLength) {
      const what = j === 0 ? 'the intercept' : `predictor ${j}`;
      return {
        enough: false,
        reason: `The predictors are degenerate: ${what} is a linear combination of the others (or constant)`,
        needed,
      };
    }
  }

  const coefficients = qr.solve(Matrix.columnVector([...response])).getColumn(0);
  const fitted = X.mmul(Matrix.columnVector(coefficients)).getColumn(0);
  const residuals = response.map((y, i) => y - fitted[i]!);
  const rss = residuals.reduce((sum, e) => sum + e * e, 0);
  const mean = response.reduce((sum, y) => sum + y, 0) / n;
  const tss = response.reduce((sum, y) => sum + (y - mean) ** 2, 0);
  const df = n - p;
  const s = Math.sqrt(rss / df);

  // (X'X)⁻¹ = R⁻¹ R⁻ᵀ, from the triangular factor rather than by inverting X'X.
  const rInverse = inverse(R);
  const unscaled = rInverse.mmul(rInverse.transpose());
  const Q = qr.orthogonalMatrix;
  const leverages = Array.from({ length: n }, (_, i) => {
    let h = 0;
    for (let j = 0; j < p; j++) h += Q.get(i, j) ** 2;
    return h;
  });

  return {
    enough: true,
    n,
    df,
    coefficients,
    standardErrors: unscaled.diag().map((v) => s * Math.sqrt(v)),
    residualStandardError: s,
    r2: rss === 0 ? 1 : 1 - rss / tss,
    fitted,
    residuals,
    leverages,
    unscaledCovariance: unscaled.to2DArray(),
  };
}

/**
 * x0' (X'X)⁻¹ x0 for a new row of predictors (without the intercept's 1): the prediction
 * variance of a new observation is s² (1 + this).
 */
export function newRowLeverage(fit: Pick<OlsFit, 'unscaledCovariance'>, predictors: readonly number[]): number {
  const x0 = Matrix.columnVector([1, ...predictors]);
  if (x0.rows !== fit.unscaledCovariance.length)
    throw new RangeError(`Expected ${fit.unscaledCovariance.length - 1} predictors, got ${predictors.length}`);
  return x0.transpose().mmul(new Matrix(fit.unscaledCovariance)).mmul(x0).get(0, 0);
}
