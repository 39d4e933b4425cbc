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

/** A run whose leverage is within this of 1 alone determines its fitted value: its studentized
 * residuals and the PRESS statistic are not available (common practice). */
export const LEVERAGE_TOLERANCE = 1e-9;

/** Weights of an alias combination below this are rounding noise from the QR solve, not part
 * of the combination (common practice: far above double rounding of a +-1 column, far below
 * any real partial alias). */
export const ALIAS_WEIGHT_TOLERANCE = 1e-8;

/** Alias weights this close to +-1 are written without a number ("C + AB", not "C + 1 AB");
 * rounding from the QR solve (common practice). */
export const UNIT_WEIGHT_TOLERANCE = 1e-9;

/** Coded distance within which an actual setting still counts as at its planned level, for
 * telling center runs and factorial runs apart: 5% of the range on either side (our own choice,
 * so that small setting errors do not hide center runs). */
export const CENTER_TOLERANCE = 0.1;

/** Off-diagonal entries of (X'X)^-1 below this fraction of sqrt(C_ii C_jj) are rounding, so the
 * covariance is treated as diagonal (an orthogonal design). Common practice; far below any real
 * correlation between two estimates. */
export const DIAGONAL_TOLERANCE = 1e-12;

/** A slope below this fraction of the size of the model's terms at the held settings is
 * rounding: the factor has no effect there. Common practice (far above double rounding, far
 * below any effect a gauge could see). */
export const ZERO_SLOPE_TOLERANCE = 1e-9;

// Distributions (src/core/dist): convergence and switch points of the series and iterations.

/** Lentz's continued fraction stops when the last convergent changed the value by less than
 * this fraction (Numerical Recipes 3rd ed. section 5.2: about the double precision epsilon). */
export const CONTINUED_FRACTION_TOLERANCE = 1e-16;

/** Lentz: stand-in for a zero denominator (Numerical Recipes 3rd ed. section 5.2). */
export const CONTINUED_FRACTION_TINY = 1e-300;

/** How far x + y may stray from 1 in the incomplete beta's XY forms (several rounding errors of a ratio). */
export const SUM_TO_ONE_TOLERANCE = 1e-12;

/** Newton on ln(odds) for the incomplete beta inverse stops once a step is below this (the next
 * error is about its square; common practice). */
export const NEWTON_STEP_TOLERANCE = 1e-11;

/** ...or once ln(P / target) is below this (common practice: a few roundings of a double). */
export const NEWTON_VALUE_TOLERANCE = 1e-14;

/** ...or once the bracket is narrower than this fraction of its upper end (two roundings of a double; common practice). */
export const BRACKET_TOLERANCE = 4e-16;

/** The erf power series stops when a term falls below this fraction of the sum (below the
 * double precision epsilon, so the sum no longer changes). */
export const SERIES_TOLERANCE = 1e-17;

/** Odds below this switch the t and F tails to their leading series term in logs, so nothing
 * underflows (the O(x) correction is then far below rounding). */
export const TAIL_SERIES_ODDS = 1e-250;

/** The noncentral t's Poisson-weighted series stops in each direction once what is left is below
 * this fraction of the sum (below the double precision epsilon; Benton and Krishnamoorthy 2003). */
export const NONCENTRAL_SERIES_TOLERANCE = 1e-17;

/** A noncentrality below this is taken as 0 (Student's t): its terms are then exact to rounding; our own choice. */
export const CENTRAL_NONCENTRALITY = 1e-300;

/** The smallest detectable effect is found to this relative precision (far finer than any gauge; our own choice). */
export const EFFECT_PRECISION = 1e-10;

/** Two ratios or fractions this close (relative) are the same number up to rounding: ties
 * between fractions in words, the largest variance among main effects, a correlation read as a
 * simple fraction (common practice: a few roundings of a double). */
export const RATIO_TOLERANCE = 1e-12;

/** Main effects whose variance is within this fraction of the largest count as equally well
 * estimated (a balanced design's columns, up to rounding; common practice). */
export const EQUAL_VARIANCE_TOLERANCE = 1e-9;
/** The largest response magnitude the analysis carries. The fit takes the response's scale out
 * first (fit/response-scale.ts), so sums of squares no longer bound it; what does is the figures
 * reported in the response's unit, which reach a few times the largest reading: an effect is a
 * difference of two means (up to 2 max |y|), an interval adds up to 12.7 standard errors (t for 1
 * residual df), a prediction sums the model's terms. 1e300 leaves a factor of 1e8 below the largest
 * binary64 number (1.8e308). Files are refused above it at reading, naming the cell. Our own choice
 * (overflow headroom, rounding aside). */
export const MAX_RESPONSE_MAGNITUDE = 1e300;
/** An eigenvalue of the second-order matrix B, or a pivot of a linear solve, below this fraction
 * of the largest in magnitude counts as zero (the surface has no unique stationary point along
 * it). Common practice: far above rounding, far below any fitted curvature. */
