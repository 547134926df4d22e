/**
 * One error type for the API and one final handler that answers RFC 9457
 * `application/problem+json`. Unknown errors become a bare 500; details stay in the log.
 */
import type { ErrorRequestHandler } from 'express';
import { LineInputError } from '@linewright/lines';
import type { Logger } from 'pino';

export interface FieldProblem {
  /** JSON pointer or dotted path of the offending field in the request. */
  field: string;
  detail: string;
}

export class Problem extends Error {
  constructor(
    readonly status: number,
    readonly title: string,
    readonly detail?: string,
    readonly errors: FieldProblem[] = [],
    readonly headers: Record<string, string> = {},
  ) {
    super(detail ?? title);
  }

  static badRequest(detail: string, errors: FieldProblem[] = []): Problem {
    return new Problem(400, 'Invalid request', detail, errors);
  }
  static unauthorized(detail = 'Sign in or send a valid API token.'): Problem {
    return new Problem(401, 'Not signed in', detail);
  }
  static forbidden(detail = 'Your role does not allow this.'): Problem {
    return new Problem(403, 'Forbidden', detail);
  }
  static notFound(detail = 'No such resource.'): Problem {
    return new Problem(404, 'Not found', detail);
  }
  static conflict(detail: string): Problem {
    return new Problem(409, 'Conflict', detail);
  }
}

const PROBLEM_TYPE_BASE = '/api/docs#problem-';

function typeFor(status: number): string {
  return `${PROBLEM_TYPE_BASE}${status}`;
}

/** Errors thrown by body-parser and multer carry a status and a `type`. */
interface HttpishError {
  status?: number;
  statusCode?: number;
  type?: string;
  code?: string;
  expose?: boolean;
}

function toProblem(error: unknown): Problem | undefined {
  if (error instanceof Problem) return error;
  if (error instanceof LineInputError) {
    return Problem.badRequest(error.message, [{ field: error.field, detail: error.rule }]);
  }
  const httpish = error as HttpishError;
  const status = httpish?.status ?? httpish?.statusCode;
  if (httpish?.type === 'entity.too.large' || httpish?.code === 'LIMIT_FILE_SIZE') {
    return new Problem(413, 'Request too large', 'The request body is larger than this server accepts.');
  }
  if (httpish?.type === 'entity.parse.failed') {
    return Problem.badRequest('The request body is not valid JSON.', [{ field: '', detail: 'malformed JSON' }]);
  }
  if (status && status >= 400 && status < 500 && httpish.expose !== false) {
    return new Problem(status, 'Invalid request', (error as Error).message);
  }
  return undefined;
}

export function problemHandler(logger: Logger): ErrorRequestHandler {
  return (error, req, res, _next) => {
    const problem = toProblem(error);
    if (!problem) logger.error({ err: error, url: req.originalUrl }, 'unhandled error');
    const status = problem?.status ?? 500;
    res.status(status);
    for (const [name, value] of Object.entries(problem?.headers ?? {})) res.setHeader(name, value);
    res.type('application/problem+json').send({
      type: typeFor(status),
      title: problem?.title ?? 'Internal server error',
      status,
      ...(problem?.detail ? { detail: problem.detail } : {}),
      ...(problem && problem.errors.length > 0 ? { errors: problem.errors } : {}),
      instance: req.originalUrl,
    });
  };
}
