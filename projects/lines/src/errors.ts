/**
 * The one error the library throws for impossible input. `field` names the
 * offending input exactly as it appears in the spec, so the API can point at it.
 */
export class LineInputError extends Error {
  override readonly name = 'LineInputError';

  constructor(
    readonly field: string,
    readonly rule: string,
  ) {
    super(`${field}: ${rule}`);
  }
}
