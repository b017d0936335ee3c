// Cross-site writes and unexpected bodies are refused before any route runs. The session cookie
// is SameSite=Lax, which already keeps it off cross-site POSTs from other sites; checking Origin
// and Sec-Fetch-Site also covers sibling subdomains and older browsers, and refusing non-JSON
// bodies takes away the HTML form, the one cross-site write a browser sends without asking.
import type { Request, RequestHandler } from 'express';
import { AppError } from '../errors';
import { buildOpenApiDocument } from '../openapi';
import { SESSION_COOKIE } from '../infra/session';
import { bearerKeyOf } from './api-key-auth';

const WRITES = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

// Routes a link in an e-mail reaches (authorized by the token in the address, never by the
// cookie): a mail app's one-click unsubscribe (RFC 8058) posts a form from its own servers.
const TOKEN_FORM_ROUTES = [/^\/unsubscribe\/[^/]+$/];

const crossSite = () =>
  new AppError(
    403,
    'cross_site',
    'Changes must come from Hourstone itself: this request came from another site and was refused',
  );

/** The origin the request was addressed to (behind a trusted proxy: the one people use). */
const ownOrigin = (req: Request) => `${req.protocol}://${req.get('host')}`;

/**
 * A request that carries an API key and no session cookie: the key is what authorizes it, and a
 * browser never adds a key on its own, so there is nothing for another site to ride on. With a
 * session cookie beside it the request is checked like any other.
 */
const keyWithoutSession = (req: Request) =>
  bearerKeyOf(req.get('authorization')) !== undefined && !req.cookies?.[SESSION_COOKIE];

/**
 * POST, PUT, PATCH and DELETE must come from the app: an `Origin` header must be APP_URL's or
 * the request's own, and without one `Sec-Fetch-Site` must not say another site. A request with
 * neither header is not a browser's (scripts, the mail app's unsubscribe) and goes on, and so
 * does one authorized by an API key alone.
 */
export function refuseCrossSiteWrites(appUrl: string): RequestHandler {
  const appOrigin = new URL(appUrl).origin;
  return (req, _res, next) => {
    if (!WRITES.has(req.method) || TOKEN_FORM_ROUTES.some((r) => r.test(req.path))) return next();
    if (keyWithoutSession(req)) return next();
    const origin = req.get('origin');
    if (origin !== undefined) {
      if (origin === appOrigin || origin === ownOrigin(req)) return next();
      throw crossSite();
    }
    const site = req.get('sec-fetch-site');
    if (site === undefined || site === 'same-origin' || site === 'none') return next();
    throw crossSite();
  };
}

const hasBody = (req: Request) =>
  req.headers['transfer-encoding'] !== undefined || Number(req.headers['content-length'] ?? 0) > 0;

// Method + path patterns of the routes that take a file or a text body: those the OpenAPI
// document lists with a multipart or text/plain body (route()'s `multipartBody`, `textBody`),
// read once when first needed.
const bodyRoutes = new Map<string, { method: string; path: RegExp }[]>();
const escapeRegExp = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

function takesBody(req: Request, mediaType: string): boolean {
  const routes = bodyRoutes.get(mediaType) ?? routesTaking(mediaType);
  bodyRoutes.set(mediaType, routes);
  return routes.some((r) => r.method === req.method && r.path.test(req.path));
}

function routesTaking(mediaType: string) {
  return Object.entries(buildOpenApiDocument().paths ?? {}).flatMap(([path, item]) =>
    Object.entries(item ?? {})
      .filter(
        ([, operation]) =>
          typeof operation === 'object' &&
          operation !== null &&
          'requestBody' in operation &&
          JSON.stringify(operation.requestBody ?? {}).includes(`"${mediaType}"`),
      )
      .map(([method]) => ({
        method: method.toUpperCase(),
        path: new RegExp(
          `^${path
            .split(/\{[^}]+\}/)
            .map(escapeRegExp)
            .join('[^/]+')}$`,
        ),
      })),
  );
}

/**
 * Bodies are JSON: form-encoded, text/plain and anything else answer 415, multipart too except
 * on the routes that take a file, text/plain except on those that take a log (and forms on the
 * e-mail token routes).
 */
export const jsonBodiesOnly: RequestHandler = (req, _res, next) => {
  if (!WRITES.has(req.method) || !hasBody(req) || req.is('application/json')) return next();
  if (req.is('multipart/form-data') && takesBody(req, 'multipart/form-data')) return next();
  if (req.is('text/plain') && takesBody(req, 'text/plain')) return next();
  if (
    req.is('application/x-www-form-urlencoded') &&
    TOKEN_FORM_ROUTES.some((r) => r.test(req.path))
  )
    return next();
  throw new AppError(
    415,
    'unsupported_media_type',
    `Send the request body as JSON (Content-Type: application/json), not ${req.get('content-type')?.split(';')[0].slice(0, 80) || 'untyped'}`,
  );
};
