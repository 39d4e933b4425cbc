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

/** The largest response magnitude the analysis carries: its sums of squares must stay finite in
 * IEEE 754 binary64 (largest 1.797e308, so a square needs |y| < 1.34e154), with room for sums over
 * a million runs (1e150^2 x 1e6 = 1e306). Files are refused above it at reading, naming the cell.
 * Common practice (overflow headroom); raise it when the fit scales the response first. */
export const MAX_RESPONSE_MAGNITUDE = 1e150;
