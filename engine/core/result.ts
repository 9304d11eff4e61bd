/**
 * Errors as values (docs/style.md §9). An engine function that can legitimately
 * fail returns a Result whose error carries a literal `code`; it throws only
 * for bugs.
 */
export type Ok<T> = { readonly ok: true; readonly value: T };
export type Err<E> = { readonly ok: false; readonly error: E };
export type Result<T, E> = Ok<T> | Err<E>;

export function ok<T>(value: T): Ok<T> {
  return { ok: true, value };
}

export function err<E>(error: E): Err<E> {
  return { ok: false, error };
}

/** Unwraps a Result whose failure would be a bug in the caller. */
export function expectOk<T, E>(result: Result<T, E>, what: string): T {
  if (!result.ok) {
    throw new Error(`${what}: ${JSON.stringify(result.error)}`);
  }
  return result.value;
}
