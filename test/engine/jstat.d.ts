// jstat ships no types; only the part the tests use is declared.
declare module 'jstat' {
  export const jStat: {
    poisson: {
      cdf(k: number, lambda: number): number;
      pdf(k: number, lambda: number): number;
    };
  };
}
