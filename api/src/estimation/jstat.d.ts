// Minimal typings for the parts of jstat 1.9 used here (the package ships none).
declare module 'jstat' {
  interface BetaDistribution {
    pdf(x: number, alpha: number, beta: number): number;
    cdf(x: number, alpha: number, beta: number): number;
    inv(p: number, alpha: number, beta: number): number;
    mean(alpha: number, beta: number): number;
  }
  interface NormalDistribution {
    inv(p: number, mean: number, sd: number): number;
    cdf(x: number, mean: number, sd: number): number;
  }
  interface JStatStatic {
    beta: BetaDistribution;
    normal: NormalDistribution;
    gammaln(x: number): number;
    betaln(a: number, b: number): number;
    ibeta(x: number, a: number, b: number): number;
  }
  const jStat: JStatStatic;
  export default jStat;
}
