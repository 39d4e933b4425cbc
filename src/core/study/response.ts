/**
 * A measured quality response and what the person wants of it.
 */
export interface Response {
  readonly name: string;
  readonly unit?: string;
  /** 'maximize' and 'minimize' steer the path of steepest ascent or descent; 'target' aims at `target`. */
  readonly goal: 'maximize' | 'minimize' | 'target';
  readonly target?: number;
}
