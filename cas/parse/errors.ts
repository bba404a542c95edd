/**
 * The one error a reader raises. `position` is the 0-based character offset in
 * the source where reading failed, so an editor can underline it; `code` is a
 * stable machine name ("unbalanced", "unknown_command", "too_long", …).
 *
 * @example
 * try { readLatex("\\left(1-x") } catch (e) { if (e instanceof ReadError) e.position } // 0
 */
export class ReadError extends Error {
  readonly position: number;
  readonly code: string;

  constructor(code: string, message: string, position: number) {
    super(message);
    this.name = "ReadError";
    this.code = code;
    this.position = position;
  }
}

/** Codes a reader uses; kept in one list so callers can switch on them. */
export type ReadErrorCode =
  | "too_long"
  | "too_deep"
  | "empty"
  | "unexpected"
  | "unbalanced"
  | "unknown_command"
  | "unknown_function"
  | "bare_function"
  | "empty_group"
  | "missing_argument"
  | "missing_operator"
  | "chain"
  | "double_script"
  | "bad_name"
  | "bad_number"
  | "bad_derivative"
  | "unsupported";

/** Raises a {@link ReadError}; a function so parsers can `return fail(…)` in expression position. */
export function fail(code: ReadErrorCode, message: string, position: number): never {
  throw new ReadError(code, message, position);
}
