/**
 * The OpenAPI document is the single source of request schemas: this module
 * loads it once, compiles each operation's request body, query and path
 * parameter schemas with ajv (JSON Schema 2020-12, as OpenAPI 3.1 uses), and
 * turns ajv's errors into problem+json field errors.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { RequestHandler } from 'express';
import { Ajv2020, type ErrorObject, type ValidateFunction } from 'ajv/dist/2020.js';
import addFormats from 'ajv-formats';
import { parse } from 'yaml';
import { Problem, type FieldProblem } from './errors';

export const OPENAPI_PATH = fileURLToPath(new URL('../openapi/openapi.yaml', import.meta.url));

type Schema = Record<string, unknown>;
interface Parameter {
  $ref?: string;
  name: string;
  in: 'query' | 'path' | 'header' | 'cookie';
  required?: boolean;
  schema?: Schema;
}
interface Operation {
  operationId?: string;
  parameters?: Parameter[];
  requestBody?: { required?: boolean; content?: Record<string, { schema?: Schema }> };
}
export interface OpenApiDocument {
  paths: Record<string, Record<string, Operation>>;
  components: { schemas: Record<string, Schema>; parameters?: Record<string, Parameter> };
  [key: string]: unknown;
}

const DOCUMENT_ID = 'linewright-openapi';

export function loadOpenApi(): OpenApiDocument {
  return parse(readFileSync(OPENAPI_PATH, 'utf8')) as OpenApiDocument;
}

/** Rewrites local `#/components/...` references so they resolve inside the registered document. */
function anchored(schema: Schema): Schema {
  return JSON.parse(JSON.stringify(schema).replaceAll('"$ref":"#/', `"$ref":"${DOCUMENT_ID}#/`)) as Schema;
}

/** `/spec/w` → `spec.w`; a missing or extra property is named by ajv's params. */
function fieldOf(error: ErrorObject, root: string): string {
  const path = error.instancePath.split('/').filter(Boolean);
  const params = error.params as { missingProperty?: string; additionalProperty?: string; unevaluatedProperty?: string };
  const named = params.missingProperty ?? params.additionalProperty ?? params.unevaluatedProperty;
  if (named) path.push(named);
  return [root, ...path].filter(Boolean).join('.');
}

function describe(error: ErrorObject): string {
  const params = error.params as Record<string, unknown>;
  switch (error.keyword) {
    case 'required':
      return 'is required';
    case 'additionalProperties':
    case 'unevaluatedProperties':
      return 'is not a known field';
    case 'discriminator':
      return params['error'] === 'mapping' ? `"${String(params['tagValue'])}" is not a known value` : 'is required';
    default:
      return error.message ?? 'is invalid';
  }
}

export function fieldProblems(errors: ErrorObject[] | null | undefined, root = ''): FieldProblem[] {
  const byField = new Map<string, string[]>();
  for (const error of errors ?? []) {
    // A oneOf (number or unit string) also reports each branch's own error; those say more.
    if (error.keyword === 'oneOf' || error.keyword === 'if') continue;
    const field = fieldOf(error, root);
    const details = byField.get(field) ?? [];
    const detail = describe(error);
    if (!details.includes(detail)) details.push(detail);
    byField.set(field, details);
  }
  if (byField.size === 0) return [{ field: root, detail: 'is invalid' }];
  return [...byField].map(([field, details]) => ({ field, detail: joinDetails(details) }));
}

/** "must be number" + "must be string" → "must be number or string". */
function joinDetails(details: string[]): string {
  const kinds = details.map((detail) => /^must be (\w+)$/.exec(detail)?.[1]);
  return kinds.every(Boolean) && kinds.length > 1 ? `must be ${kinds.join(' or ')}` : details.join('; ');
}

export class ApiContract {
  private readonly ajv: Ajv2020;
  /** Query and path values arrive as strings; this instance coerces them to the declared types. */
  private readonly coercingAjv: Ajv2020;
  private readonly operations = new Map<string, Operation>();

  constructor(readonly document: OpenApiDocument = loadOpenApi()) {
    this.ajv = new Ajv2020({ allErrors: true, discriminator: true, strict: false, coerceTypes: false });
    this.coercingAjv = new Ajv2020({ allErrors: true, discriminator: true, strict: false, coerceTypes: true });
    for (const instance of [this.ajv, this.coercingAjv]) {
      addFormats.default(instance);
      instance.addSchema({ $id: DOCUMENT_ID, components: document.components } as Schema);
    }
    for (const methods of Object.values(document.paths)) {
      for (const operation of Object.values(methods)) {
        if (operation.operationId) this.operations.set(operation.operationId, operation);
      }
    }
  }

  /** Compiles a schema named in components.schemas (used by services that validate CSV rows). */
  schemaValidator(name: string): ValidateFunction {
    return this.ajv.compile({ $ref: `${DOCUMENT_ID}#/components/schemas/${name}` });
  }

  /** Middleware validating the body, query and path parameters of one operation. */
  validate(operationId: string): RequestHandler {
    const operation = this.operations.get(operationId);
    if (!operation) throw new Error(`OpenAPI has no operation "${operationId}".`);
    const bodySchema = operation.requestBody?.content?.['application/json']?.schema;
    const body = bodySchema ? this.ajv.compile(anchored(bodySchema)) : undefined;
    const isBodyRequired = operation.requestBody?.required ?? false;
    const query = this.parameterValidator(operation, 'query');
    const path = this.parameterValidator(operation, 'path');

    return (req, _res, next) => {
      const problems: FieldProblem[] = [];
      if (query && !query(req.query ?? {})) problems.push(...fieldProblems(query.errors));
      if (path && !path(req.params ?? {})) problems.push(...fieldProblems(path.errors));
      if (body) {
        if (req.body === undefined) {
          if (isBodyRequired) problems.push({ field: '', detail: 'a JSON request body is required' });
        } else if (!body(req.body)) {
          problems.push(...fieldProblems(body.errors));
        }
      }
      if (problems.length > 0) throw Problem.badRequest(`The request does not match the ${operationId} schema.`, problems);
      next();
    };
  }

  /** A parameter given as `$ref: '#/components/parameters/Name'` is shared by several operations. */
  private resolved(parameter: Parameter): Parameter {
    if (!parameter.$ref) return parameter;
    const name = parameter.$ref.replace('#/components/parameters/', '');
    const shared = this.document.components.parameters?.[name];
    if (!shared) throw new Error(`OpenAPI has no parameter "${name}".`);
    return shared;
  }

  private parameterValidator(operation: Operation, location: 'query' | 'path'): ValidateFunction | undefined {
    const parameters = (operation.parameters ?? []).map((parameter) => this.resolved(parameter)).filter((parameter) => parameter.in === location);
    if (parameters.length === 0) return undefined;
    const schema: Schema = {
      type: 'object',
      properties: Object.fromEntries(parameters.map((parameter) => [parameter.name, anchored(parameter.schema ?? {})])),
      required: parameters.filter((parameter) => parameter.required).map((parameter) => parameter.name),
      // Unknown query parameters are refused so a typo never silently does nothing.
      additionalProperties: location === 'path',
    };
    return this.coercingAjv.compile(schema);
  }
}
