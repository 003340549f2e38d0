// jstat ships no type declarations; only the functions Echoline calls are typed here, so a typo in a
// call site still fails the type check.
declare module "jstat" {
  interface JStatDistributions {
    normal: {
      inv(p: number, mean: number, sd: number): number;
      cdf(x: number, mean: number, sd: number): number;
    };
    chisquare: {
      cdf(x: number, dof: number): number;
    };
    corrcoeff(a: readonly number[], b: readonly number[]): number;
  }
  const jStat: JStatDistributions;
  export default jStat;
}
