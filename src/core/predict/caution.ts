/**
 * The standing caution that goes with every prediction, solve and path result, as data, so that
 * every screen and report shows the same words beside the numbers (common practice for
 * decision support on a production floor).
 */

/** The three statements of the caution, in the order they are shown. */
export const CAUTION: readonly string[] = Object.freeze([
  'A prediction is a statistical estimate from the fitted model, valid inside the tested range of the factors.',
  "Settings must stay within the machine's rated limits, whatever the model suggests.",
  'Site procedures and qualified staff decide whether a setting is changed.',
]);
