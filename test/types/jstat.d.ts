// Minimal types for the parts of jstat the uncertainty tests use as a reference (tests only).
declare module 'jstat' {
  export const jStat: {
    normal: { inv(p: number, mean: number, sd: number): number; cdf(x: number, mean: number, sd: number): number };
    mean(a: number[]): number;
    variance(a: number[], sample?: boolean): number;
    skewness(a: number[]): number;
    kurtosis(a: number[]): number;
  };
}
