import type { Request, RequestHandler, Response, Router } from 'express';
import { z, type ZodType } from 'zod';
import type { RouteConfig } from '@asteasolutions/zod-to-openapi';
import { documentRoute } from '../openapi';
import { requireAuth } from '../middlewares/auth';
import { resolveOrgAccess } from '../middlewares/org-access';
import { perKeyLimit, requireApiKey } from '../middlewares/api-key-auth';
import type { ApiKeyScope } from '../../shared/schemas/api-keys';
import { AppError } from '../errors';
import { fieldErrors } from '../middlewares/validate';
import {
  assertResponse,
  isRawResponse,
  validatingResponses,
  type RawResponse,
} from './response-check';

export { rawResponse } from './response-check';

type Method = 'get' | 'post' | 'patch' | 'put' | 'delete';

/** What a handler may return: the input of its response schema (or nothing: a 204). */
type HandlerResult<R> = R extends ZodType ? z.input<R> | undefined | void : undefined | void;

interface RouteSpec<
  P extends ZodType,
  Q extends ZodType,
  B extends ZodType,
  R extends ZodType | RawResponse | undefined,
> {
  method: Method;
  /** Express path under /api/v1, e.g. '/organizations/:orgId/machines/:machineId' */
  path: string;
  summary: string;
  tags: string[];
  /**
   * 'public' (no sign-in), 'user' (signed in), 'org' (signed in + access to :orgId), or
   * `{ apiKey: scope }`: an organization API key with that scope (no session; rate-limited per key)
   */
  access?: 'public' | 'user' | 'org' | { apiKey: ApiKeyScope };
  params?: P;
  query?: Q;
  body?: B;
  /**
   * zod schema of the success body (from shared/schemas): types the handler's result, documents
   * it, and under tests every JSON body is checked against it. `rawResponse(mediaType)` for a body
   * the handler writes itself (file, CSV, zip); only 204 routes may leave it out.
   */
  response?: R;
  status?: 200 | 201 | 202 | 204;
  /** extra middlewares run after access checks and before validation (rate limits, uploads) */
  before?: RequestHandler[];
  /** a body documented but not validated here (multipart uploads, checked by the handler) */
  multipartBody?: ZodType;
  /** a text/plain body (a log), read as a string and validated by this schema */
  textBody?: ZodType<string>;
  handler: (ctx: {
    req: Request;
    res: Response;
    params: z.infer<P>;
    query: z.infer<Q>;
    body: z.infer<B>;
  }) => Promise<HandlerResult<R>> | HandlerResult<R>;
}

const errorBody = z
  .object({
    error: z.object({
      code: z.string(),
      message: z.string(),
      fields: z.record(z.string(), z.string()).optional(),
    }),
  })
  .openapi('Error');

function parseOr400<T extends ZodType>(schema: T | undefined, value: unknown, where: string) {
  if (!schema) return value;
  const result = schema.safeParse(value ?? {});
  if (!result.success) {
    const fields = fieldErrors(result.error);
    const message = Object.entries(fields)
      .map(([k, v]) => `${k}: ${v}`)
      .join('; ');
    throw new AppError(400, 'invalid', message || `Invalid ${where}`, fields);
  }
  return result.data;
}

// Routes that answer something other than 204 without declaring what (tests/server/openapi.test.ts
// requires none): their answers could drift unchecked.
const undeclared = new Set<string>();

/** Routes declared without a response schema that may answer with a body. */
export const routesWithoutResponseSchema = (): string[] => [...undeclared].sort();

/** The OpenAPI content of the success body: JSON by its schema, or a raw body's media type. */
function successContent(response: ZodType | RawResponse | undefined) {
  if (isRawResponse(response)) {
    return { [response.raw]: { schema: z.string().openapi({ format: 'binary' }) } };
  }
  return { 'application/json': { schema: response ?? z.object({ data: z.unknown() }) } };
}

/** Declares one API route: Express handler, access checks, zod validation and its OpenAPI entry. */
export function route<
  P extends ZodType = ZodType,
  Q extends ZodType = ZodType,
  B extends ZodType = ZodType,
  R extends ZodType | RawResponse | undefined = undefined,
>(router: Router, spec: RouteSpec<P, Q, B, R>): void {
  const access = spec.access ?? 'org';
  const status = spec.status ?? 200;
  const openApiPath = spec.path.replace(/:(\w+)/g, '{$1}');
  const routeName = `${spec.method.toUpperCase()} ${spec.path}`;
  if (spec.response === undefined && status !== 204) undeclared.add(routeName);
  const responses: RouteConfig['responses'] = {
    [status]: {
      description: (isRawResponse(spec.response) && spec.response.description) || 'Success',
      ...(status !== 204 && { content: successContent(spec.response) }),
    },
    400: { description: 'Invalid input', content: { 'application/json': { schema: errorBody } } },
  };
  if (typeof access === 'object') {
    responses[429] = {
      description: 'Too many requests with this key (Retry-After says when to send again)',
      content: { 'application/json': { schema: errorBody } },
    };
  }
  if (access !== 'public') {
    responses[401] = {
      description: 'Not signed in',
      content: { 'application/json': { schema: errorBody } },
    };
    responses[403] = {
      description: 'Role may not',
      content: { 'application/json': { schema: errorBody } },
    };
    responses[404] = {
      description: 'Not found',
      content: { 'application/json': { schema: errorBody } },
    };
  }
  documentRoute({
    method: spec.method,
    path: openApiPath,
    summary: spec.summary,
    tags: spec.tags,
    ...(access !== 'public' && {
      security: [typeof access === 'object' ? { apiKey: [access.apiKey] } : { sessionCookie: [] }],
    }),
    request: {
      ...(spec.params && { params: spec.params as never }),
      ...(spec.query && { query: spec.query as never }),
      ...(spec.body && { body: { content: { 'application/json': { schema: spec.body } } } }),
      ...(spec.multipartBody && {
        body: { content: { 'multipart/form-data': { schema: spec.multipartBody } } },
      }),
      ...(spec.textBody && {
        body: { content: { 'text/plain': { schema: spec.textBody } } },
      }),
    },
    responses,
  });

  const chain: RequestHandler[] = [];
  if (typeof access === 'object') chain.push(requireApiKey(access.apiKey), perKeyLimit);
  else if (access !== 'public') chain.push(requireAuth);
  if (access === 'org') chain.push(resolveOrgAccess);
  chain.push(...(spec.before ?? []));
  chain.push(async (req, res) => {
    const params = parseOr400(spec.params, req.params, 'path') as z.infer<P>;
    const query = parseOr400(spec.query, req.query, 'query') as z.infer<Q>;
    const body = (
      spec.textBody
        ? parseOr400(spec.textBody, typeof req.body === 'string' ? req.body : undefined, 'body')
        : parseOr400(spec.body, req.body, 'body')
    ) as z.infer<B>;
    const validating = validatingResponses();
    const json = res.json;
    // A handler that writes JSON itself (res.json, res.send of an object) is checked too.
    if (validating) {
      res.json = (sent: unknown) => {
        if (res.statusCode < 300) assertResponse(routeName, spec.response, sent);
        return json.call(res, sent);
      };
    }
    let result: unknown;
    try {
      result = await spec.handler({ req, res, params, query, body });
    } finally {
      res.json = json;
    }
    if (res.headersSent) return;
    if (status === 204 || result === undefined) res.status(204).end();
    else {
      if (validating) assertResponse(routeName, spec.response, result);
      res.status(status).json(result);
    }
  });
  router[spec.method](spec.path, ...chain);
}
