/**
 * The standing caution in one short line, for a place where it must stay on screen in little
 * height (the quick card's sticky prediction), with the full three statements of CAUTION
 * (core/predict/caution.ts) one tap away. It keeps all three points: the tested range, the
 * machine's rated limits, and site procedures with qualified staff (common practice).
 */
export const CAUTION_SHORT = 'Valid inside the tested range only; stay within rated limits; site procedures and qualified staff decide.';

/** The label of the control that shows the full caution. */
export const CAUTION_MORE = 'Full caution';
