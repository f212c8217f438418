import type { DrawingLine } from "../types";
import { once, type Lines } from "./lazy-drawing";

/** What an infeasible design keeps besides its reason: the drawing so far (or how to draw it, when asked) and any warnings. */
export interface FailureContext {
  section?: Lines;
  warnings?: string[];
}

/**
 * A design step that cannot be completed for this brief and these options (no section is strong
 * enough, the geometry cannot be prestressed, the self-weight does not settle…). It is an answer —
 * the scheme is infeasible and the message is the reason, in words a person can act on — not a bug.
 * The error that led to it, if any, is kept as `cause`.
 */
export class SchemeError extends Error {
  readonly warnings: string[];
  readonly #section: () => DrawingLine[];
  constructor(message: string, options: FailureContext & { cause?: unknown } = {}) {
    super(message, options.cause === undefined ? undefined : { cause: options.cause });
    this.name = "SchemeError";
    this.#section = once(options.section ?? []);
    this.warnings = options.warnings ?? [];
  }

  /** The drawing so far, built when first read. */
  get section(): DrawingLine[] {
    return this.#section();
  }
}

/** No section in the catalogue carries a member. */
export class SizingError extends SchemeError {
  constructor(message: string, options: FailureContext & { cause?: unknown } = {}) {
    super(message, options);
    this.name = "SizingError";
  }
}

/** The self-weight iteration diverged or did not settle. */
export class ConvergenceError extends SchemeError {
  constructor(message: string, options: FailureContext & { cause?: unknown } = {}) {
    super(message, options);
    this.name = "ConvergenceError";
  }
}

/**
 * Gives a scheme's failure the scheme's own reason (and its drawing), keeping the original error as
 * `cause`. Anything that is not a SchemeError — a TypeError, a bug — is rethrown unchanged.
 */
export function failWith(error: unknown, reason: (message: string) => string, context: FailureContext = {}): never {
  if (!(error instanceof SchemeError)) throw error;
  throw new SchemeError(reason(error.message), {
    cause: error,
    section: context.section ?? (() => error.section),
    warnings: context.warnings ?? error.warnings,
  });
}

/**
 * Whether an error thrown by a designer is an answer the user can act on: a SchemeError, or a
 * RangeError for an input the scheme refuses (an option out of range, a fabric not in the
 * catalogue). Anything else is an internal error and must not be shown as a design reason.
 */
export function isDesignAnswer(error: unknown): error is Error {
  return error instanceof SchemeError || error instanceof RangeError;
}
