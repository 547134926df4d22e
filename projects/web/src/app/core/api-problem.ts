/**
 * A failed API call as the client sees it: the server's RFC 9457
 * problem+json (server/errors.ts), or a stand-in for a network failure or a
 * body that is not a problem, so every screen handles one shape.
 */
import { HttpErrorResponse } from '@angular/common/http';

export interface FieldProblem {
  /** Dotted path of the field in the request, e.g. `dk`, `rows[3].df`, `geometry.w`. */
  field: string;
  detail: string;
}

export class ApiProblem extends Error {
  constructor(
    readonly status: number,
    readonly title: string,
    readonly detail: string | undefined,
    readonly errors: readonly FieldProblem[] = [],
    /** The ETag a 409 carries: the version the entry is at now. */
    readonly etag?: string,
  ) {
    // `message` (one sentence for a snackbar or an error panel) is the detail, else the title.
    super(detail ?? title);
    this.name = 'ApiProblem';
  }

  get isConflict(): boolean {
    return this.status === 409;
  }

  /** The field problems whose path is `field` or starts with `field.` / `field[`. */
  errorsFor(field: string): FieldProblem[] {
    return this.errors.filter((error) => error.field === field || error.field.startsWith(`${field}.`) || error.field.startsWith(`${field}[`));
  }
}

interface ProblemBody {
  title?: unknown;
  detail?: unknown;
  status?: unknown;
  errors?: unknown;
}

function isFieldProblem(value: unknown): value is FieldProblem {
  const candidate = value as FieldProblem;
  return typeof candidate?.field === 'string' && typeof candidate?.detail === 'string';
}

/** Anything a request can fail with, as an ApiProblem. */
export function toApiProblem(error: unknown): ApiProblem {
  if (error instanceof ApiProblem) return error;
  if (error instanceof HttpErrorResponse) {
    if (error.status === 0) return new ApiProblem(0, 'No connection', 'The server did not answer; check the connection and try again.');
    const body = (typeof error.error === 'object' && error.error !== null ? error.error : {}) as ProblemBody;
    const errors = Array.isArray(body.errors) ? body.errors.filter(isFieldProblem) : [];
    const title = typeof body.title === 'string' ? body.title : error.statusText || 'Request failed';
    const detail = typeof body.detail === 'string' ? body.detail : `The server answered ${error.status}.`;
    return new ApiProblem(error.status, title, detail, errors, error.headers?.get('ETag') ?? undefined);
  }
  return new ApiProblem(0, 'Unexpected error', error instanceof Error ? error.message : String(error));
}
