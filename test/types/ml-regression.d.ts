declare module 'ml-regression-multivariate-linear' {
  export default class MultivariateLinearRegression {
    constructor(x: number[][], y: number[][], options?: { intercept?: boolean; statistics?: boolean });
    weights: number[][];
    stdError: number;
    stdErrors: number[];
    stdErrorMatrix: { get(i: number, j: number): number; to2DArray(): number[][] };
    tStats: number[];
    predict(x: number[]): number[];
    predict(x: number[][]): number[][];
  }
}
