/**
 * The one way spanbook words a failure it caught: `messageOf` gives the text of anything thrown,
 * `failure` makes a new error that says what failed in the reader's words and keeps the original
 * as its `cause` (so a programmer still sees the stack of the real fault).
 */

/** The message of anything thrown (an Error's message, or the value as text). */
export function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

/** An error with `message` that keeps `cause`; `Kind` picks the class (Error by default). */
export function failure<E extends Error = Error>(message: string, cause: unknown, Kind: new (message: string, options?: ErrorOptions) => E = Error as never): E {
  return new Kind(message, { cause });
}
