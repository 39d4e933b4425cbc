/**
 * Numerical tolerances, named and set once (house style: relative, exported once).
 */

/** A column whose remaining norm falls below this fraction of its original norm during
 * Householder QR is treated as a linear combination of earlier columns. Common practice:
 * R's lm uses 1e-7 (the `tol` argument of qr.default / LINPACK dqrdc2). */
export const RANK_TOLERANCE = 1e-7;

/** Two coded settings closer than this count as the same point (pure error groups, center runs,
 * "exactly +-1" checks for the Yates path). Common practice: a coded value is the real setting
 * over half the range, so 1e-9 is far below any gauge resolution. */
export const SETTING_TOLERANCE = 1e-9;

/** A response whose spread is below this fraction of its magnitude is constant. Common practice. */
export const CONSTANT_TOLERANCE = 1e-12;

/** Off-diagonal entries of R below this fraction of sqrt(|R_ii R_jj|) count as zero when deciding
 * whether the model columns are orthogonal (sequential = adjusted sums of squares). Common practice. */
export const ORTHOGONALITY_TOLERANCE = 1e-9;

/** An eigenvalue of the second-order matrix B, or a pivot of a linear solve, below this fraction
 * of the largest in magnitude counts as zero (the surface has no unique stationary point along
 * it). Common practice: far above rounding, far below any fitted curvature. */
export const SINGULAR_TOLERANCE = 1e-10;
