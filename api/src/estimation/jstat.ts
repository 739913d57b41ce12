import { createRequire } from 'node:module';

// jstat 1.9 ships no type declarations; it is loaded once here, typed for the parts in use.
export interface BetaDistribution {
  pdf(x: number, alpha: number, beta: number): number;
  cdf(x: number, alpha: number, beta: number): number;
  inv(p: number, alpha: number, beta: number): number;
  mean(alpha: number, beta: number): number;
}
export interface NormalDistribution {
  inv(p: number, mean: number, sd: number): number;
  cdf(x: number, mean: number, sd: number): number;
}
export interface ChiSquareDistribution {
  cdf(x: number, dof: number): number;
}
export interface StudentTDistribution {
  inv(p: number, dof: number): number;
}
export interface JStatStatic {
  beta: BetaDistribution;
  normal: NormalDistribution;
  chisquare: ChiSquareDistribution;
  studentt: StudentTDistribution;
  gammaln(x: number): number;
  betaln(a: number, b: number): number;
  ibeta(x: number, a: number, b: number): number;
}

export const jStat = createRequire(import.meta.url)('jstat') as JStatStatic;
