/**
 * A measured quality response and what the person wants of it.
 */
export interface Response {
  readonly name: string;
  readonly unit?: string;
  /** 'maximize' and 'minimize' steer the path of steepest ascent or descent; 'target' aims at `target`. */
  readonly goal: 'maximize' | 'minimize' | 'target';
  readonly target?: number;
  /**
   * The lowest value the response can take in the physical world, in its unit, or null when it
   * has none: 0 for a response that cannot be negative (a thickness, a count of defects, a
   * time). A finite number when given. A plan may leave it out (read as null); every stored
   * study and every backup carries it, null or a number. The analysis applies its transforms
   * to y minus it and warns when a prediction of the untransformed response crosses it.
   */
  readonly lowerBound?: number | null;
}
