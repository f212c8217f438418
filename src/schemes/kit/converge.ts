import { ConvergenceError } from "./errors";

/** Result of a self-weight fixed-point iteration. */
export interface Converged<T> {
  value: T;
  /** Self-weight, kPa, at convergence. */
  selfWeightKPa: number;
  iterations: number;
}

/**
 * Iterates a design on its own self-weight: guess g, design for g, read the design's self-weight g',
 * repeat until |g' − g| ≤ tolerance·g'. Sizing from a catalogue is a step function, so the sequence
 * can cycle between two sections; after half the allowed steps the larger of the last two weights is
 * kept (damped) so that the result is always safe-sided.
 * @param designFor designs for an assumed self-weight (kPa) and returns the design and its own self-weight (kPa)
 * @throws ConvergenceError when the self-weight grows without bound or has not settled in maxIterations
 */
export function iterateSelfWeight<T>(
  designFor: (selfWeightKPa: number) => { value: T; selfWeightKPa: number },
  initialKPa: number,
  { tolerance = 0.005, maxIterations = 60, divergeKPa = 100 } = {},
): Converged<T> {
  let guess = initialKPa;
  let previous = Number.NaN;
  for (let i = 1; i <= maxIterations; i++) {
    const step = designFor(guess);
    const next = step.selfWeightKPa;
    if (!(next >= 0) || next > divergeKPa) {
      throw new ConvergenceError(`self-weight diverged: ${next.toFixed(2)} kPa after ${i} iterations (the structure cannot carry its own weight at this span)`);
    }
    if (Math.abs(next - guess) <= tolerance * Math.max(next, 1e-9)) return { value: step.value, selfWeightKPa: next, iterations: i };
    // A catalogue step can make the sequence cycle a ↔ b: keep the larger, which is safe-sided.
    if (i > maxIterations / 2 && Math.abs(next - previous) <= tolerance * Math.max(next, 1e-9)) {
      const safe = Math.max(next, guess);
      const settled = designFor(safe);
      if (settled.selfWeightKPa <= safe * (1 + tolerance)) return { value: settled.value, selfWeightKPa: safe, iterations: i + 1 };
    }
    previous = guess;
    guess = next;
  }
  throw new ConvergenceError(`self-weight did not settle in ${maxIterations} iterations (last ${guess.toFixed(3)} kPa)`);
}
