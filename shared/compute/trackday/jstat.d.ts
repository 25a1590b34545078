// jstat ships no type declarations. Only the two quantile functions Tunefork calls are typed, so
// any other use fails to compile until someone declares it here on purpose.
declare module 'jstat' {
  export const jStat: {
    studentt: {
      /** Quantile of Student's t distribution with `degreesOfFreedom`. */
      inv(probability: number, degreesOfFreedom: number): number;
    };
    normal: {
      /** Quantile of the normal distribution. */
      inv(probability: number, mean: number, standardDeviation: number): number;
    };
  };
}
