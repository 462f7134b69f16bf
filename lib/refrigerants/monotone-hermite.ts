/**
 * Slopes for a monotone piecewise-cubic Hermite interpolant (Fritsch & Carlson 1980, SIAM J. Numer.
 * Anal. 17, 238): second-order three-point estimates, then limited so that no interval overshoots.
 * xs must be strictly monotone (either direction); ys monotone.
 */
export function monotoneSlopes(xs: ArrayLike<number>, ys: ArrayLike<number>): Float64Array {
  const count = xs.length;
  if (count < 3 || ys.length !== count) throw new RangeError("Need at least three matching points.");
  const h = new Float64Array(count - 1);
  const secant = new Float64Array(count - 1);
  for (let i = 0; i < count - 1; i++) {
    h[i] = xs[i + 1]! - xs[i]!;
    secant[i] = (ys[i + 1]! - ys[i]!) / h[i]!;
  }
  const slopes = new Float64Array(count);
  for (let i = 1; i < count - 1; i++) {
    slopes[i] = (h[i]! * secant[i - 1]! + h[i - 1]! * secant[i]!) / (h[i - 1]! + h[i]!);
  }
  slopes[0] = endSlope(h[0]!, h[1]!, secant[0]!, secant[1]!);
  slopes[count - 1] = endSlope(h[count - 2]!, h[count - 3]!, secant[count - 2]!, secant[count - 3]!);
  for (let i = 0; i < count - 1; i++) {
    const d = secant[i]!;
    if (d === 0) {
      slopes[i] = 0;
      slopes[i + 1] = 0;
      continue;
    }
    const alpha = slopes[i]! / d;
    const beta = slopes[i + 1]! / d;
    if (alpha < 0) slopes[i] = 0;
    if (beta < 0) slopes[i + 1] = 0;
    const radius = alpha * alpha + beta * beta;
    if (!Number.isFinite(radius)) {
      // Secant so small that the ratios overflow: fall back to the α, β ≤ 3 square, also monotone.
      slopes[i] = clampToThreeSecants(slopes[i]!, d);
      slopes[i + 1] = clampToThreeSecants(slopes[i + 1]!, d);
    } else if (radius > 9) {
      const tau = 3 / Math.sqrt(radius);
      slopes[i] = tau * alpha * d;
      slopes[i + 1] = tau * beta * d;
    }
  }
  return slopes;
}

function clampToThreeSecants(slope: number, secant: number): number {
  return Math.abs(slope) > 3 * Math.abs(secant) ? 3 * secant : slope;
}

function endSlope(hNear: number, hFar: number, secantNear: number, secantFar: number): number {
  const slope = ((2 * hNear + hFar) * secantNear - hNear * secantFar) / (hNear + hFar);
  if (Math.sign(slope) !== Math.sign(secantNear)) return 0;
  return slope;
}

/** Cubic Hermite value on [x0, x1]; h = x1 − x0 may be negative. */
export function hermite(
  x: number,
  x0: number,
  h: number,
  y0: number,
  y1: number,
  m0: number,
  m1: number,
): number {
  const s = (x - x0) / h;
  const s2 = s * s;
  const s3 = s2 * s;
  return (
    (2 * s3 - 3 * s2 + 1) * y0 + (s3 - 2 * s2 + s) * h * m0 + (-2 * s3 + 3 * s2) * y1 + (s3 - s2) * h * m1
  );
}
