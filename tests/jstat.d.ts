// Minimal types for the parts of the `jstat` registry package used as an independent check in tests.
declare module 'jstat' {
  interface JStatStatic {
    studentt: {
      cdf(x: number, dof: number): number;
      inv(p: number, dof: number): number;
      pdf(x: number, dof: number): number;
    };
    normal: { inv(p: number, mean: number, sd: number): number; cdf(x: number, mean: number, sd: number): number };
    ibeta(x: number, a: number, b: number): number;
    gammaln(x: number): number;
    betaln(a: number, b: number): number;
    models: {
      ols(endog: number[], exog: number[][]): { coef: number[]; R2: number; t: { se: number[] } };
    };
  }
  const jStat: JStatStatic;
  export default jStat;
}
