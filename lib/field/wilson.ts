// Wilson score interval for a binomial proportion (E. B. Wilson, "Probable inference, the law of
// succession, and statistical inference", JASA 22, 1927). Unlike the raw share k/n it stays honest for
// small n: 1 failure in 1 report gives 0.21–1 at 95 %, not "100 %".

export type Interval = { lower: number; upper: number; share: number };

/** Two-sided interval at the z of the chosen confidence; n = 0 gives the uninformative 0–1. */
export function wilsonInterval(k: number, n: number, z: number): Interval {
  if (!Number.isInteger(k) || !Number.isInteger(n) || k < 0 || n < 0 || k > n)
    throw new RangeError(`Counts must satisfy 0 ≤ k ≤ n (got k=${k}, n=${n}).`);
  if (!(z > 0)) throw new RangeError("z must be positive.");
  if (n === 0) return { lower: 0, upper: 1, share: 0 };
  const p = k / n;
  const z2 = z * z;
  const denominator = 1 + z2 / n;
  const centre = (p + z2 / (2 * n)) / denominator;
  const half = (z * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n))) / denominator;
  // Clamp the rounding dust at the ends (k = 0 or k = n give exactly 0 or 1 analytically).
  return { lower: k === 0 ? 0 : Math.max(0, centre - half), upper: k === n ? 1 : Math.min(1, centre + half), share: p };
}

// Inverse of the standard normal CDF: P. J. Acklam's rational approximation (relative error < 1.2e-9).
const A = [-3.969683028665376e1, 2.209460984245205e2, -2.759285104469687e2, 1.38357751867269e2, -3.066479806614716e1, 2.506628277459239];
const B = [-5.447609879822406e1, 1.615858368580409e2, -1.556989798598866e2, 6.680131188771972e1, -1.328068155288572e1];
const C = [-7.784894002430293e-3, -3.223964580411365e-1, -2.400758277161838, -2.549732539343734, 4.374664141464968, 2.938163982698783];
const D = [7.784695709041462e-3, 3.224671290700398e-1, 2.445134137142996, 3.754408661907416];

export function normalQuantile(p: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError("p must lie strictly between 0 and 1.");
  const low = 0.02425;
  if (p < low) {
    const q = Math.sqrt(-2 * Math.log(p));
    return (((((C[0] * q + C[1]) * q + C[2]) * q + C[3]) * q + C[4]) * q + C[5]) / ((((D[0] * q + D[1]) * q + D[2]) * q + D[3]) * q + 1);
  }
  if (p > 1 - low) return -normalQuantile(1 - p);
  const q = p - 0.5;
  const r = q * q;
  return (
    ((((((A[0] * r + A[1]) * r + A[2]) * r + A[3]) * r + A[4]) * r + A[5]) * q) /
    (((((B[0] * r + B[1]) * r + B[2]) * r + B[3]) * r + B[4]) * r + 1)
  );
}

/** z for a two-sided interval at `confidence` (0.95 → 1.95996). */
export const zForConfidence = (confidence: number): number => normalQuantile(1 - (1 - confidence) / 2);