export const SINGULAR_TOLERANCE = 1e-10;

// Second-order designs and the optimum (src/core/design, src/core/linalg, src/core/optimum).

/** The least scale a relative test multiplies by, so that an all-zero matrix or column still gets
 * a defined comparison instead of 0 <= 0 (a guard against a zero scale, like Numerical Recipes'
 * FPMIN in Lentz's method, section 5.2; far above the smallest normal double, 2.2e-308). */
export const TINY_SCALE = 1e-300;

/** Column sums of a blocked design agree when they differ by less than this fraction of the
 * column's largest absolute sum (block orthogonality). Common practice (rounding). */
export const BLOCK_SUM_TOLERANCE = 1e-9;

/** Design moments are equal when they differ by less than this fraction of the largest second
 * moment (rotatability). Common practice (rounding of the axial distance). */
export const MOMENT_TOLERANCE = 1e-9;

/** Cyclic Jacobi stops when the off-diagonal Frobenius norm is below this fraction of the whole
 * matrix's Frobenius norm. Common practice: a few units of double precision epsilon (Golub and
 * Van Loan, 4th ed., section 8.5.3, the test off(A) <= tol ||A||_F). */
export const JACOBI_TOLERANCE = 1e-14;

/** Entries within this fraction of the largest magnitude count as tied when the sign of an
 * eigenvector is chosen; the first tied entry is made positive. Common practice (rounding). */
export const SIGN_TIE = 1e-9;

/** A matrix given to the eigen-decomposition is symmetric when |A_ij - A_ji| is at most this
 * fraction of its largest entry. Common practice (rounding of a matrix built from fitted terms). */
export const SYMMETRY_TOLERANCE = 1e-12;

/** Two fitted values (or desirabilities) within this fraction of their size, or of 1 when
 * smaller, are a tie, broken by the point nearest the center. Common practice (rounding). */
export const TIE_TOLERANCE = 1e-12;

/** A singular symmetric system is consistent when the right-hand side's component along each
 * null direction is at most this fraction of the system's scale; otherwise it has no solution
 * (the face of the box has no stationary point). Common practice (rounding of a few products). */
export const INCONSISTENCY_TOLERANCE = 1e-9;

/** A quadratic a + b t + c t^2 is solved as linear when |c| is at most this fraction of
 * |a| + |b|: the root from c would be rounding noise (common practice: a few units of double
 * precision epsilon). */
export const NEGLIGIBLE_QUADRATIC = 1e-15;

/** A compass search takes a step only when it improves its score (a desirability, or a distance
 * in coded units, both of order 1) by more than this: smaller gains are rounding, and taking them
 * could cycle on a flat stretch. Common practice (a few units of double precision epsilon). */
export const COMPASS_GAIN_MIN = 1e-15;

/** The compass search over ray directions (the target beyond radius 1) stops when its step falls
 * below this, in units of a unit direction (our own choice: far below any gauge). */
export const RAY_STEP_MIN = 1e-10;

/** The desirability compass search stops when its step falls below this, in coded units.
 * Common practice: far below any gauge. */
export const SEARCH_STEP_MIN = 1e-7;

/** A response with desirability exactly 0 on its acceptable limit has a shortfall of 0; this is
 * added to every such shortfall so that it still counts as short (our own choice: far below any
 * real shortfall, which is in units of the acceptable range). */
export const SHORTFALL_FLOOR = 1e-12;

/** The compiled predictor and the quadratic surface, read from the same coefficients, must agree
 * at the stationary point to this fraction of the fit (of 1 when the fit is smaller): rounding of
 * two sums of the same terms (our own choice). */
export const SURFACE_AGREEMENT_TOLERANCE = 1e-9;

/** Added to a quotient before it is rounded down, so that a quotient whole up to rounding
 * (1 / 0.1 = 9.999999999999998) counts as whole (common practice). */
export const FLOOR_ROUNDING = 1e-9;

/** The Box-Cox lambda and the ends of its interval are found to within this (fit/box-cox.ts;
 * far finer than any choice of power needs; our own choice). */
export const BOX_COX_PRECISION = 1e-6;

/** walsh-plan.ts answers only when the smallest eigenvalue of X_kept'X_kept is at least this
 * fraction of N, so that every kept column keeps at least sqrt of it (1e-3) of its norm; its span
 * tests likewise call a residual clear only from sqrt of it up. Our own choice, far above
 * RANK_TOLERANCE and rounding, so Householder QR keeps the same columns. */
export const WALSH_MARGIN = 1e-6;

/** A Gram-Schmidt residual below this fraction of the vector's norm means the vector lies in the
 * span (walsh-plan.ts): with every basis vector taken from a residual of at least
 * sqrt(WALSH_MARGIN) of its norm, rounding leaves about 1e-12 (our own choice, far between). */
export const SPAN_TOLERANCE = 1e-6;
