// The few jstat functions the reference tests cross-check against (jstat ships no types).
declare module "jstat" {
  const jStat: {
    ibeta(x: number, a: number, b: number): number;
    ibetainv(p: number, a: number, b: number): number;
    gammaln(x: number): number;
    beta: { inv(p: number, a: number, b: number): number; cdf(x: number, a: number, b: number): number; mean(a: number, b: number): number; variance(a: number, b: number): number };
    triangular: { inv(p: number, a: number, b: number, c: number): number; mean(a: number, b: number, c: number): number; variance(a: number, b: number, c: number): number };
  };
  export default jStat;
}
