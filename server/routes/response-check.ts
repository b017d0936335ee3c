import type { ZodType } from 'zod';
import { AppError } from '../errors';
import { logger } from '../logger';

/**
 * A success body that is not JSON (a file, a CSV, an SVG, a zip): documented under its media type
 * and written by the handler itself (`res.send`, a stream), so there is no JSON schema to check.
 */
export interface RawResponse {
  raw: string;
  description?: string;
}

/** Declares a non-JSON success body, e.g. `response: rawResponse('text/csv', 'an attachment')`. */
export const rawResponse = (mediaType: string, description?: string): RawResponse => ({
  raw: mediaType,
  description,
});

export const isRawResponse = (value: unknown): value is RawResponse =>
  typeof value === 'object' && value !== null && 'raw' in value && !('_zod' in value);

/**
 * Whether every JSON body is checked against its route's response schema: always under tests
 * (NODE_ENV=test, and `npm test` sets VALIDATE_RESPONSES=1 for the API it starts), never in
 * production unless asked for.
 */
export const validatingResponses = () =>
  process.env.VALIDATE_RESPONSES === '1' || process.env.NODE_ENV === 'test';

const pathText = (path: readonly PropertyKey[]) =>
  path.reduce<string>(
    (text, key) =>
      typeof key === 'number' ? `${text}[${key}]` : text ? `${text}.${String(key)}` : String(key),
    '',
  ) || '(body)';

const isPlainObject = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

/**
 * The first key the body carries that the schema does not know. zod strips unknown keys from
 * what it returns, so a key in the body that is missing from the parsed value is unknown.
 */
function firstUnknownKey(
  sent: unknown,
  parsed: unknown,
  path: PropertyKey[],
): PropertyKey[] | null {
  if (Array.isArray(sent) && Array.isArray(parsed)) {
    for (let i = 0; i < sent.length; i++) {
      const found = firstUnknownKey(sent[i], parsed[i], [...path, i]);
      if (found) return found;
    }
  } else if (isPlainObject(sent) && isPlainObject(parsed)) {
    for (const key of Object.keys(sent)) {
      if (!(key in parsed)) return [...path, key];
      const found = firstUnknownKey(sent[key], parsed[key], [...path, key]);
      if (found) return found;
    }
  }
  return null;
}

/** The first way `body` (as it goes on the wire) departs from `schema`, or null when it matches. */
export function responseMismatch(schema: ZodType, body: unknown): string | null {
  // What the client receives: Dates become strings, undefined members disappear.
  const sent: unknown = body === undefined ? undefined : JSON.parse(JSON.stringify(body));
  const result = schema.safeParse(sent);
  if (!result.success) {
    const issue = result.error.issues[0]!;
    return `${pathText(issue.path)}: ${issue.message}`;
  }
  const unknown = firstUnknownKey(sent, result.data, []);
  return unknown ? `${pathText(unknown)}: not in the response schema` : null;
}

/**
 * Throws (a 500 the test sees, naming the route and the first mismatching path) when a JSON body
 * departs from the route's declared schema, or when a route without a JSON schema sends JSON.
 */
export function assertResponse(
  routeName: string,
  schema: ZodType | RawResponse | undefined,
  body: unknown,
): void {
  let problem: string | null;
  if (schema === undefined) problem = 'the route sends JSON but declares no response schema';
  else if (isRawResponse(schema))
    problem = `the route declares a non-JSON body (${schema.raw}) but sent JSON`;
  else problem = responseMismatch(schema, body);
  if (!problem) return;
  const message = `Response of ${routeName} does not match its schema: ${problem}`;
  logger.error({ route: routeName, problem }, 'response does not match its schema');
  if (process.env.NODE_ENV === 'test') process.stderr.write(`${message}\n`);
  throw new AppError(500, 'response_mismatch', message);
}
