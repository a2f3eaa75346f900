// The part of jstat 1.9.6 the statistics core uses (the package ships no types). It is a CommonJS
// module whose export is the jStat object, so it is imported as a default import.
declare module 'jstat' {
  interface ContinuousDistribution {
    inv(p: number, ...parameters: number[]): number;
    cdf(x: number, ...parameters: number[]): number;
  }
  const jStat: {
    studentt: ContinuousDistribution;
    normal: ContinuousDistribution;
  };
  export default jStat;
}
