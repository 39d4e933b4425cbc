/**
 * The most factors one planned design takes: 15, the largest factor count the built-in
 * catalog holds (catalog.ts; in 16 runs that is the saturated 2^(15-11)). Fractions from
 * typed generators and the phone's planning form keep the same limit, so a plan made in one
 * place can be made in the other; a full factorial stops earlier, at 10 factors, by the run
 * limit (run-limit.ts). A design choice of this project, not a published limit.
 */

/** Most factors of a catalog fraction, a fraction from typed generators, or the planning form. */
export const MAX_DESIGN_FACTORS = 15;
