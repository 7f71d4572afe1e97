/**
 * The part of jstat (1.9.6, no published types) the fitting module uses: the Student t quantile and
 * the F and χ² distributions' cumulative probabilities.
 */
declare module 'jstat' {
  interface JStat {
    studentt: { inv(p: number, dof: number): number; cdf(x: number, dof: number): number };
    centralF: { cdf(x: number, df1: number, df2: number): number };
    chisquare: { cdf(x: number, dof: number): number };
  }
  const jStat: JStat;
  export default jStat;
}
