// The parts of jstat 1.9.6 (no bundled types) that the distribution tests compare against.
declare module 'jstat' {
  interface JStatStatic {
    gammaln(x: number): number;
    /** Matrix inverse (Gauss-Jordan). */
    inv(a: number[][]): number[][];
    betaln(a: number, b: number): number;
    ibeta(x: number, a: number, b: number): number;
    normal: {
      cdf(x: number, mean: number, sd: number): number;
      inv(p: number, mean: number, sd: number): number;
    };
    studentt: {
      cdf(t: number, df: number): number;
      inv(p: number, df: number): number;
    };
    noncentralt: {
      cdf(t: number, df: number, ncp: number): number;
    };
    centralF: {
      cdf(f: number, d1: number, d2: number): number;
      inv(p: number, d1: number, d2: number): number;
    };
  }
  const jStat: JStatStatic;
  export default jStat;
}
